import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, countRows, testDb } from "../helpers/db";
import { ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { DECIDE, GRANT, REVOKE, XR_OUTSIDE, XR_WITHIN, inDays, postStepBuild, stepWaiver } from "./gate-helpers";

// The release gate over real HTTP and PostgreSQL: approval refused while an
// outside quantity or an unfinished run has no waiver in force, waivers that
// expire or are withdrawn stop counting, every decision and waiver audited, and
// an approved build becomes the baseline of the next submission on its branch.
// Test builds go to release branches of their own, new for every run (waivers
// granted by an earlier run must not let anything through), so the demo's
// candidate on release/4.2 stays pending.

const BRANCH = `release/9.9-test-${randomCommit().slice(0, 6)}`;
let release = "";
let admin = "";
let developer = "";
let qa = "";

beforeAll(async () => {
  [release, admin, developer, qa] = await Promise.all(["release", "admin", "developer", "qa"].map((r) => signIn(`${r}@fenwick-hydro.test`)));
});
afterAll(closeTestDb);

type Decided = { decideGate: { id: string; state: string; history: { id: string; state: string; comment: string; decidedBy: string }[] } };

const decide = (cookie: string, buildId: string, state: string, comment: string) => postGraphQL<Decided>({ query: DECIDE, variables: { input: { buildId, state, comment } }, cookie });
const grant = (cookie: string, input: Record<string, unknown>) => postGraphQL<{ grantWaiver: { id: string; inForce: boolean } }>({ query: GRANT, variables: { input }, cookie });
const gateAudit = (buildId: string) => testDb()("audit_log").where({ entity: "build", entity_id: buildId }).where("action", "like", "gate.%").orderBy("id");

describe("approving a build", () => {
  it("is refused with CONFLICT, naming the outside quantity, while no waiver names it — and nothing is written", async () => {
    const build = await postStepBuild({ branch: BRANCH, xr: XR_OUTSIDE });
    expect(build.runs[0].quantities.find((q) => q.key === "reattachment_xr_h")?.verdict).toBe("outside");
    const res = await decide(release, build.id, "approved", "Looks fine to me.");
    expect(res.status).toBe(409);
    expect(res.body.errors?.[0].extensions?.code).toBe("CONFLICT");
    expect(res.body.errors?.[0].message).toMatch(/backstep\/sa\/default: reattachment_xr_h = 7\.4 is outside its band \[5\.97, 6\.92\]/);
    expect(res.body.errors?.[0].extensions?.issues?.map((i) => i.path)).toEqual(["backstep/sa/default/reattachment_xr_h"]);
    expect(await countRows("gate_decisions", { build_id: Number(build.id) })).toBe(0);
    expect(await gateAudit(build.id)).toHaveLength(0);
  });

  it("goes through once a waiver in force names the quantity, and audits waiver and decision", async () => {
    const build = await postStepBuild({ branch: BRANCH, xr: XR_OUTSIDE });
    const waiver = await grant(release, stepWaiver(BRANCH));
    expect(waiver.body.errors).toBeUndefined();
    expect(waiver.body.data!.grantWaiver.inForce).toBe(true);

    const res = await decide(release, build.id, "approved", "Waived: reattachment under review, everything else within.");
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data!.decideGate.state).toBe("approved");

    const granted = await testDb()("audit_log").where({ entity: "waiver", entity_id: waiver.body.data!.grantWaiver.id }).first();
    expect(granted.action).toBe("waiver.granted");
    expect(granted.details.scope).toEqual({ case: "backstep", quantity: "reattachment_xr_h", model: "sa", branch: BRANCH });
    const [approved] = await gateAudit(build.id);
    expect(approved.action).toBe("gate.approved");
    expect(approved.actor_label).toMatch(/release@fenwick-hydro\.test|Maren/);
    expect(approved.details.previousState).toBe("pending");
    expect(approved.details.waiversReliedOn).toEqual([expect.objectContaining({ waiverId: Number(waiver.body.data!.grantWaiver.id), quantity: "reattachment_xr_h" })]);

    // CI reads the same: approved, nothing blocking, the quantity let through by the waiver.
    const gate = await postGraphQL<{ releaseGate: { state: string; blocking: string[]; blockers: unknown[]; waived: { quantity: string; waiver: { id: string } }[] } }>({
      query: `{ releaseGate(commit: "${build.commit.slice(0, 12)}") { state blocking blockers { id } waived { quantity waiver { id } } } }`,
      token: ciToken(),
    });
    expect(gate.body.data!.releaseGate).toMatchObject({ state: "approved", blocking: [], blockers: [] });
    expect(gate.body.data!.releaseGate.waived).toEqual([{ quantity: "reattachment_xr_h", waiver: { id: waiver.body.data!.grantWaiver.id } }]);
  });

  it("no longer counts a waiver that has expired or been withdrawn", async () => {
    const branch = `${BRANCH}/expiry`;
    const build = await postStepBuild({ branch, xr: XR_OUTSIDE });
    const expiring = await grant(release, stepWaiver(branch));
    // Move the waiver's whole life into the past (the table keeps expires_at > granted_at).
    await testDb()("waivers").where({ id: expiring.body.data!.grantWaiver.id }).update({ granted_at: new Date(Date.now() - 10 * 86_400_000), expires_at: new Date(Date.now() - 60_000) });
    const afterExpiry = await decide(release, build.id, "approved", "Trying with the expired waiver.");
    expect(afterExpiry.body.errors?.[0].extensions?.code).toBe("CONFLICT");

    const withdrawn = await grant(admin, stepWaiver(branch, { model: null }));
    const revoked = await postGraphQL<{ revokeWaiver: { inForce: boolean; revokedBy: string; revokeReason: string } }>({ query: REVOKE, variables: { id: withdrawn.body.data!.grantWaiver.id, reason: "Limiter change reverted; the value must pass on its own." }, cookie: release });
    expect(revoked.body.data!.revokeWaiver).toMatchObject({ inForce: false, revokeReason: "Limiter change reverted; the value must pass on its own." });
    const audit = await testDb()("audit_log").where({ entity: "waiver", entity_id: withdrawn.body.data!.grantWaiver.id }).orderBy("id").pluck("action");
    expect(audit).toEqual(["waiver.granted", "waiver.revoked"]);

    const afterRevoke = await decide(release, build.id, "approved", "Trying with the withdrawn waiver.");
    expect(afterRevoke.body.errors?.[0].extensions?.code).toBe("CONFLICT");
    expect(await countRows("gate_decisions", { build_id: Number(build.id) })).toBe(0);
    const again = await postGraphQL({ query: REVOKE, variables: { id: withdrawn.body.data!.grantWaiver.id, reason: "Withdrawing a second time." }, cookie: release });
    expect(again.body.errors?.[0].extensions?.code).toBe("CONFLICT");
  });

  it("needs a waiver for each quantity of a run that did not complete", async () => {
    const branch = `${BRANCH}/diverged`;
    const build = await postStepBuild({ branch, status: "DIVERGED" });
    await grant(release, stepWaiver(branch));
    const partly = await decide(release, build.id, "approved", "Only the reattachment is waived.");
    expect(partly.body.errors?.[0].extensions?.issues?.map((i) => i.path)).toEqual(["backstep/sa/default/residual_drop_orders"]);
    expect(partly.body.errors?.[0].message).toMatch(/run diverged; residual_drop_orders not delivered/);
    await grant(release, stepWaiver(branch, { quantity: "residual_drop_orders", reason: "Known divergence of SA on the coarse step grid; rerun scheduled." }));
    const res = await decide(release, build.id, "approved", "Both quantities of the diverged run are waived.");
    expect(res.body.errors).toBeUndefined();
  });
});

