import { findTrendChart } from "@/lib/services/trends";
import type { GraphQLContext } from "../context";

type Ctx = GraphQLContext;
type TrendChart = Awaited<ReturnType<typeof findTrendChart>>;

export const trendsResolvers = {
  Query: {
    trendChart: (_: unknown, args: Record<string, unknown>, ctx: Ctx) => findTrendChart({ actor: ctx.actor, unsafeInput: args }),
  },
  TrendChart: {
    definition: async (t: TrendChart, _: unknown, ctx: Ctx) => (await ctx.loaders.quantityDefinitions.load("all")).find((d) => d.key === t.quantity) ?? null,
    builds: async (t: TrendChart, _: unknown, ctx: Ctx) => (await ctx.loaders.build.loadMany(t.buildIds)).filter((b) => b !== null && !(b instanceof Error)),
    baseline: (t: TrendChart, _: unknown, ctx: Ctx) => (t.baselineBuildId === null ? null : ctx.loaders.build.load(t.baselineBuildId)),
  },
};
