import { reviseBand } from "@/lib/services/bands";
import type { GraphQLContext } from "../context";

export const bandMutations = {
  reviseBand: (_: unknown, args: { input: unknown }, ctx: GraphQLContext) => reviseBand({ actor: ctx.actor, unsafeInput: args.input }),
};
