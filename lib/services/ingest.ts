import "server-only";
import { getDb } from "@/db";
import { prepared } from "@/db/prepared";
import { insertAuditEntry } from "@/db/queries/audit";
import { getBaselineBuild, setBuildVerdict, upsertBuildForUpdate } from "@/db/queries/builds";
import { getBandsInForce, getCases, getModelKeys, type CaseRow } from "@/db/queries/library";
import { getRecentValues, getValuesOfBuild } from "@/db/queries/quantity-values";
import { getRunsByKeys } from "@/db/queries/runs";
import { deriveRunQuantities, type RunDerivation } from "@/lib/evaluation/derive";
import { DRIFT_WINDOW } from "@/lib/evaluation/judge";
import type { BandInForce, FitSettings } from "@/lib/evaluation/types";
import { AppError, formatPath, type FieldIssue } from "@/lib/errors";
import { submissionSchema, type ResultSubmission, type RunSubmission } from "@/lib/validation/submission";
import { actorUserId, type Actor } from "./actor";
import { recordAlertsForSubmission, sendQueuedAlerts } from "./alerts";
import { requireSubmitter } from "./authorize";
import { storeRuns } from "./ingest-store";

export interface SubmissionResult {
  buildId: number;
  runIds: number[];
  /** The case × model × grid of each run, in the order posted (the receipt reads the runs by these). */
  runKeys: { case: string; model: string; grid: string }[];
  created: boolean;
}

/**
 * The one ingest path (CI mutation, manual upload, demo seed): validate, derive,
 * then store raw data, judged quantities and the build verdict in ONE transaction,
 * so a failure anywhere leaves nothing of the submission behind. Re-posting the
 * same commit replaces the runs with the same case × model × grid.
 */
export async function submitResults({
  actor,
  unsafeInput,
  receivedAt,
}: {
  actor: Actor | null;
  unsafeInput: unknown;
  /** Only the demo seed back-dates builds; CI posts are stamped by the database. */
  receivedAt?: Date;
}): Promise<SubmissionResult> {
  requireSubmitter(actor);
  const input = parseSubmission(unsafeInput);
  const db = getDb();

  // The library lookups are independent, so they go out together: bands are read
  // for the case keys as posted (an unknown key finds none and is refused below).
  const caseKeys = [...new Set(input.runs.map((r) => r.case))];
  const [cases, modelKeys, bands] = await Promise.all([
    getCases({ db, keys: caseKeys }),
    getModelKeys({ db }),
    getBandsInForce({ db, caseKeys, at: receivedAt }),
  ]);
  const caseByKey = new Map(cases.map((c) => [c.key, c]));
  checkReferences(input, caseByKey, modelKeys);

  const derived = input.runs.map((run) => deriveRunQuantities(run, settingsLookup(run, caseByKey.get(run.case)!, bands)));

  const outcome = await db.transaction(async (trx) => {
    const { row: build, created } = await upsertBuildForUpdate({ db: trx, build: input.build, receivedAt });
    if (build.branch !== input.build.branch) {
      throw new AppError("conflict", `Build ${build.commit} was first posted on branch ${build.branch}.`, [
        { path: "input.build.branch", message: `must be ${build.branch} for commit ${build.commit}` },
      ]);
    }
    const baseline = await getBaselineBuild({ db: trx, branch: build.branch, before: build.received_at, excludeId: build.id });
    const baselineValues = baseline ? await getValuesOfBuild({ db: trx, buildId: baseline.id }) : new Map<string, number | null>();
    const history = await getRecentValues({
      db: trx,
      branch: build.branch,
      before: build.received_at,
      keys: judgedKeys(input.runs, derived, bands),
      perKey: DRIFT_WINDOW - 1,
    });

    const { runIds, alarming } = await storeRuns(trx, {
      build,
      created,
      runs: input.runs,
      derived,
      bandsFor: (run) => bandsForRun(run, bands),
      baseline: baseline ? { buildId: baseline.id, values: baselineValues } : null,
      history,
    });

    const verdict = await setBuildVerdict({ db: trx, buildId: build.id });
    // A build created by this post holds only its runs: when none of them is
    // alarming, the alert check (three reads of what was just written) can only say no.
    const alerts = created && !alarming ? { outboxIds: [] } : await recordAlertsForSubmission(trx, { buildId: build.id, backdated: receivedAt !== undefined });
    const submission = trx("submissions").insert({
      build_id: build.id,
      ci_token_id: actor.kind === "ci" ? actor.tokenId : null,
      user_id: actorUserId(actor),
      run_count: input.runs.length,
      ...(receivedAt ? { received_at: receivedAt } : {}),
    });
    await submission.options(prepared(submission.toSQL().sql));
    await insertAuditEntry({
      db: trx,
      entry: {
        actorUserId: actorUserId(actor),
        actorLabel: actor.label,
        action: created ? "build.submitted" : "build.resubmitted",
        entity: "build",
        entityId: build.id,
        details: { commit: build.commit, branch: build.branch, runs: input.runs.length, verdict },
        at: receivedAt,
      },
    });
    const runKeys = input.runs.map((r) => ({ case: r.case, model: r.model, grid: r.grid }));
    return { result: { buildId: build.id, runIds, runKeys, created }, outboxIds: alerts.outboxIds };
  });
  // Only after commit: a delivery job must find the outbox row it names.
  await sendQueuedAlerts(outcome.outboxIds);
  return outcome.result;
}

