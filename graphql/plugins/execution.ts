import type { Plugin } from "graphql-yoga";
import { useStatementCount } from "./statement-count";

// Plugins that change how operations execute (owned by the read-path work of
// issue 5). graphql/server.ts appends them after the HTTP-level plugins.
export const executionPlugins: Plugin[] = [useStatementCount()];
