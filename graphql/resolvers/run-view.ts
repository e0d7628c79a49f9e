import type { RunQuantityRow } from "@/db/queries/run-quantities";
import type { RunRow } from "@/db/queries/runs";
import { thinSeries } from "@/components/charts/thin-series";
import { AppError } from "@/lib/errors";
import { requirePerson } from "@/lib/services/authorize";
import type { GraphQLContext } from "../context";

const MIN_POINTS = 100;
const MAX_POINTS = 20_000;

export const RunView = {
  async plotSeries(run: RunRow, args: { maxPoints?: number | null }, ctx: GraphQLContext) {
    requirePerson(ctx.actor);
    const maxPoints = args.maxPoints ?? 4000;
    if (!Number.isInteger(maxPoints) || maxPoints < MIN_POINTS || maxPoints > MAX_POINTS) {
      throw new AppError("invalid_input", `maxPoints must be an integer from ${MIN_POINTS} to ${MAX_POINTS}`, [
        { path: "maxPoints", message: `must be an integer from ${MIN_POINTS} to ${MAX_POINTS}` },
      ]);
    }
    const series = await ctx.loaders.seriesByRun.load(run.id);
    return series.map((s: { key: string; x: number[]; y: number[] }) => ({ key: s.key, ...thinSeries(s.x, s.y, maxPoints) }));
  },
};

// The plots say which kind of band (verification or validation, per model or
// not) a value was judged against, next to its reference and limits. The row
// carries both (db/queries/run-quantities.ts); the role check stays.
export const QuantityBandView = {
  bandKind(q: RunQuantityRow, _: unknown, ctx: GraphQLContext) {
    requirePerson(ctx.actor);
    return q.bandKind;
  },
  bandModel(q: RunQuantityRow, _: unknown, ctx: GraphQLContext) {
    requirePerson(ctx.actor);
    return q.bandModel;
  },
};
