import "server-only";
import { getDb } from "@/db";
import { insertAuditEntry } from "@/db/queries/audit";
import { getBuildsByIds } from "@/db/queries/builds";
import { getBandsInForce } from "@/db/queries/library";
import { getBandScopeVersions } from "@/db/queries/library-edit";
import {
  getRecentBuildsOfCase,
  getReevaluatedChanges,
  getReevaluationsByBuildIds,
  getRunsOfBuilds,
  getScopeJudgements,
  getStoredValuesOfBuilds,
  insertReevaluatedValues,
  insertReevaluation,
} from "@/db/queries/reevaluations";
import { judgeValue, worstVerdict } from "@/lib/analysis";
import { AppError } from "@/lib/errors";
import { reevaluationCandidatesSchema, reevaluationRequestSchema } from "@/lib/validation/case";
import { actorUserId, type Actor } from "./actor";
import { requirePerson } from "./authorize";
import { parseInput } from "./library-edit";
import { rejudgeBuild } from "./reevaluate-judge";

/**
 * Re-judges the STORED values of chosen builds against the bands in force now
 * (QA lead, after a band change). Writes one reevaluations row per build with
 * every re-judged value beside it, and an audit row; the verdicts the builds were
 * originally judged with stay as they were, so the gate history stays true.
 */
export async function reevaluateBuilds({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor, "qa");
  const input = parseInput(reevaluationRequestSchema, unsafeInput);
  const db = getDb();
  return db.transaction(async (trx) => {
    const builds = await getBuildsByIds({ db: trx, ids: input.buildIds });
    const byId = new Map(builds.map((b) => [b.id, b]));
    const unknown = input.buildIds.flatMap((id, i) => (byId.has(id) ? [] : [{ path: `input.buildIds[${i}]`, message: `is not a known build: ${id}` }]));
    if (unknown.length) throw new AppError("invalid_input", unknown.map((i) => `${i.path} ${i.message}`).join("; "), unknown);

    const [runs, values] = await Promise.all([getRunsOfBuilds({ db: trx, buildIds: input.buildIds }), getStoredValuesOfBuilds({ db: trx, buildIds: input.buildIds })]);
    const at = new Date();
    const bands = await getBandsInForce({ db: trx, caseKeys: [...new Set(runs.map((r) => r.case_key))], at });
    const runBuild = new Map(runs.map((r) => [r.id, r.build_id]));
    const original = new Map(values.map((v) => [v.id, v]));

    const ids: number[] = [];
    for (const buildId of input.buildIds) {
      const build = byId.get(buildId)!;
      const result = rejudgeBuild({
        runs: runs.filter((r) => r.build_id === buildId).map((r) => ({ id: r.id, caseKey: r.case_key, modelKey: r.model_key, status: r.status })),
        values: values.filter((v) => runBuild.get(v.run_id) === buildId).map((v) => ({ id: v.id, runId: v.run_id, quantityKey: v.quantity_key, value: v.value })),
        bands,
      });
      const id = await insertReevaluation({ db: trx, row: { buildId, requestedBy: actorUserId(actor), reason: input.reason, verdict: result.verdict, originalVerdict: build.verdict, at } });
      await insertReevaluatedValues({
        db: trx,
        rows: result.values.map((v) => ({ reevaluationId: id, runId: v.runId, quantityKey: v.quantityKey, quantityValueId: v.quantityValueId, bandId: v.band?.id ?? null, verdict: v.verdict })),
      });
      const changed = result.values.filter((v) => {
        const o = v.quantityValueId === null ? null : original.get(v.quantityValueId);
        return !o || o.verdict !== v.verdict || o.band_id !== (v.band?.id ?? null);
      }).length;
      await insertAuditEntry({
        db: trx,
        entry: {
          actorUserId: actorUserId(actor),
          actorLabel: actor.label,
          action: "build.reevaluated",
          entity: "build",
          entityId: buildId,
          details: { case: input.caseKey, reason: input.reason, reevaluationId: id, build: { id: buildId, version: build.version, commit: build.commit }, originalVerdict: build.verdict, verdict: result.verdict, changedValues: changed },
          at,
        },
      });
      ids.push(id);
    }
    const rows = await getReevaluationsByBuildIds({ db: trx, buildIds: input.buildIds });
    return ids.map((id) => rows.find((r) => r.id === id)!);
  });
}

