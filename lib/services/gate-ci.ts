import "server-only";
import { getDb } from "@/db";
import { getBuildsByCommitPrefix, getLatestDecisionsByBuildIds } from "@/db/queries/gate";
import { AppError } from "@/lib/errors";
import { commitSchema } from "@/lib/validation/gate";
import type { Actor } from "./actor";
import { requireSignedIn } from "./authorize";
import { assessBuilds } from "./gate-assess";
import { parseGateInput } from "./gate-input";
import { runLabel } from "./gate-rules";

/**
 * Gate state of a commit, for CI (token) and people alike: the newest decision
 * or pending, and what blocks approval now (outside quantities and runs that did
 * not complete, without a waiver in force). A short hash must name one build.
 */
export async function findReleaseGate({ actor, commit }: { actor: Actor | null; commit: unknown }) {
  requireSignedIn(actor);
  const c = parseGateInput(commitSchema, commit, "commit").toLowerCase();
  const db = getDb();
  const builds = await getBuildsByCommitPrefix({ db, prefix: c, limit: 2 });
  if (builds.length > 1) throw new AppError("invalid_input", `commit ${c} is ambiguous: it starts more than one build's hash; give more digits.`, [{ path: "commit", message: "matches more than one build" }]);
  const build = builds[0];
  if (!build) return { commit: c, build: null, state: "pending" as const, decision: null, blocking: ["no results have been posted for this commit"], blockers: [], waived: [] };
  const [[decision], assessed] = await Promise.all([getLatestDecisionsByBuildIds({ db, buildIds: [build.id] }), assessBuilds({ db, builds: [build], at: new Date() })]);
  const { blockers, waived } = assessed.get(build.id)!;
  return {
    commit: build.commit,
    build,
    state: decision?.state ?? ("pending" as const),
    decision: decision ?? null,
    blocking: blockers.map((b) => `${runLabel(b)}: ${b.blockReason}`),
    blockers,
    waived,
  };
}
