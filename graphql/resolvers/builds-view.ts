import type { ComparedRun as ComparedRunValue } from "@/lib/services/builds-view-join";
import { findBuildTable } from "@/lib/services/builds-view";
import { findBuildComparison } from "@/lib/services/builds-view-compare";
import type { GraphQLContext } from "../context";

// Guard clauses live in the services (role check, zod parsing); resolvers only map.
export const buildsViewQueries = {
  buildTable: (_: unknown, args: Record<string, unknown>, ctx: GraphQLContext) => findBuildTable({ actor: ctx.actor, unsafeInput: args }),
  buildComparison: (_: unknown, args: Record<string, unknown>, ctx: GraphQLContext) => findBuildComparison({ actor: ctx.actor, unsafeInput: args }),
};

export const ComparedRun = {
  runId: (r: ComparedRunValue) => r.run?.id ?? null,
  otherRunId: (r: ComparedRunValue) => r.otherRun?.id ?? null,
  status: (r: ComparedRunValue) => r.run?.status ?? null,
  otherStatus: (r: ComparedRunValue) => r.otherRun?.status ?? null,
  verdict: (r: ComparedRunValue) => r.run?.verdict ?? null,
  otherVerdict: (r: ComparedRunValue) => r.otherRun?.verdict ?? null,
};

export const buildsViewResolvers = { Query: buildsViewQueries, ComparedRun };
