import "server-only";
import type { Db } from "../index";
import { prepared } from "../prepared";
import type { Verdict } from "@/lib/analysis";
import type { RunSubmission } from "@/lib/validation/submission";

export interface RunRow {
  id: number;
  build_id: number;
  case_key: string;
  model_key: string;
  grid: string;
  status: RunSubmission["status"];
  iterations: number | null;
  wall_seconds: number | null;
  verdict: Verdict;
  received_at: Date;
}

/** A run as the ingest stores it, judged already. */
export interface NewRun {
  case: string;
  model: string;
  grid: string;
  status: RunSubmission["status"];
  iterations: number | null;
  wallSeconds: number | null;
  verdict: Verdict;
}

/**
 * Removes earlier posts of these case × model × grid keys in this build (their
 * data cascades): one statement for the whole submission, not one per run.
 */
export async function deleteRunsByKeys({ db, buildId, runs }: { db: Db; buildId: number; runs: readonly Pick<NewRun, "case" | "model" | "grid">[] }) {
  if (runs.length === 0) return;
  await db.raw(
    `delete from runs r using unnest(?::text[], ?::text[], ?::text[]) as k(case_key, model_key, grid)
      where r.build_id = ? and r.case_key = k.case_key and r.model_key = k.model_key and r.grid = k.grid`,
    [runs.map((r) => r.case), runs.map((r) => r.model), runs.map((r) => r.grid), buildId],
  );
}

/**
 * The runs stored now under these keys of a build, in the order given (a key
 * with no run is left out). A submission's receipt reads its runs this way: a
 * concurrent re-post of the same build may already have replaced the rows it
 * inserted, and then the receipt shows the replacement, not a vanished id.
 */
const RUNS_BY_KEYS = `select r.id, r.build_id, r.case_key, r.model_key, r.grid, r.status, r.iterations, r.wall_seconds, r.verdict, r.received_at
       from unnest(?::text[], ?::text[], ?::text[]) with ordinality as k(case_key, model_key, grid, n)
       join runs r on r.build_id = ? and r.case_key = k.case_key and r.model_key = k.model_key and r.grid = k.grid
      order by k.n`;

export async function getRunsByKeys({ db, buildId, runs }: { db: Db; buildId: number; runs: readonly Pick<NewRun, "case" | "model" | "grid">[] }): Promise<RunRow[]> {
  if (runs.length === 0) return [];
  const result: { rows: RunRow[] } = await db
    .raw(RUNS_BY_KEYS, [runs.map((r) => r.case), runs.map((r) => r.model), runs.map((r) => r.grid), buildId])
    .options(prepared(RUNS_BY_KEYS));
  return result.rows;
}

export async function getRunsByIds({ db, ids }: { db: Db; ids: readonly number[] }): Promise<RunRow[]> {
  if (ids.length === 0) return [];
  return db("runs").whereIn("id", ids as number[]).select("*");
}

export async function getRunsByBuildIds({ db, buildIds }: { db: Db; buildIds: readonly number[] }): Promise<RunRow[]> {
  if (buildIds.length === 0) return [];
  return db("runs")
    .whereIn("build_id", buildIds as number[])
    .orderBy([{ column: "case_key" }, { column: "model_key" }, { column: "grid" }])
    .select("*");
}

export async function getSeriesByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }) {
  if (runIds.length === 0) return [];
  return db("run_series").whereIn("run_id", runIds as number[]).orderBy(["run_id", "key"]).select("run_id", "key", "x", "y");
}

export async function getStressesByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }) {
  if (runIds.length === 0) return [];
  return db("stress_samples").whereIn("run_id", runIds as number[]).orderBy(["run_id", "idx"]).select("*");
}

export async function getGridStudiesByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }) {
  if (runIds.length === 0) return [];
  return db("grid_studies").whereIn("run_id", runIds as number[]).select("*");
}

export async function getCoefficientsByRunIds({ db, runIds }: { db: Db; runIds: readonly number[] }) {
  if (runIds.length === 0) return [];
  return db("run_coefficients").whereIn("run_id", runIds as number[]).orderBy(["run_id", "name"]).select("*");
}
