import { findAwaitingCandidates, findBandExits, findBranchActivity, findOpenDrifts, parseMorningView } from "@/lib/services/overview";
import type { GraphQLContext } from "../context";

type Ctx = GraphQLContext;
interface MorningViewArgs {
  id: string;
  branches: number;
}
interface QuantityRef {
  quantity: string;
  buildId: number;
}

const definitionOf = async (q: QuantityRef, ctx: Ctx) => (await ctx.loaders.quantityDefinitions.load("all")).find((d) => d.key === q.quantity);
const buildOf = (q: { buildId: number }, _: unknown, ctx: Ctx) => ctx.loaders.build.load(q.buildId);
const labelOf = async (q: QuantityRef, _: unknown, ctx: Ctx) => (await definitionOf(q, ctx))?.label ?? null;
const unitOf = async (q: QuantityRef, _: unknown, ctx: Ctx) => (await definitionOf(q, ctx))?.unit ?? null;

export const overviewResolvers = {
  Query: {
    morningView(_: unknown, args: Record<string, unknown>, ctx: Ctx): MorningViewArgs {
      const { branches } = parseMorningView({ actor: ctx.actor, unsafeInput: args });
      return { id: `morning-view:${branches}`, branches };
    },
  },
  MorningView: {
    branches: (v: MorningViewArgs, args: Record<string, unknown>, ctx: Ctx) => findBranchActivity({ actor: ctx.actor, branches: v.branches, unsafeInput: args }),
    bandExits: (v: MorningViewArgs, _: unknown, ctx: Ctx) => findBandExits({ actor: ctx.actor, branches: v.branches }),
    openDrifts: (v: MorningViewArgs, _: unknown, ctx: Ctx) => findOpenDrifts({ actor: ctx.actor, branches: v.branches }),
    releaseCandidates: (_: MorningViewArgs, args: Record<string, unknown>, ctx: Ctx) => findAwaitingCandidates({ actor: ctx.actor, unsafeInput: args }),
  },
  BandExit: {
    build: buildOf,
    baseline: (q: { baselineBuildId: number }, _: unknown, ctx: Ctx) => ctx.loaders.build.load(q.baselineBuildId),
    label: labelOf,
    unit: unitOf,
  },
  OpenDrift: { build: buildOf, label: labelOf, unit: unitOf },
};
