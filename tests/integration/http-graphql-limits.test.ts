import { readFile, readdir } from "node:fs/promises";
import { Kind, print, type DocumentNode } from "graphql";
import { describe, expect, it } from "vitest";
import { DOCUMENT_LIMITS } from "@/graphql/guards/limits";
import { SUBMIT, ciToken } from "../helpers/graphql";
import { errorMessages, postJson } from "./http-helpers";

// Document limits (graphql/guards/limits.ts): every real operation passes them,
// and each kind of bomb is refused with 400 and a message naming the limit.

/** Every operation document the app, the CI contract, the gate CLI and the tests' submit helper send. */
async function realOperations(): Promise<[string, string][]> {
  const found: [string, string][] = [];
  for (const file of (await readdir("graphql/operations")).filter((f) => f.endsWith(".ts"))) {
    const module = (await import(`@/graphql/operations/${file.replace(/\.ts$/, "")}`)) as Record<string, unknown>;
    for (const [name, value] of Object.entries(module)) {
      if (typeof value === "string" && /^\s*(query|mutation)\b/.test(value)) found.push([`${file} ${name}`, value]);
      else if (value && typeof value === "object" && (value as { kind?: unknown }).kind === Kind.DOCUMENT) {
        found.push([`${file} ${name}`, print(value as DocumentNode)]);
      }
    }
  }
  const sample = JSON.parse(await readFile("fixtures/payloads/sample-build.json", "utf8")) as { query: string };
  found.push(["README curl line (fixtures/payloads/sample-build.json)", sample.query]);
  const gateCli = /const QUERY = \/\* GraphQL \*\/ `([^`]+)`/.exec(await readFile("scripts/gate.ts", "utf8"))?.[1];
  if (!gateCli) throw new Error("scripts/gate.ts no longer holds its query as `const QUERY`; update this test");
  found.push(["npm run gate (scripts/gate.ts)", gateCli]);
  found.push(["tests/helpers SUBMIT", SUBMIT]);
  return found;
}

const PROBE = "fragment H3UnusedProbe on Query { __typename }";

/**
 * Runs `source` through the server's own parse and validation without executing
 * it: an unused fragment is appended, so validation always fails, with that one
 * standard error when the document passed every limit, or with the limit's error
 * (armor throws before the standard rules report). Nothing runs either way.
 */
async function validateOnServer(source: string): Promise<{ status: number; errors: string[] }> {
  const answer = await postJson({ query: `${source}\n${PROBE}` }, { authorization: `Bearer ${ciToken()}` });
  return { status: answer.status, errors: (answer.json?.errors ?? []).map((e) => e.message) };
}

function repeat(n: number, make: (i: number) => string): string {
  return Array.from({ length: n }, (_, i) => make(i)).join(" ");
}

describe("GraphQL document limits", () => {
  it("lets every real operation through the server's parse and validation (nothing executed)", async () => {
    const operations = await realOperations();
    expect(operations.length).toBeGreaterThan(40);
    for (const [name, source] of operations) {
      const outcome = await validateOnServer(source);
      expect({ name, ...outcome }).toEqual({ name, status: 400, errors: ['Fragment "H3UnusedProbe" is never used.'] });
    }
  });

  it("lets a full trend through with its largest page written inline (armor multiplies cost by a literal last:)", async () => {
    // 5000 is the most points trend(…) serves (lib/services/reads.ts); the same document with $last passes trivially.
    const source = `query Full { trend(case: "channel-re590", quantity: "kappa", model: "sst", branch: "main", last: 5000) {
      points { buildId commit version receivedAt value verdict drift driftReason bandVersion reference lower upper marginalMargin } } }`;
    const outcome = await validateOnServer(source);
    expect(outcome).toEqual({ status: 400, errors: ['Fragment "H3UnusedProbe" is never used.'] });
  });

  it("the probe itself reports a limit when one is passed (so the check above can fail)", async () => {
    const outcome = await validateOnServer(`{ ${repeat(DOCUMENT_LIMITS.maxAliases + 1, (i) => `a${i}: branches`)} }`);
    expect(outcome.errors.join(" ")).toMatch(/Aliases limit/i);
    expect(outcome.errors).not.toContain('Fragment "H3UnusedProbe" is never used.');
  });

  it("refuses a depth bomb with 400 naming the depth limit", async () => {
    const depth = DOCUMENT_LIMITS.maxDepth + 4;
    const query = `{ ${"build(id: 1) { runs { ".repeat(depth / 2)} id ${"} } ".repeat(depth / 2)} }`;
    const answer = await postJson({ query }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(400);
    expect(errorMessages(answer)).toContain(`depth limit of ${DOCUMENT_LIMITS.maxDepth} exceeded`);
  });

  it("refuses an alias bomb with 400 naming the alias limit", async () => {
    const query = `{ ${repeat(DOCUMENT_LIMITS.maxAliases + 50, (i) => `a${i}: branches`)} }`;
    const answer = await postJson({ query }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(400);
    expect(errorMessages(answer)).toMatch(new RegExp(`Aliases limit of ${DOCUMENT_LIMITS.maxAliases} exceeded`, "i"));
  });

  it("refuses a directive bomb with 400 naming the directive limit", async () => {
    const query = `{ __typename ${repeat(DOCUMENT_LIMITS.maxDirectives + 5, () => "@include(if: true)")} }`;
    const answer = await postJson({ query }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(400);
    expect(errorMessages(answer)).toMatch(new RegExp(`Directives limit of ${DOCUMENT_LIMITS.maxDirectives} exceeded`, "i"));
  });

  it("refuses a token bomb with 400 naming the token limit, before validation", async () => {
    const query = `{ ${repeat(DOCUMENT_LIMITS.maxTokens + 10, () => "__typename")} }`;
    const answer = await postJson({ query }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(400);
    expect(errorMessages(answer)).toMatch(new RegExp(`Token limit of ${DOCUMENT_LIMITS.maxTokens} exceeded`, "i"));
  });

  it("refuses a breadth bomb of nested fragments (few tokens, huge cost) with 400 naming the cost limit", async () => {
    // Each level spreads the one below ten times: 10^4 copies of the build's fields in ~200 tokens.
    const levels = [`fragment L0 on Build { id commit branch version verdict receivedAt }`];
    for (let i = 1; i <= 4; i++) levels.push(`fragment L${i} on Build { ${repeat(10, () => `...L${i - 1}`)} }`);
    const query = `query Breadth { build(id: 1) { ...L4 } } ${levels.join(" ")}`;
    const answer = await postJson({ query }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(400);
    expect(errorMessages(answer)).toMatch(new RegExp(`Cost limit of ${DOCUMENT_LIMITS.maxCost} exceeded`, "i"));
  });
});
