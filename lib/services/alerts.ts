import "server-only";
import type { Db } from "@/db";
import { getAlertBuild, getAlertQuantities, getIncompleteRuns, type AlertQuantityRow } from "@/db/queries/alert-facts";
import { insertDigestItems } from "@/db/queries/digest-items";
import { insertOutboxMessage } from "@/db/queries/outbox";
import { findAlertRecipients } from "@/db/queries/subscriptions";
import { getEnv } from "@/lib/env";
import { nudgeMailDelivery } from "@/lib/jobs/nudge";
import { alertCaseKeys, alertEventKey, needsAlert, type AlertFacts } from "@/lib/mail/alert-facts";
import { composeAlert } from "@/lib/mail/compose-alert";

/**
 * Called by the ingest inside the submission's transaction, after the build
 * verdict is stored: when the build is outside (a quantity left its band or a
 * run did not complete) or a value drifts, queue ONE message for the event.
 *
 * Who hears of it: every active release manager (To) and every active person
 * whose subscription matches a case of the alert and the branch (Bcc, so
 * subscribers do not see each other). Administrators are not mailed for being
 * administrators: their role is people and tokens, and they subscribe like
 * anyone else. Digest subscribers who get nothing at once get a digest item.
 *
 * The demo seed back-dates its builds; that history raises no mail.
 */
export async function recordAlertsForSubmission(trx: Db, { buildId, backdated }: { buildId: number; backdated: boolean }): Promise<{ outboxIds: number[] }> {
  if (backdated) return { outboxIds: [] };
  const facts = await readAlertFacts(trx, buildId);
  if (!facts || !needsAlert(facts)) return { outboxIds: [] };

  const eventKey = alertEventKey(facts);
  const people = await findAlertRecipients({ db: trx, branch: facts.build.branch, caseKeys: alertCaseKeys(facts) });
  const to = people.filter((p) => p.release_manager).map((p) => p.email);
  const bcc = people.filter((p) => !p.release_manager && p.immediate).map((p) => p.email);
  const digest = people.filter((p) => !p.release_manager && !p.immediate && p.digest);

  await insertDigestItems({ db: trx, items: digest.map((p) => ({ userId: p.user_id, eventKey, buildId, facts })) });
  if (to.length + bcc.length === 0) return { outboxIds: [] };
  const mail = composeAlert(facts, getEnv().APP_URL);
  const { id } = await insertOutboxMessage({ db: trx, message: { eventKey, kind: "alert", recipients: [...to, ...bcc], bcc, buildId, ...mail } });
  return { outboxIds: id === null ? [] : [id] };
}

/** After the submission committed: hand the queued message to the workers. */
export async function sendQueuedAlerts(outboxIds: number[]): Promise<void> {
  await nudgeMailDelivery(outboxIds);
}

async function readAlertFacts(db: Db, buildId: number): Promise<AlertFacts | null> {
  // One after the other: inside the submission's transaction they share one connection.
  const build = await getAlertBuild({ db, buildId });
  if (!build) return null;
  const quantities = await getAlertQuantities({ db, buildId });
  const runs = await getIncompleteRuns({ db, buildId });
  const where = (q: { run_id: number; case_key: string; model_key: string; grid: string }) => ({ runId: q.run_id, caseKey: q.case_key, model: q.model_key, grid: q.grid });
  const named = (q: AlertQuantityRow) => ({ ...where(q), quantity: q.quantity_key, label: q.label, unit: q.unit, value: q.value });
  return {
    build: { id: build.id, solver: build.solver, version: build.version, commit: build.commit, branch: build.branch, verdict: build.verdict, pipelineUrl: build.pipeline_url },
    exits: quantities
      .filter((q) => q.verdict === "outside")
      .map((q) => ({ ...named(q), lower: q.lower, upper: q.upper, reference: q.reference, bandKind: q.band_kind, bandVersion: q.band_version })),
    incompleteRuns: runs.map((r) => ({ ...where(r), status: r.status, iterations: r.iterations })),
    drifts: quantities
      .filter((q): q is AlertQuantityRow & { drift_reason: "baseline" | "trend" } => q.drift && q.drift_reason !== null)
      .map((q) => ({
        ...named(q),
        verdict: q.verdict,
        reason: q.drift_reason,
        baselineValue: q.baseline_value,
        baselineDelta: q.baseline_delta,
        noiseFloor: q.noise_floor,
        pValue: q.drift_p_value,
        slopePerBuild: q.drift_slope,
      })),
  };
}
