import "server-only";
import { getDb } from "@/db";
import { insertAuditEntry } from "@/db/queries/audit";
import { getBaselineBuild, getBuildsByIds } from "@/db/queries/builds";
import { getDecisionHistory, getLatestDecisionsByBuildIds, insertGateDecision, lockBuildForDecision } from "@/db/queries/gate";
import { getReleaseBranches, listGateCandidates } from "@/db/queries/gate-candidates";
import { getRunsByBuildIds } from "@/db/queries/runs";
import { getWaiversInForce } from "@/db/queries/waivers";
import { AppError } from "@/lib/errors";
import { candidateListSchema, gateDecisionSchema, idSchema } from "@/lib/validation/gate";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";
import { assessBuilds, toWaiverView, waiverScopeOf, type GateFinding } from "./gate-assess";
import { parseGateInput } from "./gate-input";
import { runLabel, waiverCovers } from "./gate-rules";

// The release gate: candidates, one build's review, and the decision itself.

export const isReleaseBranch = (branch: string) => branch.startsWith("release/");

/** Release-branch builds, awaiting ones first, each with how much blocks it now. */
export async function findGateCandidates({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const f = parseGateInput(candidateListSchema, unsafeInput ?? {});
  const db = getDb();
  const [{ rows, total }, branches] = await Promise.all([listGateCandidates({ db, branch: f.branch ?? null, limit: f.first, offset: f.offset }), getReleaseBranches({ db })]);
  const assessed = await assessBuilds({ db, builds: rows, at: new Date() });
  const items = rows.map((row) => {
    const a = assessed.get(row.id);
    return { build: row, state: row.state, awaiting: row.awaiting, counts: row, blockerCount: a?.blockers.length ?? 0, waivedCount: a?.waived.length ?? 0 };
  });
  return { items, totalCount: total, branches };
}

/** Everything the release manager needs to decide on one build (null when there is no such build). */
export async function findGateReview({ actor, buildId }: { actor: Actor | null; buildId: unknown }) {
  requirePerson(actor);
  const id = parseGateInput(idSchema, buildId, "buildId");
  const db = getDb();
  const [build] = await getBuildsByIds({ db, ids: [id] });
  if (!build) return null;
  const at = new Date();
  const [history, runs, baseline, assessed] = await Promise.all([
    getDecisionHistory({ db, buildId: id }),
    getRunsByBuildIds({ db, buildIds: [id] }),
    getBaselineBuild({ db, branch: build.branch, before: build.received_at, excludeId: build.id }),
    assessBuilds({ db, builds: [build], at }),
  ]);
  // Waivers that name a quantity of any run of this build on its branch, whether or not anything needs them now.
  const waiverRows = await getWaiversInForce({ db, caseKeys: [...new Set(runs.map((r) => r.case_key))], branch: build.branch, at });
  const applying = waiverRows.filter((w) =>
    runs.some((r) => waiverCovers(waiverScopeOf(w), { runId: r.id, caseKey: r.case_key, modelKey: r.model_key, grid: r.grid, runStatus: r.status, quantityKey: w.quantity_key, verdict: null, value: null }, build.branch)),
  );
  const assessment = assessed.get(id)!;
  return {
    id: String(id),
    build,
    state: history[0]?.state ?? ("pending" as const),
    decision: history[0] ?? null,
    history,
    baseline: baseline ?? null,
    isCandidate: isReleaseBranch(build.branch),
    ...assessment,
    waivers: applying.map((w) => toWaiverView(w, at)),
  };
}

/**
 * Records approve / hold / reject with its comment (release manager or admin).
 * Approval is refused, with nothing written, while any quantity outside its band
 * or any run that did not complete has no waiver in force. The decision and its
 * audit entry are one transaction; the build row is locked so two decisions on
 * one build, or a decision and a re-post of the build, cannot interleave.
 */
export async function decideGate({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor, "release");
  if (actor.kind !== "user") throw new AppError("forbidden", "A release decision is made by a person.");
  const input = parseGateInput(gateDecisionSchema, unsafeInput, "input");
  await getDb().transaction(async (trx) => {
    const build = await lockBuildForDecision({ db: trx, buildId: input.buildId });
    if (!build) throw new AppError("not_found", `There is no build ${input.buildId}.`, [{ path: "input.buildId", message: "is not a known build" }]);
    const at = new Date();
    const assessment = (await assessBuilds({ db: trx, builds: [build], at, lock: true })).get(build.id)!;
    if (input.state === "approved" && assessment.blockers.length > 0) throw refusal(build, assessment.blockers);
    const [previous] = await getLatestDecisionsByBuildIds({ db: trx, buildIds: [build.id] });
    const decisionId = await insertGateDecision({ db: trx, buildId: build.id, state: input.state, comment: input.comment, userId: actor.userId, decidedAt: at });
    await insertAuditEntry({
      db: trx,
      entry: {
        actorUserId: actor.userId,
        actorLabel: actor.label,
        action: `gate.${input.state}`,
        entity: "build",
        entityId: build.id,
        at,
        details: {
          decisionId,
          state: input.state,
          previousState: previous?.state ?? "pending",
          comment: input.comment,
          build: { commit: build.commit, version: build.version, branch: build.branch },
          waiversReliedOn: assessment.waived.map((f) => ({ waiverId: f.waiver?.id, run: runLabel(f), quantity: f.quantityKey })),
          blockingAtDecision: assessment.blockers.map((f) => ({ run: runLabel(f), quantity: f.quantityKey, reason: f.blockReason })),
        },
      },
    });
  });
  return findGateReview({ actor, buildId: input.buildId });
}

function refusal(build: { version: string; commit: string }, blockers: GateFinding[]): AppError {
  const lines = blockers.map((b) => `${runLabel(b)}: ${b.blockReason}`);
  const shown = lines.slice(0, 5).join("; ") + (lines.length > 5 ? `; and ${lines.length - 5} more` : "");
  return new AppError(
    "conflict",
    `Cannot approve ${build.version} (${build.commit.slice(0, 8)}): ${blockers.length} item${blockers.length === 1 ? "" : "s"} block${blockers.length === 1 ? "s" : ""} it with no waiver in force — ${shown}. Grant a waiver for each, or hold or reject the build.`,
    blockers.map((b) => ({ path: `${runLabel(b)}/${b.quantityKey ?? "run"}`, message: b.blockReason ?? "blocks approval" })),
  );
}
