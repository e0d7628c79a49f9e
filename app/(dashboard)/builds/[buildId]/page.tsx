import { notFound } from "next/navigation";
import { Suspense } from "react";
import { z } from "zod";
import { BuildCompare } from "@/components/builds/build-compare";
import { BuildHeader } from "@/components/builds/build-header";
import { SelectedRun } from "@/components/builds/selected-run";
import { VerdictMatrix } from "@/components/builds/verdict-matrix";
import { LoadingBlock } from "@/components/ui/states";
import { getSessionActor } from "@/lib/auth/session";
import { findBuildSummary } from "@/lib/services/builds-view";

export const dynamic = "force-dynamic";

const paramsSchema = z.object({ buildId: z.string().regex(/^[1-9][0-9]{0,15}$/).transform(Number) });

export async function generateMetadata({ params }: { params: Promise<{ buildId: string }> }) {
  const { buildId } = await params;
  return { title: `Build ${buildId}` };
}

/**
 * One build: the header is rendered on the server; the matrix, the selected run's
 * quantities (?run=) and the comparison (?compare=) are client leaves that fetch
 * through GraphQL, so selecting a cell does not re-render the page.
 */
export default async function BuildPage({ params }: { params: Promise<{ buildId: string }> }) {
  const parsed = paramsSchema.safeParse(await params);
  if (!parsed.success) notFound();
  const summary = await findBuildSummary({ actor: await getSessionActor(), id: parsed.data.buildId });
  if (!summary) notFound();
  const id = String(summary.build.id);
  return (
    <section className="space-y-5">
      <BuildHeader {...summary} />
      <Suspense fallback={<LoadingBlock label="Loading the runs" rows={6} />}>
        <VerdictMatrix buildId={id} />
        <SelectedRun buildId={id} />
        <BuildCompare buildId={id} />
      </Suspense>
    </section>
  );
}
