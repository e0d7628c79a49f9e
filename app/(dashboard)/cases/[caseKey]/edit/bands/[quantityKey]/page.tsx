import { notFound } from "next/navigation";
import { Suspense } from "react";
import { z } from "zod";
import { BandWorkbench } from "@/components/band-editor/band-workbench";
import { EditingRefused, mayEditLibrary } from "@/components/band-editor/editing-refused";
import { PageTitle } from "@/components/ui/panel";
import { LoadingBlock } from "@/components/ui/states";
import { getSessionActor } from "@/lib/auth/session";
import { findCases } from "@/lib/services/reads";

export const metadata = { title: "Band editor · Tauline" };

const paramsSchema = z.object({
  caseKey: z.string().regex(/^[a-z0-9][a-z0-9-]{0,63}$/),
  quantityKey: z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,63}$/),
});
const modelSchema = z.string().regex(/^[a-z0-9][a-z0-9-]{0,63}$/).nullable().catch(null);

/** One band scope of a case: new version, history with changes, re-judgement of stored builds (?model= picks the scope). */
export default async function BandEditorPage({ params, searchParams }: { params: Promise<{ caseKey: string; quantityKey: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const [rawParams, rawSearch, actor] = await Promise.all([params, searchParams, getSessionActor()]);
  const parsed = paramsSchema.safeParse(rawParams);
  if (!parsed.success) notFound();
  const { caseKey, quantityKey } = parsed.data;
  if (!mayEditLibrary(actor)) return <EditingRefused readHref={`/cases/${caseKey}`} />;
  const [found] = await findCases({ actor, key: caseKey });
  if (!found) notFound();
  const model = modelSchema.parse(typeof rawSearch.model === "string" ? rawSearch.model : null);
  return (
    <>
      <PageTitle title={<>Band of <span className="font-mono">{quantityKey}</span> · {found.title}</>} lead="Every change is a new version with its reason; builds already judged keep the version they were judged against." />
      <Suspense fallback={<LoadingBlock label="Loading the band" rows={10} />}>
        <BandWorkbench key={`${quantityKey}/${model ?? ""}`} caseKey={caseKey} quantityKey={quantityKey} model={model} />
      </Suspense>
    </>
  );
}
