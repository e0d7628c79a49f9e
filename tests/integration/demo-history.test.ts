import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";

// The seeded demo went through the real ingest path; these check that what it
// is meant to show was computed, not inserted: the regression, the drift, the
// diverged run and the candidate awaiting a decision.

afterAll(closeTestDb);

describe("demo history", () => {
  it("holds about sixty builds on main and release/4.2", async () => {
    const rows: { branch: string; n: string }[] = await testDb()("builds").where("solver", "Cormorant").whereIn("branch", ["main", "release/4.2"]).groupBy("branch").select("branch").count({ n: "*" });
    const total = rows.reduce((s, r) => s + Number(r.n), 0);
    expect(rows.map((r) => r.branch).sort()).toEqual(["main", "release/4.2"]);
    expect(total).toBeGreaterThanOrEqual(50);
    expect(total).toBeLessThanOrEqual(80);
  });

  it("shows the changed Cε2 as a k–ε decay exponent outside its band on main", async () => {
    const row = await testDb()("quantity_values as v")
      .join("runs as r", "r.id", "v.run_id")
      .join("run_coefficients as c", "c.run_id", "r.id")
      .where({ "v.branch": "main", "v.case_key": "decaying-hit", "v.model_key": "k-epsilon", "v.quantity_key": "decay_exponent", "c.name": "C_eps2" })
      .where("c.value", "<", 1.9)
      .orderBy("v.build_received_at", "desc")
      .first("v.value", "v.verdict", "c.value as c_eps2");
    expect(row).toBeDefined();
    // n = 1/(Cε2 − 1) (reference sheet §2.2) evaluated with the changed coefficient.
    expect(row.value).toBeCloseTo(1 / (row.c_eps2 - 1), 2);
    expect(row.verdict).toBe("outside");
  });

  it("flags the slow skin-friction drift on release/4.2 while the value stays inside its band", async () => {
    const newest = await testDb()("quantity_values")
      .where({ branch: "release/4.2", case_key: "flat-plate-zpg", model_key: "sst", quantity_key: "cf_at_x" })
      .orderBy("build_received_at", "desc")
      .first();
    expect(newest.drift).toBe(true);
    expect(["within", "marginal"]).toContain(newest.verdict);
  });

  it("contains a diverged run and a release candidate awaiting a decision", async () => {
    const diverged = await testDb()("runs").where({ status: "DIVERGED" }).first();
    expect(diverged).toBeDefined();
    expect(diverged.verdict).toBe("outside");
    const newestRelease = await testDb()("builds").where({ branch: "release/4.2" }).orderBy("received_at", "desc").first();
    const decisions = await testDb()("gate_decisions").where({ build_id: newestRelease.id });
    expect(decisions).toHaveLength(0);
  });
});
