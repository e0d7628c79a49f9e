import { EnvelopArmorPlugin } from "@escape.tech/graphql-armor";
import type { GraphQLArmorConfig, GraphQLArmorRejectCallback } from "@escape.tech/graphql-armor-types";
import { NoSchemaIntrospectionCustomRule } from "graphql";
import type { Plugin } from "graphql-yoga";

// Limits on the shape of a GraphQL document, checked before anything executes
// (graphql-armor: tokens while parsing, the rest as validation rules). Each is
// set well above the largest operation the app, the CI contract, the gate CLI
// and the bench send (tests/integration/http-graphql-limits.test.ts runs every
// one of them through these same plugins), and far below what it takes to make
// the server work hard: a query that asks for the same list under 20 aliases or
// nests 30 levels deep is an attack, not a dashboard. The CI submission's size
// lives in its variables, which none of these limits count.
export const DOCUMENT_LIMITS = {
  /** Lexical tokens in the document (armor's count; the largest real operation, the gate review, has 140). */
  maxTokens: 1000,
  /** Field nesting, fragments flattened (the deepest real operations reach 5). */
  maxDepth: 8,
  /** Aliased fields (no real operation uses one). */
  maxAliases: 10,
  /** Directives (@include/@skip; no real operation uses one). */
  maxDirectives: 10,
  /**
   * graphql-armor's cost (objects 2, scalars 1, ×1.5 per level). armor also
   * multiplies a field's cost by a literal `first:`/`last:` argument (a variable
   * it cannot see), so the limit must admit the largest page the server itself
   * accepts written inline: a full trend at `last: 5000` costs 171,250, the
   * largest real operation with variables (the mailbox) 456, while a four-level
   * fragment breadth bomb costs over 500,000.
   */
  maxCost: 250_000,
} as const;

/**
 * armor throws its refusal out of parse or validate, where yoga would answer it
 * with 200; marked like this it is a 400, as a client error must be.
 */
const answerWith400: GraphQLArmorRejectCallback = (_context, error) => {
  (error.extensions as Record<string, unknown>).http = { status: 400 };
  (error.extensions as Record<string, unknown>).code = "GRAPHQL_VALIDATION_FAILED";
};

export function armorConfig(production: boolean): GraphQLArmorConfig {
  const refuse = { onReject: [answerWith400] };
  return {
    maxTokens: { n: DOCUMENT_LIMITS.maxTokens, ...refuse },
    maxDepth: { n: DOCUMENT_LIMITS.maxDepth, flattenFragments: true, ...refuse },
    maxAliases: { n: DOCUMENT_LIMITS.maxAliases, ...refuse },
    maxDirectives: { n: DOCUMENT_LIMITS.maxDirectives, ...refuse },
    costLimit: { maxCost: DOCUMENT_LIMITS.maxCost, flattenFragments: true, ...refuse },
    // "Did you mean …?" hints map the schema for someone who may not read it;
    // developers keep them locally.
    blockFieldSuggestion: { enabled: production },
  };
}

/** No __schema / __type outside development: the schema is documented in the repository, not served to strangers. */
function useNoIntrospection(): Plugin {
  return {
    onValidate({ addValidationRule }) {
      addValidationRule(NoSchemaIntrospectionCustomRule);
    },
  };
}

/** The document limits as yoga plugins (introspection refused in production). */
export function documentLimitPlugins(production: boolean): Plugin[] {
  const plugins: Plugin[] = [EnvelopArmorPlugin(armorConfig(production)) as Plugin];
  if (production) plugins.push(useNoIntrospection());
  return plugins;
}
