import DataLoader from "dataloader";
import type { BuildRow } from "@/db/queries/builds";
import type { BandRecordRow } from "@/db/queries/case-library";
import type { ReevaluatedChangeRow, ReevaluationRow } from "@/db/queries/reevaluations";
import { createCase, defineQuantity, reviseCase, reviseQuantity } from "@/lib/services/library-edit";
import { findBandVersions, findCaseChangeRecord } from "@/lib/services/library-history";
import { findReevaluatedChanges, findReevaluationCandidates, findReevaluationsByBuildIds, reevaluateBuilds } from "@/lib/services/reevaluate";
import type { GraphQLContext } from "../context";

type Ctx = GraphQLContext;

// Per-request loaders keyed on the request's own loader set (fresh for every
// request), so a list of builds costs one statement per field, not one per build.
const perRequest = new WeakMap<object, ReturnType<typeof createLoaders>>();

function createLoaders(ctx: Ctx) {
  const grouped = <R, K extends number>(key: (r: R) => K, fetch: (ids: readonly number[]) => Promise<R[]>) =>
    new DataLoader<number, R[]>(async (ids) => {
      const rows = await fetch(ids);
      return ids.map((id) => rows.filter((r) => key(r) === id));
    });
  return {
    reevaluationsByBuild: grouped((r: ReevaluationRow) => r.build_id, (buildIds) => findReevaluationsByBuildIds({ actor: ctx.actor, buildIds })),
    changesByReevaluation: grouped((r: ReevaluatedChangeRow) => r.reevaluation_id, (reevaluationIds) => findReevaluatedChanges({ actor: ctx.actor, reevaluationIds })),
  };
}

function loaders(ctx: Ctx) {
  let found = perRequest.get(ctx.loaders);
  if (!found) {
    found = createLoaders(ctx);
    perRequest.set(ctx.loaders, found);
  }
  return found;
}

type Args = Record<string, unknown>;

export const libraryEditResolvers = {
  Query: {
    bandVersions: (_: unknown, args: Args, ctx: Ctx) => findBandVersions({ actor: ctx.actor, unsafeInput: args }),
    caseChangeRecord: (_: unknown, args: { caseKey: string; last: number }, ctx: Ctx) => findCaseChangeRecord({ actor: ctx.actor, caseKey: args.caseKey, last: args.last }),
    reevaluationCandidates: (_: unknown, args: Args, ctx: Ctx) => findReevaluationCandidates({ actor: ctx.actor, unsafeInput: args }),
  },
  Mutation: {
    createCase: (_: unknown, args: { input: unknown }, ctx: Ctx) => createCase({ actor: ctx.actor, unsafeInput: args.input }),
    reviseCase: (_: unknown, args: { key: string; input: unknown }, ctx: Ctx) => reviseCase({ actor: ctx.actor, key: args.key, unsafeInput: args.input }),
    defineQuantity: (_: unknown, args: { input: unknown }, ctx: Ctx) => defineQuantity({ actor: ctx.actor, unsafeInput: args.input }),
    reviseQuantity: (_: unknown, args: { key: string; input: unknown }, ctx: Ctx) => reviseQuantity({ actor: ctx.actor, key: args.key, unsafeInput: args.input }),
    reevaluateBuilds: (_: unknown, args: { input: unknown }, ctx: Ctx) => reevaluateBuilds({ actor: ctx.actor, unsafeInput: args.input }),
  },
  Build: {
    reevaluations: (b: BuildRow, _: unknown, ctx: Ctx) => loaders(ctx).reevaluationsByBuild.load(b.id),
  },
  BandVersion: {
    marginalMargin: (b: BandRecordRow) => b.marginal_margin,
    noiseFloor: (b: BandRecordRow) => b.noise_floor,
    fitSettings: (b: BandRecordRow) => b.fit_settings ?? {},
    author: (b: BandRecordRow) => b.author_label,
    validFrom: (b: BandRecordRow) => b.valid_from,
    supersededAt: (b: BandRecordRow) => b.superseded_at,
  },
  Reevaluation: {
    buildId: (r: ReevaluationRow) => r.build_id,
    evaluatedAt: (r: ReevaluationRow) => r.evaluated_at,
    originalVerdict: (r: ReevaluationRow) => r.original_verdict,
    by: (r: ReevaluationRow) => r.requested_by_name,
    changes: (r: ReevaluationRow, _: unknown, ctx: Ctx) => loaders(ctx).changesByReevaluation.load(r.id),
  },
  ReevaluatedQuantity: {
    runId: (c: ReevaluatedChangeRow) => c.run_id,
    case: (c: ReevaluatedChangeRow) => c.case_key,
    model: (c: ReevaluatedChangeRow) => c.model_key,
    quantity: (c: ReevaluatedChangeRow) => c.quantity_key,
    originalVerdict: (c: ReevaluatedChangeRow) => c.original_verdict,
    originalBandVersion: (c: ReevaluatedChangeRow) => c.original_band_version,
    originalBandModel: (c: ReevaluatedChangeRow) => c.original_band_model,
    bandVersion: (c: ReevaluatedChangeRow) => c.band_version,
    bandModel: (c: ReevaluatedChangeRow) => c.band_model,
  },
};
