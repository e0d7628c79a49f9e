import { requireEnv } from "./env";

export interface GraphQLResponse<T = Record<string, unknown>> {
  status: number;
  body: { data?: T | null; errors?: { message: string; path?: string[]; extensions?: { code?: string; issues?: { path: string; message: string }[] } }[] };
}

/** Posts a GraphQL operation over real HTTP to the running app (started by `npm test`). */
export async function postGraphQL<T = Record<string, unknown>>({
  query,
  variables,
  token,
  cookie,
  headers = {},
}: {
  query: string;
  variables?: Record<string, unknown>;
  token?: string | null;
  cookie?: string;
  headers?: Record<string, string>;
}): Promise<GraphQLResponse<T>> {
  const res = await fetch(`${requireEnv("TAULINE_TEST_URL")}/api/graphql`, {
    method: "POST",
    headers: {
      "content-type": "application/json",
      accept: "application/graphql-response+json, application/json",
      ...(token ? { authorization: `Bearer ${token}` } : {}),
      ...(cookie ? { cookie } : {}),
      ...headers,
    },
    body: JSON.stringify({ query, variables }),
  });
  const text = await res.text();
  let body: GraphQLResponse<T>["body"];
  try {
    body = JSON.parse(text);
  } catch {
    throw new Error(`non-JSON answer (${res.status}): ${text.slice(0, 300)}`);
  }
  return { status: res.status, body };
}

export const ciToken = () => requireEnv("TAULINE_CI_TOKEN");

/** A fresh 40-digit commit hash so that tests never collide with each other or the demo. */
export function randomCommit(): string {
  let s = "";
  for (let i = 0; i < 40; i++) s += "0123456789abcdef"[Math.floor(Math.random() * 16)];
  return s;
}

export const RECEIPT_FIELDS = /* GraphQL */ `
  created
  build { id verdict commit branch gate runCounts { within marginal outside unbanded missing } }
  runs {
    id case model grid status verdict
    quantities { key value origin verdict reference source lower upper baselineDelta drift driftReason details }
  }
`;

export const SUBMIT = /* GraphQL */ `
  mutation Submit($input: ResultSubmission!) { submitResults(input: $input) { ${RECEIPT_FIELDS} } }
`;
