import { expect } from "vitest";
import { testDb } from "../helpers/db";
import { SUBMIT, ciToken, type GraphQLResponse } from "../helpers/graphql";
import { requireEnv } from "../helpers/env";

// Shared by the hostile-submission tests: raw posts (some bodies are not JSON),
// a valid-looking submission to spoil one field of, and the two assertions every
// refusal makes — a 400 naming the field path, and nothing stored for the commit.

export type Refusal = GraphQLResponse<{ submitResults: { created: boolean } }>;

/** Posts a body as given (it may be non-JSON) with the CI token, as curl in a CI job would. */
export async function postRawSubmission(body: string): Promise<Refusal> {
  const res = await fetch(`${requireEnv("TAULINE_TEST_URL")}/api/graphql`, {
    method: "POST",
    headers: { "content-type": "application/json", accept: "application/graphql-response+json, application/json", authorization: `Bearer ${ciToken()}` },
    body,
  });
  const text = await res.text();
  return { status: res.status, body: JSON.parse(text) as Refusal["body"] };
}

export function submitBody(input: unknown): string {
  return JSON.stringify({ query: SUBMIT, variables: { input } });
}

export function hostileSubmission(commit: string, runs: unknown[], build: Record<string, unknown> = {}) {
  return { build: { solver: "Cormorant", version: "9.9.0-hostile", commit, branch: "test/h1/hostile", ...build }, runs };
}

/** A short residual history (falls 4 decades) that is valid for any case. */
export function residual(n = 20) {
  const x = Array.from({ length: n }, (_, i) => (i + 1) * 10);
  return { key: "residual", x, y: x.map((_, i) => 10 ** ((-4 * i) / (n - 1))) };
}

/**
 * The refusal is a 400 whose error names `path`: as a per-field issue
 * (extensions.issues, from the submission schema) or, for a value GraphQL's own
 * Float refuses before our code runs, inside the message GraphQL writes
 * (`… at "input.runs[0].quantities[0].value"; Float cannot represent …`).
 */
export function expectRefusedAt(res: Refusal, path: string, message?: RegExp) {
  expect(res.status).toBe(400);
  expect(res.body.data ?? null).toBeNull();
  const errors = res.body.errors ?? [];
  expect(errors.length).toBeGreaterThan(0);
  const issues = errors.flatMap((e) => e.extensions?.issues ?? []);
  const named = issues.find((i) => i.path === path);
  if (named) {
    if (message) expect(named.message).toMatch(message);
    return;
  }
  const text = errors.map((e) => e.message).join("\n");
  expect(text).toContain(`"${path}"`);
  if (message) expect(text).toMatch(message);
}

/** Counts everything a submission of this commit could have written. */
export async function countStored(commit: string) {
  const db = testDb();
  const row = await db
    .select(
      db.raw("(select count(*) from builds b where b.commit = ?)::int as builds", [commit]),
      db.raw("(select count(*) from runs r join builds b on b.id = r.build_id where b.commit = ?)::int as runs", [commit]),
      db.raw("(select count(*) from run_series s join runs r on r.id = s.run_id join builds b on b.id = r.build_id where b.commit = ?)::int as series", [commit]),
      db.raw("(select count(*) from quantity_values v join builds b on b.id = v.build_id where b.commit = ?)::int as quantity_values", [commit]),
      db.raw("(select count(*) from submissions s join builds b on b.id = s.build_id where b.commit = ?)::int as submissions", [commit]),
    )
    .first();
  return row as { builds: number; runs: number; series: number; quantity_values: number; submissions: number };
}

export async function expectNothingStored(commit: string) {
  expect(await countStored(commit)).toEqual({ builds: 0, runs: 0, series: 0, quantity_values: 0, submissions: 0 });
}