describe("decisions", () => {
  it("make the approved build the baseline of the next submission on its branch", async () => {
    const branch = `${BRANCH}/baseline`;
    const first = await postStepBuild({ branch, xr: XR_WITHIN });
    expect((await decide(release, first.id, "approved", "Baseline for the baseline test.")).body.errors).toBeUndefined();
    const next = await postStepBuild({ branch, xr: 6.4 });
    const xr = next.runs[0].quantities.find((q) => q.key === "reattachment_xr_h")!;
    expect(xr.baselineBuildId).toBe(first.id);
    expect(xr.baselineValue).toBe(XR_WITHIN);
    expect(xr.baselineDelta).toBeCloseTo(6.4 - XR_WITHIN, 12);
  });

  it("record hold and reject with their comment, person and time, newest first", async () => {
    const build = await postStepBuild({ branch: BRANCH, xr: XR_OUTSIDE });
    const empty = await decide(release, build.id, "held", "  ");
    expect(empty.body.errors?.[0].extensions?.code).toBe("BAD_USER_INPUT");
    expect(empty.body.errors?.[0].extensions?.issues?.[0].path).toBe("input.comment");
    await decide(release, build.id, "held", "Waiting for the step rerun on the fine grid.");
    const before = Date.now();
    const rejected = await decide(admin, build.id, "rejected", "Superseded by the next candidate.");
    const history = rejected.body.data!.decideGate.history;
    expect(history.map((h) => h.state)).toEqual(["rejected", "held"]);
    const names = await testDb()("users").whereIn("email", ["admin@fenwick-hydro.test", "release@fenwick-hydro.test"]).orderBy("email").pluck("name");
    expect(history.map((h) => h.decidedBy)).toEqual(names);
    const row = await testDb()("gate_decisions").where({ build_id: Number(build.id), state: "rejected" }).first();
    expect(Math.abs(new Date(row.decided_at).getTime() - before)).toBeLessThan(60_000);
    expect((await gateAudit(build.id)).map((a) => `${a.action}:${a.details.previousState}`)).toEqual(["gate.held:pending", "gate.rejected:held"]);
  });

  it("are refused to developers, QA and CI tokens, with nothing written", async () => {
    const build = await postStepBuild({ branch: BRANCH, xr: XR_WITHIN });
    for (const [caller, opts] of [["developer", { cookie: developer }], ["qa", { cookie: qa }], ["ci", { token: ciToken() }]] as const) {
      const res = await postGraphQL({ query: DECIDE, variables: { input: { buildId: build.id, state: "approved", comment: `approval attempt by ${caller}` } }, ...opts });
      expect(res.status).toBe(403);
      const waiver = await postGraphQL({ query: GRANT, variables: { input: stepWaiver(BRANCH, { reason: `waiver attempt by ${caller}, must be refused` }) }, ...opts });
      expect(waiver.body.errors?.[0].extensions?.code).toBe("FORBIDDEN");
    }
    expect(await countRows("gate_decisions", { build_id: Number(build.id) })).toBe(0);
    expect(await testDb()("waivers").where("reason", "like", "waiver attempt by %").count<{ count: string }[]>({ count: "*" }).then(([r]) => Number(r.count))).toBe(0);
  });
});

