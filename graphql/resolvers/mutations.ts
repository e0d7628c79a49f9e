import { submitResults } from "@/lib/services/ingest";
import type { GraphQLContext } from "../context";

export const Mutation = {
  async submitResults(_: unknown, args: { input: unknown }, ctx: GraphQLContext) {
    const result = await submitResults({ actor: ctx.actor, unsafeInput: args.input });
    const [build, runs] = await Promise.all([ctx.loaders.build.load(result.buildId), Promise.all(result.runIds.map((id) => ctx.loaders.run.load(id)))]);
    return { build, runs, created: result.created };
  },
};
