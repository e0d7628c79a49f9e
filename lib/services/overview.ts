import "server-only";
import { getDb } from "@/db";
import { listBuilds } from "@/db/queries/builds";
import { getLatestDecisionsByBuildIds } from "@/db/queries/gate";

export interface BuildSummary {
  id: number;
  solver: string;
  version: string;
  commit: string;
  branch: string;
  receivedAt: Date;
  verdict: "within" | "marginal" | "outside" | "unbanded" | "missing";
  gate: "pending" | "approved" | "held" | "rejected";
  runCounts: Record<"within" | "marginal" | "outside" | "unbanded" | "missing", number>;
}

/** The newest builds with run counts per verdict and gate state (home page). */
export async function getLatestBuilds({ limit = 30 }: { limit?: number } = {}): Promise<BuildSummary[]> {
  const db = getDb();
  const { rows } = await listBuilds({ db, filter: { limit, offset: 0 } });
  const ids = rows.map((r) => r.id);
  const [decisions, counts] = await Promise.all([
    getLatestDecisionsByBuildIds({ db, buildIds: ids }),
    db("runs").whereIn("build_id", ids).groupBy("build_id", "verdict").select("build_id", "verdict").count<{ build_id: number; verdict: BuildSummary["verdict"]; count: number }[]>({ count: "*" }),
  ]);
  const gate = new Map(decisions.map((d) => [d.build_id, d.state]));
  return rows.map((r) => {
    const runCounts = { within: 0, marginal: 0, outside: 0, unbanded: 0, missing: 0 };
    for (const c of counts) if (c.build_id === r.id) runCounts[c.verdict] = Number(c.count);
    return {
      id: r.id,
      solver: r.solver,
      version: r.version,
      commit: r.commit,
      branch: r.branch,
      receivedAt: r.received_at,
      verdict: r.verdict,
      gate: gate.get(r.id) ?? "pending",
      runCounts,
    };
  });
}
