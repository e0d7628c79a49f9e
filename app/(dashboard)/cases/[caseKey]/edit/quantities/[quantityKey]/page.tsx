import { notFound } from "next/navigation";
import { z } from "zod";
import { EditingRefused, mayEditLibrary } from "@/components/band-editor/editing-refused";
import { QuantityEditor } from "@/components/band-editor/quantity-editor";
import { PageTitle } from "@/components/ui/panel";
import { getSessionActor } from "@/lib/auth/session";
import { findCases } from "@/lib/services/reads";

export const metadata = { title: "Quantity definition · Tauline" };

const paramsSchema = z.object({
  caseKey: z.string().regex(/^[a-z0-9][a-z0-9-]{0,63}$/),
  quantityKey: z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,63}$/),
});

export default async function EditQuantityPage({ params }: { params: Promise<{ caseKey: string; quantityKey: string }> }) {
  const [rawParams, actor] = await Promise.all([params, getSessionActor()]);
  const parsed = paramsSchema.safeParse(rawParams);
  if (!parsed.success) notFound();
  if (!mayEditLibrary(actor)) return <EditingRefused readHref={`/cases/${parsed.data.caseKey}`} />;
  const [found] = await findCases({ actor, key: parsed.data.caseKey });
  if (!found) notFound();
  return (
    <>
      <PageTitle title={<>Quantity <span className="font-mono">{parsed.data.quantityKey}</span> · {found.title}</>} lead="Label, unit and meaning of the quantity; each change states its reason." />
      <QuantityEditor caseKey={found.key} quantityKey={parsed.data.quantityKey} />
    </>
  );
}
