import { notFound } from "next/navigation";
import { z } from "zod";
import { EditingRefused, mayEditLibrary } from "@/components/band-editor/editing-refused";
import { QuantityEditor } from "@/components/band-editor/quantity-editor";
import { PageTitle } from "@/components/ui/panel";
import { getSessionActor } from "@/lib/auth/session";
import { findCases } from "@/lib/services/reads";

export const metadata = { title: "New quantity · Tauline" };

const paramsSchema = z.object({ caseKey: z.string().regex(/^[a-z0-9][a-z0-9-]{0,63}$/) });

/** Defines a new reported quantity, then opens its band editor on this case. */
export default async function NewQuantityPage({ params }: { params: Promise<{ caseKey: string }> }) {
  const [rawParams, actor] = await Promise.all([params, getSessionActor()]);
  const parsed = paramsSchema.safeParse(rawParams);
  if (!parsed.success) notFound();
  if (!mayEditLibrary(actor)) return <EditingRefused readHref={`/cases/${parsed.data.caseKey}`} />;
  const [found] = await findCases({ actor, key: parsed.data.caseKey });
  if (!found) notFound();
  return (
    <>
      <PageTitle title={<>New reported quantity · {found.title}</>} lead="The definition is shared by every case; after saving, its band editor on this case opens." />
      <QuantityEditor caseKey={found.key} quantityKey={null} />
    </>
  );
}
