import DataLoader from "dataloader";
import type { Db } from "@/db";
import { getBuildsByIds } from "@/db/queries/builds";
import { getLatestDecisionsByBuildIds } from "@/db/queries/gate";
import { getBandsByIds, getQuantityDefinitions } from "@/db/queries/library";
import { getRunQuantitiesByRunIds } from "@/db/queries/run-quantities";
import {
  getCoefficientsByRunIds,
  getGridStudiesByRunIds,
  getRunsByBuildIds,
  getRunsByIds,
  getSeriesByRunIds,
  getStressesByRunIds,
} from "@/db/queries/runs";

// Built fresh for every request: each loader batches one `where id in (...)` per
// tick, so a build of 200 runs costs the same handful of statements as one of 2.
export function createLoaders(db: Db) {
  const byId = <T extends { id: number }>(fetch: (ids: readonly number[]) => Promise<T[]>) =>
    new DataLoader<number, T | null>(async (ids) => {
      const rows = await fetch(ids);
      const map = new Map(rows.map((r) => [r.id, r]));
      return ids.map((id) => map.get(id) ?? null);
    });
  const groupedBy = <T extends Record<K, unknown>, K extends string>(key: K, fetch: (ids: readonly number[]) => Promise<T[]>) =>
    new DataLoader<number, T[]>(async (ids) => {
      const rows = await fetch(ids);
      const map = new Map<number, T[]>();
      for (const r of rows) {
        const k = r[key] as unknown as number;
        const list = map.get(k) ?? [];
        list.push(r);
        map.set(k, list);
      }
      return ids.map((id) => map.get(id) ?? []);
    });

  return {
    build: byId((ids) => getBuildsByIds({ db, ids })),
    run: byId((ids) => getRunsByIds({ db, ids })),
    runsByBuild: groupedBy("build_id", (buildIds) => getRunsByBuildIds({ db, buildIds })),
    quantitiesByRun: groupedBy("runId", (runIds) => getRunQuantitiesByRunIds({ db, runIds })),
    seriesByRun: groupedBy("run_id", (runIds) => getSeriesByRunIds({ db, runIds })),
    stressesByRun: groupedBy("run_id", (runIds) => getStressesByRunIds({ db, runIds })),
    gridStudyByRun: groupedBy("run_id", (runIds) => getGridStudiesByRunIds({ db, runIds })),
    coefficientsByRun: groupedBy("run_id", (runIds) => getCoefficientsByRunIds({ db, runIds })),
    band: byId((ids) => getBandsByIds({ db, ids })),
    decisionByBuild: groupedBy("build_id", (buildIds) => getLatestDecisionsByBuildIds({ db, buildIds })),
    quantityDefinitions: new DataLoader<"all", Awaited<ReturnType<typeof getQuantityDefinitions>>>(async (keys) => {
      const defs = await getQuantityDefinitions({ db });
      return keys.map(() => defs);
    }),
  };
}

export type Loaders = ReturnType<typeof createLoaders>;
