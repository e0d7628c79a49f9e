import "server-only";
import { z } from "zod";
import { getDb } from "@/db";
import { getBaselineBuild, getBuildsByIds } from "@/db/queries/builds";
import { getQuantityDefinitions } from "@/db/queries/library";
import { getQuantityValuesByRunIds } from "@/db/queries/quantity-values";
import { getCoefficientsByRunIds, getRunsByBuildIds } from "@/db/queries/runs";
import { AppError } from "@/lib/errors";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";
import { pairRuns } from "./builds-view-join";
import { parseInput } from "./builds-view";

const id = z.union([z.string(), z.number()]).transform((v) => String(v)).pipe(z.string().regex(/^[1-9][0-9]{0,15}$/, "must be a positive integer id")).transform(Number);

export const buildComparisonSchema = z.object({
  buildId: id,
  /** Null or absent: the branch baseline (last approved build received before this one). */
  againstId: id.nullish(),
});

/**
 * Side by side, per case × model × grid, the quantity values, verdicts and closure
 * coefficients of a build and another one. A fixed handful of statements whatever
 * the number of runs: both builds' runs, their values and coefficients each in one
 * `where run_id in (...)`.
 */
export async function findBuildComparison({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const input = parseInput(buildComparisonSchema, unsafeInput);
  const db = getDb();
  const ids = input.againstId ? [input.buildId, input.againstId] : [input.buildId];
  const found = await getBuildsByIds({ db, ids });
  const build = found.find((b) => b.id === input.buildId);
  if (!build) throw new AppError("not_found", `There is no build ${input.buildId}.`);
  let against = input.againstId ? found.find((b) => b.id === input.againstId) ?? null : null;
  if (input.againstId && !against) throw new AppError("not_found", `There is no build ${input.againstId} to compare with.`);
  if (input.againstId === input.buildId) throw new AppError("invalid_input", "Choose a different build to compare with.", [{ path: "againstId", message: "is the build itself" }]);
  const baseline = (await getBaselineBuild({ db, branch: build.branch, before: build.received_at, excludeId: build.id })) ?? null;
  if (!input.againstId) against = baseline;

  const runs = await getRunsByBuildIds({ db, buildIds: against ? [build.id, against.id] : [build.id] });
  const runIds = runs.map((r) => r.id);
  const [values, coefficients, definitions] = await Promise.all([
    getQuantityValuesByRunIds({ db, runIds }),
    getCoefficientsByRunIds({ db, runIds }),
    getQuantityDefinitions({ db }),
  ]);
  const pairs = pairRuns({
    runs: runs.filter((r) => r.build_id === build.id),
    otherRuns: against ? runs.filter((r) => r.build_id === against.id) : [],
    values,
    coefficients,
  });
  const defs = new Map(definitions.map((d) => [d.key, d]));
  return {
    build,
    against,
    baseline,
    againstIsBaseline: against !== null && against.id === baseline?.id,
    runs: pairs.map((p) => ({
      ...p,
      quantities: p.quantities.map((q) => ({ ...q, label: defs.get(q.key)?.label ?? null, unit: defs.get(q.key)?.unit ?? null })),
    })),
  };
}
