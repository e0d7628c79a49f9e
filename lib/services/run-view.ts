import "server-only";
import { getDb } from "@/db";
import { getBuildsByIds } from "@/db/queries/builds";
import { getCases, getModels } from "@/db/queries/library";
import { getCoefficientsByRunIds, getRunsByIds } from "@/db/queries/runs";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";

export interface RunHeader {
  run: {
    id: number;
    caseKey: string;
    modelKey: string;
    grid: string;
    status: "COMPLETED" | "DIVERGED" | "CRASHED" | "TIMEOUT";
    iterations: number | null;
    wallSeconds: number | null;
    verdict: "within" | "marginal" | "outside" | "unbanded" | "missing";
  };
  build: { id: number; solver: string; version: string; commit: string; branch: string; receivedAt: Date };
  caseTitle: string | null;
  modelName: string | null;
  coefficients: { name: string; value: number }[];
}

/**
 * The frame of the run page: the run, its build, case and model names and the
 * closure coefficients it ran with. Null when the run does not exist or does
 * not belong to the build in the address (the page then answers 404).
 */
export async function findRunHeader({ actor, buildId, runId }: { actor: Actor | null; buildId: number; runId: number }): Promise<RunHeader | null> {
  requirePerson(actor);
  const db = getDb();
  const [[run], [build]] = await Promise.all([getRunsByIds({ db, ids: [runId] }), getBuildsByIds({ db, ids: [buildId] })]);
  if (!run || !build || Number(run.build_id) !== Number(build.id)) return null;
  const [cases, models, coefficients] = await Promise.all([
    getCases({ db, keys: [run.case_key] }),
    getModels({ db }),
    getCoefficientsByRunIds({ db, runIds: [run.id] }),
  ]);
  return {
    run: {
      id: Number(run.id),
      caseKey: run.case_key,
      modelKey: run.model_key,
      grid: run.grid,
      status: run.status,
      iterations: run.iterations,
      wallSeconds: run.wall_seconds,
      verdict: run.verdict,
    },
    build: { id: Number(build.id), solver: build.solver, version: build.version, commit: build.commit, branch: build.branch, receivedAt: build.received_at },
    caseTitle: cases[0]?.title ?? null,
    modelName: (models as { key: string; name: string }[]).find((m) => m.key === run.model_key)?.name ?? null,
    coefficients: (coefficients as { name: string; value: number }[]).map((c) => ({ name: c.name, value: Number(c.value) })),
  };
}
