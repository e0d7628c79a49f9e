import type { GateCandidateRow } from "@/db/queries/gate-candidates";
import { decideGate, findGateCandidates, findGateReview } from "@/lib/services/gate";
import type { GateFinding } from "@/lib/services/gate-assess";
import { findWaivers, grantWaiver, revokeWaiver } from "@/lib/services/gate-waivers";
import type { GraphQLContext } from "../context";

type Ctx = GraphQLContext;
type Args = Record<string, unknown>;

export const gateResolvers = {
  Query: {
    gateCandidates: (_: unknown, args: Args, ctx: Ctx) => findGateCandidates({ actor: ctx.actor, unsafeInput: args }),
    gateReview: (_: unknown, args: { buildId: string }, ctx: Ctx) => findGateReview({ actor: ctx.actor, buildId: args.buildId }),
    waivers: (_: unknown, args: Args, ctx: Ctx) => findWaivers({ actor: ctx.actor, unsafeInput: args }),
  },
  Mutation: {
    decideGate: (_: unknown, args: { input: unknown }, ctx: Ctx) => decideGate({ actor: ctx.actor, unsafeInput: args.input }),
    grantWaiver: (_: unknown, args: { input: unknown }, ctx: Ctx) => grantWaiver({ actor: ctx.actor, unsafeInput: args.input }),
    revokeWaiver: (_: unknown, args: Args, ctx: Ctx) => revokeWaiver({ actor: ctx.actor, unsafeInput: args }),
  },
  GateFinding: {
    case: (f: GateFinding) => f.caseKey,
    model: (f: GateFinding) => f.modelKey,
    quantity: (f: GateFinding) => f.quantityKey,
  },
  GateCandidate: {
    outsideCount: (c: { counts: GateCandidateRow }) => c.counts.outside_count,
    marginalCount: (c: { counts: GateCandidateRow }) => c.counts.marginal_count,
    missingCount: (c: { counts: GateCandidateRow }) => c.counts.missing_count,
    driftCount: (c: { counts: GateCandidateRow }) => c.counts.drift_count,
    incompleteRuns: (c: { counts: GateCandidateRow }) => c.counts.incomplete_runs,
    runCount: (c: { counts: GateCandidateRow }) => c.counts.run_count,
  },
};
