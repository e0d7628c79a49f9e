import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { randomCommit } from "../helpers/graphql";
import { expectNothingStored, expectRefusedAt, hostileSubmission, postRawSubmission, residual, submitBody } from "./hostile-helpers";

// Numbers a CI job can send that are not finite reals (issue 6, "Bad input").
// JSON has no NaN or Infinity: they arrive as strings, as bare tokens (a body
// that is not JSON at all) or as an overflowing literal (1e400, which
// JSON.parse turns into Infinity). Each is refused with 400, the field path
// named, and nothing of the submission stored.

afterAll(closeTestDb);

/** A c_f profile with one element replaced; c_f itself may be zero or negative (separation). */
function cfRun(spoil: { axis: "x" | "y"; at: number; value: unknown }) {
  const x = Array.from({ length: 30 }, (_, i) => 0.1 * (i + 1));
  const y = x.map((xi) => 0.003 - 0.0005 * xi);
  const series = { key: "cf", x: [...x] as unknown[], y: [...y] as unknown[] };
  series[spoil.axis][spoil.at] = spoil.value;
  return { case: "backstep", model: "sst", status: "COMPLETED", series: [series] };
}

describe("non-finite numbers in a profile", () => {
  for (const [name, value, axis, at] of [
    ["NaN", "NaN", "y", 17],
    ["Infinity", "Infinity", "x", 4],
    ["-Infinity", "-Infinity", "y", 0],
  ] as const) {
    it(`rejects "${name}" (a string, as JSON cannot carry it) at series[0].${axis}[${at}]`, async () => {
      const commit = randomCommit();
      const res = await postRawSubmission(submitBody(hostileSubmission(commit, [cfRun({ axis, at, value })])));
      expectRefusedAt(res, `input.runs[0].series[0].${axis}[${at}]`, /must be a finite number/);
      await expectNothingStored(commit);
    });
  }

  it("rejects 1e400 (JSON.parse reads it as Infinity) naming the element", async () => {
    const commit = randomCommit();
    const body = submitBody(hostileSubmission(commit, [cfRun({ axis: "y", at: 9, value: 12345.5 })])).replace("12345.5", "1e400");
    const res = await postRawSubmission(body);
    expectRefusedAt(res, "input.runs[0].series[0].y[9]", /finite number, got Infinity/);
    await expectNothingStored(commit);
  });

  it("rejects null inside a profile naming the element", async () => {
    const commit = randomCommit();
    const res = await postRawSubmission(submitBody(hostileSubmission(commit, [cfRun({ axis: "x", at: 2, value: null })])));
    expectRefusedAt(res, "input.runs[0].series[0].x[2]", /got null/);
    await expectNothingStored(commit);
  });
});

describe("non-finite numbers in scalar fields", () => {
  it('rejects "NaN" as a reported quantity value', async () => {
    const commit = randomCommit();
    const run = { case: "channel-re180", model: "sa", status: "COMPLETED", quantities: [{ key: "kappa", value: "NaN" }] };
    const res = await postRawSubmission(submitBody(hostileSubmission(commit, [run])));
    expectRefusedAt(res, "input.runs[0].quantities[0].value", /Float cannot represent/);
    await expectNothingStored(commit);
  });

  it("rejects 1e400 as wall time", async () => {
    const commit = randomCommit();
    const run = { case: "channel-re180", model: "sa", status: "COMPLETED", wallSeconds: 12345.5 };
    const res = await postRawSubmission(submitBody(hostileSubmission(commit, [run])).replace("12345.5", "1e400"));
    expectRefusedAt(res, "input.runs[0].wallSeconds", /Float cannot represent/);
    await expectNothingStored(commit);
  });

  it('rejects "-Infinity" as a stress component', async () => {
    const commit = randomCommit();
    const stresses = [{ at: 0.5, uu: 1, vv: 0.5, ww: 0.5, uv: "-Infinity", uw: 0, vw: 0 }];
    const res = await postRawSubmission(submitBody(hostileSubmission(commit, [{ case: "homogeneous-shear", model: "ssg", status: "COMPLETED", stresses }])));
    expectRefusedAt(res, "input.runs[0].stresses[0].uv", /Float cannot represent/);
    await expectNothingStored(commit);
  });
});

describe("bare NaN and Infinity tokens (a body that is not JSON)", () => {
  for (const token of ["NaN", "Infinity", "-Infinity"]) {
    it(`answers 400 to a body carrying a bare ${token} and stores nothing`, async () => {
      const commit = randomCommit();
      const body = submitBody(hostileSubmission(commit, [cfRun({ axis: "y", at: 3, value: 12345.5 })])).replace("12345.5", token);
      const res = await postRawSubmission(body);
      expect(res.status).toBe(400);
      expect(res.body.errors?.[0].message).toMatch(/JSON/);
      await expectNothingStored(commit);
    });
  }
});

describe("legal but awkward numbers", () => {
  it("accepts -0 (a finite number) and stores it as 0", async () => {
    const commit = randomCommit();
    const run = cfRun({ axis: "y", at: 5, value: -0 });
    const body = submitBody(hostileSubmission(commit, [{ ...run, quantities: [{ key: "probe_zero", value: -0 }] }]));
    // JSON.stringify writes -0 as "0": put the sign back by hand, as a C printf("%g") would send it.
    const res = await postRawSubmission(body.replace('"value":0', '"value":-0').replace(/("y":\[(?:[^,\]]+,){5})0/, "$1-0"));
    expect(res.status).toBe(200);
    expect(res.body.errors).toBeUndefined();
    const db = testDb();
    const stored = await db("run_series as s")
      .join("runs as r", "r.id", "s.run_id")
      .join("builds as b", "b.id", "r.build_id")
      .where("b.commit", commit)
      .select(db.raw("s.y[6]::text as y5"))
      .first();
    // IEEE 754: -0 == 0; the stored text is "0", so no reader ever sees a signed zero.
    expect(stored?.y5).toBe("0");
    const value = await db("quantity_values as v").join("builds as b", "b.id", "v.build_id").where({ "b.commit": commit, "v.quantity_key": "probe_zero" }).select(db.raw("v.value::text as v")).first();
    expect(value?.v).toBe("0");
  });

  it("stores extreme finite doubles bit for bit (smallest subnormal, largest double, 0.1 + 0.2)", async () => {
    const commit = randomCommit();
    const y = [5e-324, 1.7976931348623157e308, 0.1 + 0.2, -2.2250738585072014e-308, 1 / 3];
    const run = { case: "backstep", model: "sst", status: "COMPLETED", series: [{ key: "cf", x: [1, 2, 3, 4, 5], y }, residual()] };
    const res = await postRawSubmission(submitBody(hostileSubmission(commit, [run])));
    expect(res.status).toBe(200);
    const db = testDb();
    const row = await db("run_series as s").join("runs as r", "r.id", "s.run_id").join("builds as b", "b.id", "r.build_id").where({ "b.commit": commit, "s.key": "cf" }).select("s.y").first();
    expect(row?.y).toEqual(y);
  });
});
