import { createSchema } from "graphql-yoga";
import type { GraphQLContext } from "../context";
import { bandMutations } from "../resolvers/bands";
import { Mutation } from "../resolvers/mutations";
import { Query } from "../resolvers/queries";
import { DateTime, JSONScalar } from "../resolvers/scalars";
import * as types from "../resolvers/types";
import { bandsTypeDefs } from "./bands";
import { baseTypeDefs } from "./base";
import { buildsTypeDefs } from "./builds";
import { libraryTypeDefs } from "./library";
import { submissionTypeDefs } from "./submission";

export const schema = createSchema<GraphQLContext>({
  typeDefs: [baseTypeDefs, submissionTypeDefs, buildsTypeDefs, libraryTypeDefs, bandsTypeDefs],
  resolvers: { DateTime, JSON: JSONScalar, Query, Mutation: { ...Mutation, ...bandMutations }, ...types },
});
