import { AppError } from "@/lib/errors";
import { requirePerson } from "@/lib/services/authorize";
import {
  findBranches,
  findBuilds,
  findCases,
  findModels,
  findQuantityDefinitions,
  findReleaseGate,
  findTrend,
} from "@/lib/services/reads";
import type { GraphQLContext } from "../context";

export const Query = {
  _version: () => "tauline-1",
  builds: (_: unknown, args: Record<string, unknown>, ctx: GraphQLContext) => findBuilds({ actor: ctx.actor, unsafeInput: args }),
  async build(_: unknown, args: { id: string }, ctx: GraphQLContext) {
    requirePerson(ctx.actor);
    return ctx.loaders.build.load(toId(args.id, "id"));
  },
  async run(_: unknown, args: { id: string }, ctx: GraphQLContext) {
    requirePerson(ctx.actor);
    return ctx.loaders.run.load(toId(args.id, "id"));
  },
  branches: (_: unknown, __: unknown, ctx: GraphQLContext) => findBranches({ actor: ctx.actor }),
  cases: (_: unknown, __: unknown, ctx: GraphQLContext) => findCases({ actor: ctx.actor }),
  async case(_: unknown, args: { key: string }, ctx: GraphQLContext) {
    const [found] = await findCases({ actor: ctx.actor, key: args.key });
    return found ?? null;
  },
  models: (_: unknown, __: unknown, ctx: GraphQLContext) => findModels({ actor: ctx.actor }),
  quantities: (_: unknown, __: unknown, ctx: GraphQLContext) => findQuantityDefinitions({ actor: ctx.actor }),
  trend: (_: unknown, args: Record<string, unknown>, ctx: GraphQLContext) => findTrend({ actor: ctx.actor, unsafeInput: args }),
  releaseGate: (_: unknown, args: { commit: string }, ctx: GraphQLContext) => findReleaseGate({ actor: ctx.actor, commit: args.commit }),
};

function toId(raw: string, field: string): number {
  if (!/^[1-9][0-9]{0,15}$/.test(raw)) throw new AppError("invalid_input", `${field} must be a positive integer id`, [{ path: field, message: "must be a positive integer id" }]);
  return Number(raw);
}
