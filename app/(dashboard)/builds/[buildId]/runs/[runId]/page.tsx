import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { RunHeaderBlock } from "@/components/run/run-header";
import { RunPlots } from "@/components/run/run-plots";
import { getSessionActor } from "@/lib/auth/session";
import { findRunHeader } from "@/lib/services/run-view";

export const dynamic = "force-dynamic";

const idSchema = z.string().regex(/^[1-9][0-9]{0,15}$/).transform(Number).pipe(z.number().int().positive().max(Number.MAX_SAFE_INTEGER));
const paramsSchema = z.object({ buildId: idSchema, runId: idSchema });

type Params = Promise<{ buildId: string; runId: string }>;

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const { runId } = await params;
  return { title: `Run ${runId} · Tauline` };
}

/** One run of one build: header from the server, plots and quantities as client leaves. */
export default async function RunPage({ params }: { params: Params }) {
  const parsed = paramsSchema.safeParse(await params);
  if (!parsed.success) notFound();
  const { buildId, runId } = parsed.data;
  const header = await findRunHeader({ actor: await getSessionActor(), buildId, runId });
  if (!header) notFound();
  return (
    <section>
      <RunHeaderBlock header={header} />
      <RunPlots runId={String(header.run.id)} caseKey={header.run.caseKey} />
    </section>
  );
}