/** Every re-judgement of the builds (for the Build.reevaluations field, batched per request). */
export async function findReevaluationsByBuildIds({ actor, buildIds }: { actor: Actor | null; buildIds: readonly number[] }) {
  requirePerson(actor);
  return getReevaluationsByBuildIds({ db: getDb(), buildIds });
}

/** The values whose verdict or band a re-judgement changed (batched per request). */
export async function findReevaluatedChanges({ actor, reevaluationIds }: { actor: Actor | null; reevaluationIds: readonly number[] }) {
  requirePerson(actor);
  return getReevaluatedChanges({ db: getDb(), reevaluationIds });
}

/**
 * The newest builds of a case, for the re-judgement picker: against which version
 * of the band scope each build's values were judged, whether that version is no
 * longer the one in force for them, and the build's latest re-judgement.
 * `stale` marks the picker's default choice (judged under an earlier version,
 * not re-judged since the version in force began).
 */
export async function findReevaluationCandidates({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const scope = parseInput(reevaluationCandidatesSchema, unsafeInput);
  const db = getDb();
  const builds = await getRecentBuildsOfCase({ db, caseKey: scope.caseKey, branch: scope.branch, limit: scope.last });
  const buildIds = builds.map((b) => b.id);
  const [judgements, latest, bands, versions] = await Promise.all([
    getScopeJudgements({ db, caseKey: scope.caseKey, quantityKey: scope.quantityKey, buildIds }),
    getReevaluationsByBuildIds({ db, buildIds }),
    getBandsInForce({ db, caseKeys: [scope.caseKey] }),
    getBandScopeVersions({ db, caseKey: scope.caseKey, quantityKey: scope.quantityKey, model: scope.model }),
  ]);
  const forQuantity = bands.filter((b) => b.quantityKey === scope.quantityKey);
  const ownModels = new Set(forQuantity.flatMap((b) => (b.modelKey === null ? [] : [b.modelKey])));
  const inForceFor = (model: string) => forQuantity.find((b) => b.modelKey === model) ?? forQuantity.find((b) => b.modelKey === null) ?? null;
  const scopeSince = versions.find((v) => v.superseded_at === null)?.valid_from ?? null;
  // A case-wide band judges only the models without their own band.
  const inScope = (model: string) => (scope.model === null ? !ownModels.has(model) : model === scope.model);

  return builds.map((build) => {
    const mine = judgements.filter((j) => j.build_id === build.id && inScope(j.model_key));
    const judgedAgainst = [...new Map(mine.map((j) => [`${j.band_id}`, { version: j.band_version, model: j.band_model }])).values()];
    const superseded = mine.some((j) => j.band_id !== (inForceFor(j.model_key)?.id ?? null));
    const latestReevaluation = latest.find((r) => r.build_id === build.id) ?? null;
    const rejudgedSince = latestReevaluation !== null && scopeSince !== null && latestReevaluation.evaluated_at >= scopeSince;
    return {
      build,
      judgedAgainst,
      superseded,
      latestReevaluation,
      stale: superseded && !rejudgedSince,
      values: mine.map((j) => j.value),
      // What a re-judgement would say for this scope: the same judgeValue, with the band in force now.
      verdictAsJudged: mine.length ? worstVerdict(mine.map((j) => j.verdict)) : null,
      verdictNow: mine.length ? worstVerdict(mine.map((j) => judgeValue(j.value, inForceFor(j.model_key)))) : null,
    };
  });
}
