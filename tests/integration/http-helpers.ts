import { requireEnv } from "../helpers/env";

// Raw HTTP for the hardening tests: they send what no well-behaved client would
// (wrong content types, forged origins, unending bodies), so they talk to the
// route with fetch or node:http directly instead of tests/helpers/graphql.ts.

export const baseUrl = () => requireEnv("TAULINE_TEST_URL");
export const graphqlUrl = () => `${baseUrl()}/api/graphql`;

export interface RawAnswer {
  status: number;
  headers: Headers;
  text: string;
  /** The parsed body when it is JSON, else null. */
  json: { data?: unknown; errors?: { message: string; extensions?: { code?: string } }[] } | null;
}

export async function send(path: string, init: RequestInit = {}): Promise<RawAnswer> {
  const res = await fetch(`${baseUrl()}${path}`, { redirect: "manual", ...init });
  const text = await res.text();
  let json: RawAnswer["json"] = null;
  try {
    json = JSON.parse(text);
  } catch {
    json = null;
  }
  return { status: res.status, headers: res.headers, text, json };
}

/** POSTs a GraphQL request as JSON with the given extra headers. */
export function postJson(body: unknown, headers: Record<string, string> = {}): Promise<RawAnswer> {
  return send("/api/graphql", {
    method: "POST",
    headers: { "content-type": "application/json", accept: "application/graphql-response+json, application/json", ...headers },
    body: typeof body === "string" ? body : JSON.stringify(body),
  });
}

export function errorMessages(answer: RawAnswer): string {
  return (answer.json?.errors ?? []).map((e) => e.message).join(" | ");
}

/**
 * Whether the server under test is `next dev` or a production build. Under
 * `npm test` it is production; against the shared dev stack it is development.
 * Judged from what Next itself serves (development bundles and the hot-reload
 * bootstrap in the HTML), not from anything Tauline sets, so that the tests of
 * production-only behaviour cannot agree with a wrong mode.
 */
export async function detectServerMode(): Promise<"development" | "production"> {
  const page = await send("/sign-in");
  if (page.status !== 200) throw new Error(`GET /sign-in answered ${page.status}; cannot tell the server's mode`);
  return /__nextHmr|react-dom-client[._]development|\/_next\/static\/development\//.test(page.text) ? "development" : "production";
}
