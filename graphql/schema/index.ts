import { createSchema } from "graphql-yoga";
import type { GraphQLContext } from "../context";
import { adminResolvers } from "../resolvers/admin";
import { alertsResolvers } from "../resolvers/alerts";
import { bandMutations } from "../resolvers/bands";
import { buildsViewResolvers } from "../resolvers/builds-view";
import { caseLibraryResolvers } from "../resolvers/case-library";
import { gateResolvers } from "../resolvers/gate";
import { libraryEditResolvers } from "../resolvers/library-edit";
import { Mutation } from "../resolvers/mutations";
import { overviewResolvers } from "../resolvers/overview";
import { Query } from "../resolvers/queries";
import { QuantityBandView, RunView } from "../resolvers/run-view";
import { DateTime, FloatSeries, JSONScalar } from "../resolvers/scalars";
import { trendsResolvers } from "../resolvers/trends";
import * as types from "../resolvers/types";
import { adminTypeDefs } from "./admin";
import { alertsTypeDefs } from "./alerts";
import { bandsTypeDefs } from "./bands";
import { baseTypeDefs } from "./base";
import { buildsTypeDefs } from "./builds";
import { buildsViewTypeDefs } from "./builds-view";
import { caseLibraryTypeDefs } from "./case-library";
import { gateTypeDefs } from "./gate";
import { libraryTypeDefs } from "./library";
import { libraryEditTypeDefs } from "./library-edit";
import { overviewTypeDefs } from "./overview";
import { runViewTypeDefs } from "./run-view";
import { submissionTypeDefs } from "./submission";
import { trendsTypeDefs } from "./trends";

export const schema = createSchema<GraphQLContext>({
  typeDefs: [baseTypeDefs, submissionTypeDefs, buildsTypeDefs, libraryTypeDefs, bandsTypeDefs, buildsViewTypeDefs, overviewTypeDefs, trendsTypeDefs, caseLibraryTypeDefs, runViewTypeDefs, gateTypeDefs, adminTypeDefs, libraryEditTypeDefs, alertsTypeDefs],
  // Resolver maps merge field by field (graphql-tools), so screen modules add Query fields and types.
  resolvers: [{ DateTime, JSON: JSONScalar, FloatSeries, Query, Mutation: { ...Mutation, ...bandMutations }, ...types }, overviewResolvers, trendsResolvers, caseLibraryResolvers, buildsViewResolvers, { Run: RunView, QuantityValue: QuantityBandView }, gateResolvers, adminResolvers, libraryEditResolvers, alertsResolvers],
});
