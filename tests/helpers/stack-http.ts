import { SUBMIT } from "./graphql";
import { CI_TOKEN } from "./stack";

// HTTP to one instance of a private test stack (tests/helpers/graphql.ts talks
// to the suite's shared app through TAULINE_TEST_URL).

export interface StackResponse<T> {
  status: number;
  headers: Headers;
  body: { data?: T | null; errors?: { message: string; extensions?: { code?: string } }[] };
}

/** Posts a GraphQL request body (already serialised, so a large payload is built once) with the stack's CI token. */
export async function postAt<T = Record<string, unknown>>(base: string, body: string, { timeoutMs = 45_000 } = {}): Promise<StackResponse<T>> {
  const res = await fetch(`${base}/api/graphql`, {
    method: "POST",
    headers: { "content-type": "application/json", accept: "application/graphql-response+json, application/json", authorization: `Bearer ${CI_TOKEN}` },
    body,
    signal: AbortSignal.timeout(timeoutMs),
  });
  const text = await res.text();
  try {
    return { status: res.status, headers: res.headers, body: JSON.parse(text) };
  } catch {
    throw new Error(`non-JSON answer (${res.status}): ${text.slice(0, 300)}`);
  }
}

export type Receipt = { submitResults: { build: { id: string; verdict: string }; runs: { id: string }[] } };

/** The submitResults request for one build. */
export function submitBody(input: { build: Record<string, unknown>; runs: unknown[] }): string {
  return JSON.stringify({ query: SUBMIT, variables: { input } });
}

/**
 * k = k0 [1 + (Cε2 − 1) ε0 t / k0]^(−1/(Cε2 − 1)): the k–ε decay of isotropic
 * turbulence (reference sheet §2.2). With Cε2 = 1.87 instead of Launder &
 * Spalding's 1.92 (sheet §3.1) the decay exponent is 1/0.87 = 1.149, outside the
 * k–ε band 1.076 – 1.098, so the build is outside and raises an alert.
 */
export function outsideDecayRun(cEps2 = 1.87) {
  const t = Array.from({ length: 60 }, (_, i) => i * 0.5);
  const y = t.map((ti) => 1.5 * Math.pow(1 + ((cEps2 - 1) * 0.9 * ti) / 1.5, -1 / (cEps2 - 1)));
  return { case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [{ key: "k_decay", x: t, y }] };
}

export interface HealthBody {
  status: string;
  database: string;
  latencyMs?: number;
  mail?: Record<string, unknown>;
  worker?: { state: string; since: string | null; lastError: string | null };
}

export async function getHealth(base: string): Promise<{ status: number; body: HealthBody; ms: number }> {
  const started = performance.now();
  const res = await fetch(`${base}/api/health`, { signal: AbortSignal.timeout(10_000) });
  return { status: res.status, body: (await res.json()) as HealthBody, ms: performance.now() - started };
}