describe("reading the gate", () => {
  it("lists a new candidate first among the waiting ones, with what blocks it", async () => {
    const branch = `${BRANCH}/list`;
    const older = await postStepBuild({ branch, xr: XR_WITHIN });
    await decide(release, older.id, "approved", "Earlier candidate approved.");
    const newest = await postStepBuild({ branch, xr: XR_OUTSIDE });
    const res = await postGraphQL<{ gateCandidates: { totalCount: number; branches: string[]; items: { build: { id: string }; state: string; awaiting: boolean; outsideCount: number; blockerCount: number }[] } }>({
      query: `query($b: String) { gateCandidates(branch: $b) { totalCount branches items { build { id } state awaiting outsideCount blockerCount } } }`,
      variables: { b: branch },
      cookie: developer,
    });
    const { items, branches, totalCount } = res.body.data!.gateCandidates;
    expect(totalCount).toBe(2);
    expect(branches).toContain(branch);
    expect(items.map((i) => [i.build.id, i.state, i.awaiting, i.outsideCount, i.blockerCount])).toEqual([
      [newest.id, "pending", true, 1, 1],
      [older.id, "approved", false, 0, 0],
    ]);
  });

  it("reviews a build with values, limits, baseline, waivers in force and run ids", async () => {
    const branch = `${BRANCH}/review`;
    const base = await postStepBuild({ branch, xr: XR_WITHIN });
    await decide(release, base.id, "approved", "Baseline for the review test.");
    const build = await postStepBuild({ branch, xr: XR_OUTSIDE });
    await grant(release, stepWaiver(branch, { expiresAt: inDays(3) }));
    const res = await postGraphQL<{ gateReview: { state: string; baseline: { id: string }; isCandidate: boolean; blockers: unknown[]; waived: { id: string }[]; waivers: { quantity: string }[]; findings: { id: string; runId: string; quantity: string; value: number; lower: number; upper: number; baselineValue: number; blockReason: string; waiver: { id: string } | null }[] } }>({
      query: `query($id: ID!) { gateReview(buildId: $id) { state baseline { id } isCandidate blockers { id } waived { id } waivers { quantity } findings { id runId quantity value lower upper baselineValue blockReason waiver { id } } } }`,
      variables: { id: build.id },
      cookie: developer,
    });
    const review = res.body.data!.gateReview;
    expect(review).toMatchObject({ state: "pending", baseline: { id: base.id }, isCandidate: true, blockers: [] });
    const [finding] = review.findings;
    expect(finding).toMatchObject({ runId: build.runs[0].id, quantity: "reattachment_xr_h", value: XR_OUTSIDE, lower: 5.97, upper: 6.92, baselineValue: XR_WITHIN });
    expect(finding.waiver).not.toBeNull();
    expect(review.waived.map((w) => w.id)).toEqual([finding.id]);
    expect(review.waivers.map((w) => w.quantity)).toEqual(["reattachment_xr_h"]);
    const unknown = await postGraphQL<{ gateReview: null }>({ query: `{ gateReview(buildId: "999999999") { id } }`, cookie: developer });
    expect(unknown.body.data!.gateReview).toBeNull();
  });

  it("refuses a waiver for an unknown quantity, a model the case does not run, or an expiry in the past", async () => {
    const res = await grant(release, stepWaiver(BRANCH, { quantity: "lift_coefficient", model: "lrr" }));
    expect(res.body.errors?.[0].extensions?.issues?.map((i) => i.path).sort()).toEqual(["input.model", "input.quantity"]);
    const past = await grant(release, stepWaiver(BRANCH, { expiresAt: inDays(-1) }));
    expect(past.body.errors?.[0].extensions?.issues).toEqual([{ path: "input.expiresAt", message: "must be in the future" }]);
  });
});
