import type autocannon from "autocannon";
import type { LoadPhase } from "./drain";
import { createRandomCommit, type BodyTemplate } from "./payload";
import { readGraphQLError, type Recorder } from "./recorder";

// The CI side of the load: each connection posts one submission after another,
// every request under a commit never used before, and keeps the receipt the
// server answered with, for the database check afterwards.

export interface Posted {
  commit: string;
  branch: string;
  runCount: number;
  /** Built after the drain began: its connection was closed before it could be written. */
  afterDrain: boolean;
  answer: { status: number; receipt: Receipt | null; error: string | null } | null;
}

export interface Receipt {
  buildId: string;
  runIds: string[];
}

export interface CiLedger {
  posted: Map<string, Posted>;
}

interface ReceiptBody {
  data?: { submitResults?: { build?: { id?: string; commit?: string }; runs?: { id: string }[] } | null } | null;
}

export const CI_KIND = "submit";

export function createCiOptions({ url, token, pool, connections, timeoutSeconds, phase, recorder }: {
  url: string;
  token: string;
  pool: BodyTemplate[];
  connections: number;
  timeoutSeconds: number;
  phase: LoadPhase;
  recorder: Recorder;
}): { options: autocannon.Options; ledger: CiLedger } {
  const ledger: CiLedger = { posted: new Map() };
  let next = 0;
  const request: autocannon.Request = {
    method: "POST",
    path: "/api/graphql",
    headers: { "content-type": "application/json", accept: "application/graphql-response+json, application/json", authorization: `Bearer ${token}` },
    setupRequest(req, context) {
      const template = pool[next++ % pool.length];
      const commit = createRandomCommit();
      ledger.posted.set(commit, { commit, branch: template.branch, runCount: template.runCount, afterDrain: phase.draining, answer: null });
      (context as { commit?: string }).commit = commit;
      return { ...req, body: template.fill(commit) };
    },
    onResponse(status, body, context) {
      const posted = ledger.posted.get((context as { commit?: string }).commit ?? "");
      if (!posted) return recorder.recordBodyError(CI_KIND, "answer to a request the client has no record of");
      const error = status >= 200 && status < 300 ? checkReceipt(body, posted) : readGraphQLError(body) ?? `HTTP ${status}`;
      posted.answer = { status, receipt: error ? null : readReceipt(body), error };
      if (!error) return;
      if (status >= 200 && status < 300) recorder.recordBodyError(CI_KIND, error);
      else recorder.recordMessage(CI_KIND, `${status} ${error}`);
    },
  };
  return {
    ledger,
    options: { url, connections, timeout: timeoutSeconds, pipelining: 1, requests: [request] },
  };
}

/** Null when the body is a receipt for exactly the build and runs posted; otherwise what is wrong. */
function checkReceipt(body: string, posted: Posted): string | null {
  const gqlError = readGraphQLError(body);
  if (gqlError) return gqlError;
  const receipt = (JSON.parse(body) as ReceiptBody).data?.submitResults;
  if (!receipt?.build?.id) return "2xx answer without a receipt";
  if (receipt.build.commit !== posted.commit) return `receipt names commit ${receipt.build.commit}, posted ${posted.commit}`;
  const runs = receipt.runs ?? [];
  if (runs.length !== posted.runCount) return `receipt lists ${runs.length} runs, posted ${posted.runCount}`;
  return null;
}

function readReceipt(body: string): Receipt {
  const receipt = (JSON.parse(body) as ReceiptBody).data!.submitResults!;
  return { buildId: receipt.build!.id!, runIds: (receipt.runs ?? []).map((r) => r.id) };
}