/**
 * The runs a receipt reports: those stored now under the submission's keys. A
 * concurrent re-post of the same build may have replaced the rows this one
 * inserted between its commit and this read; the receipt then shows the
 * replacement (same keys, same build) instead of failing on a vanished id.
 */
export async function readReceiptRuns(result: SubmissionResult) {
  return getRunsByKeys({ db: getDb(), buildId: result.buildId, runs: result.runKeys });
}

export function parseSubmission(unsafeInput: unknown): ResultSubmission {
  const parsed = submissionSchema.safeParse(unsafeInput);
  if (parsed.success) return parsed.data;
  const issues: FieldIssue[] = parsed.error.issues.slice(0, 50).map((i) => ({ path: formatPath(i.path, "input"), message: i.message }));
  throw new AppError("invalid_input", describeIssues(issues), issues);
}

function describeIssues(issues: FieldIssue[]): string {
  const head = issues.slice(0, 3).map((i) => `${i.path} ${i.message}`).join("; ");
  return issues.length > 3 ? `${head}; and ${issues.length - 3} more` : head;
}

function checkReferences(input: ResultSubmission, cases: Map<string, CaseRow>, models: Set<string>) {
  const issues: FieldIssue[] = [];
  input.runs.forEach((run, i) => {
    if (!cases.has(run.case)) issues.push({ path: `input.runs[${i}].case`, message: `is not a known case: "${run.case}"` });
    if (!models.has(run.model)) issues.push({ path: `input.runs[${i}].model`, message: `is not a known turbulence model: "${run.model}"` });
  });
  if (issues.length) throw new AppError("invalid_input", describeIssues(issues), issues);
}

/** The model's own band for a quantity, else the case-wide one. */
function bandsForRun(run: RunSubmission, bands: BandInForce[]): Map<string, BandInForce> {
  const out = new Map<string, BandInForce>();
  for (const b of bands) {
    if (b.caseKey !== run.case) continue;
    if (b.modelKey === null && !out.has(b.quantityKey)) out.set(b.quantityKey, b);
    if (b.modelKey === run.model) out.set(b.quantityKey, b);
  }
  return out;
}

function settingsLookup(run: RunSubmission, caseRow: CaseRow, bands: BandInForce[]) {
  const own = bandsForRun(run, bands);
  return (key: string): FitSettings => ({ ...caseRow.parameters, ...(own.get(key)?.fitSettings ?? {}) });
}

/**
 * The (case, model, grid, quantity) keys whose history the judging reads: drift
 * is judged only for a value that has a band (the band gives the noise floor),
 * so reported scalars without a band need no history lookup.
 */
function judgedKeys(runs: RunSubmission[], derived: RunDerivation[], bands: BandInForce[]) {
  return runs.flatMap((run, i) => {
    const banded = bandsForRun(run, bands);
    return derived[i].quantities
      .filter((q) => q.value !== null && banded.has(q.key))
      .map((q) => ({ caseKey: run.case, modelKey: run.model, grid: run.grid, quantityKey: q.key }));
  });
}
