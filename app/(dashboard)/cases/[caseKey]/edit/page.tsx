import { notFound } from "next/navigation";
import { Suspense } from "react";
import { z } from "zod";
import { CaseEditor } from "@/components/band-editor/case-editor";
import { EditingRefused, mayEditLibrary } from "@/components/band-editor/editing-refused";
import { PageTitle } from "@/components/ui/panel";
import { LoadingBlock } from "@/components/ui/states";
import { getSessionActor } from "@/lib/auth/session";
import { findCases } from "@/lib/services/reads";

export const metadata = { title: "Edit case · Tauline" };

const paramsSchema = z.object({ caseKey: z.string().regex(/^[a-z0-9][a-z0-9-]{0,63}$/) });

export default async function EditCasePage({ params, searchParams }: { params: Promise<{ caseKey: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const [rawParams, rawSearch, actor] = await Promise.all([params, searchParams, getSessionActor()]);
  const parsed = paramsSchema.safeParse(rawParams);
  if (!parsed.success) notFound();
  if (!mayEditLibrary(actor)) return <EditingRefused readHref={`/cases/${parsed.data.caseKey}`} />;
  const [found] = await findCases({ actor, key: parsed.data.caseKey });
  if (!found) notFound();
  return (
    <>
      <PageTitle title={<>Edit · {found.title}</>} lead="Every change states its reason and is kept in the change record; bands change by new versions, so builds already judged keep theirs." />
      <Suspense fallback={<LoadingBlock label="Loading the case" rows={10} />}>
        <CaseEditor caseKey={found.key} justCreated={rawSearch.created === "1"} />
      </Suspense>
    </>
  );
}
