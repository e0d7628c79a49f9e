// npm run gate -- --url URL --commit SHA [--token TOKEN] [--json]
//
// Asks a Tauline server whether a commit may be released, through the same
// releaseGate query CI sends, and exits 0 when approved, 1 when held, rejected
// or still pending (printing what blocks), 2 on any error (bad arguments, no
// token, server unreachable, not a Tauline URL, refused token, GraphQL error).
// A stand-alone client: it imports nothing of the app, so it runs anywhere Node does.
import { parseArgs } from "node:util";
import { z } from "zod";

const USAGE = "usage: npm run gate -- --url <Tauline URL> --commit <hash> [--token <CI token>] [--json]\n  the token may also come from TAULINE_CI_TOKEN";

const argsSchema = z.object({
  url: z.url({ protocol: /^https?$/, error: "--url must be an http(s) URL, e.g. http://127.0.0.1:3000" }),
  commit: z.string({ error: "--commit is required" }).trim().regex(/^[0-9a-fA-F]{7,64}$/, "--commit must be 7 to 64 hexadecimal digits"),
  token: z.string({ error: "no CI token: pass --token or set TAULINE_CI_TOKEN" }).trim().regex(/^[\x21-\x7e]{16,512}$/, "the CI token must be 16 to 512 printable characters"),
  json: z.boolean(),
});

const QUERY = /* GraphQL */ `
  query Gate($commit: String!) {
    releaseGate(commit: $commit) {
      commit state blocking
      build { id solver version branch receivedAt }
      decision { state comment decidedBy decidedAt }
      blockers { case model grid quantity blockReason }
      waived { case model grid quantity waiver { id reason grantedBy expiresAt } }
    }
  }
`;

interface Finding { case: string; model: string; grid: string; quantity: string | null; blockReason: string | null; waiver?: { id: string; reason: string; grantedBy: string; expiresAt: string } | null }
interface Gate {
  commit: string;
  state: "pending" | "approved" | "held" | "rejected";
  blocking: string[];
  build: { id: string; solver: string; version: string; branch: string; receivedAt: string } | null;
  decision: { state: string; comment: string; decidedBy: string; decidedAt: string } | null;
  blockers: Finding[];
  waived: Finding[];
}

class CliError extends Error {}

function readArgs(argv: string[]) {
  let values;
  try {
    ({ values } = parseArgs({ args: argv, options: { url: { type: "string" }, commit: { type: "string" }, token: { type: "string" }, json: { type: "boolean" }, help: { type: "boolean", short: "h" } }, strict: true, allowPositionals: false }));
  } catch (e) {
    throw new CliError(`${(e as Error).message}\n${USAGE}`);
  }
  if (values.help) return null;
  // The CLI's own environment, not the app's (lib/env.ts validates the server's settings).
  const r = argsSchema.safeParse({ ...values, token: values.token ?? process.env.TAULINE_CI_TOKEN, json: values.json ?? false });
  if (!r.success) throw new CliError(`${r.error.issues.map((i) => i.message).join("\n")}\n${USAGE}`);
  return r.data;
}

async function fetchGate({ url, commit, token }: { url: string; commit: string; token: string }): Promise<Gate> {
  const endpoint = new URL(/\/api\/graphql\/?$/.test(new URL(url).pathname) ? url : `${url.replace(/\/+$/, "")}/api/graphql`);
  let res: Response;
  try {
    res = await fetch(endpoint, {
      method: "POST",
      headers: { "content-type": "application/json", accept: "application/json", authorization: `Bearer ${token}` },
      body: JSON.stringify({ query: QUERY, variables: { commit } }),
      signal: AbortSignal.timeout(30_000),
    });
  } catch (e) {
    const cause = (e as { cause?: { code?: string } }).cause?.code ?? (e as Error).name;
    throw new CliError(`cannot reach ${endpoint.origin} (${cause})`);
  }
  const text = await res.text();
  let body: { data?: { releaseGate?: Gate | null } | null; errors?: { message: string; extensions?: { code?: string } }[] };
  try {
    body = JSON.parse(text);
  } catch {
    throw new CliError(`${endpoint.href} answered HTTP ${res.status} without a GraphQL reply; is this a Tauline server?`);
  }
  if (body.errors?.length) throw new CliError(`${body.errors.map((e) => `${e.extensions?.code ?? "ERROR"}: ${e.message}`).join("\n")} (HTTP ${res.status})`);
  if (!res.ok || !body.data?.releaseGate) throw new CliError(`${endpoint.href} answered HTTP ${res.status} without a gate state`);
  return body.data.releaseGate;
}

function describe(gate: Gate): string {
  const run = (f: Finding) => `${f.case}/${f.model}/${f.grid}`;
  const lines = [
    gate.build ? `${gate.build.solver} ${gate.build.version} (${gate.commit.slice(0, 12)}) on ${gate.build.branch}` : `commit ${gate.commit}: no build posted`,
    `gate: ${gate.state}`,
    gate.decision ? `  ${gate.decision.state} by ${gate.decision.decidedBy} at ${gate.decision.decidedAt}: ${gate.decision.comment}` : "  no decision yet",
  ];
  const blocking = gate.build ? gate.blockers.map((f) => `${run(f)}: ${f.blockReason}`) : gate.blocking;
  if (blocking.length) lines.push(`blocking approval (${blocking.length}):`, ...blocking.map((b) => `  x ${b}`));
  else lines.push("nothing blocks approval");
  if (gate.waived.length) {
    lines.push(`let through by a waiver (${gate.waived.length}):`);
    for (const f of gate.waived) lines.push(`  ~ ${run(f)}: ${f.quantity} — waiver ${f.waiver?.id} by ${f.waiver?.grantedBy} until ${f.waiver?.expiresAt}: ${f.waiver?.reason}`);
  }
  return lines.join("\n");
}

async function main(): Promise<number> {
  const args = readArgs(process.argv.slice(2));
  if (!args) {
    console.log(USAGE);
    return 0;
  }
  const gate = await fetchGate(args);
  console.log(args.json ? JSON.stringify(gate, null, 2) : describe(gate));
  return gate.state === "approved" ? 0 : 1;
}

main().then(
  (code) => process.exit(code),
  (e: unknown) => {
    console.error(`gate: ${e instanceof CliError ? e.message : (e as Error).stack ?? String(e)}`);
    process.exit(2);
  },
);
