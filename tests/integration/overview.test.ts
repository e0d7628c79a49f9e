import { jStat } from "jstat";
import { median } from "simple-statistics";
import { beforeAll, describe, expect, it } from "vitest";
import { ciToken, postGraphQL } from "../helpers/graphql";
import { signIn } from "../helpers/session";

// The morning view, the multi-model trend chart and the case-library fields,
// through real HTTP against the seeded demo history (Fenwick Hydrodynamics, Cormorant).

let developer: string;

beforeAll(async () => {
  developer = await signIn("developer@fenwick-hydro.test");
});

interface Brief {
  id: string;
  version: string;
  branch: string;
  receivedAt: string;
  gate: string;
}
const BRIEF = "id version branch receivedAt gate";

type MorningData = {
  morningView: {
    branches: { branch: string; baseline: Brief | null; builds: Brief[] }[];
    bandExits: { branch: string; build: Brief; baseline: Brief; case: string; model: string; quantity: string; value: number; verdict: string; baselineValue: number; baselineVerdict: string; lower: number; upper: number }[];
    openDrifts: { branch: string; build: Brief; case: string; model: string; quantity: string; reason: string; pValue: number; slopePerBuild: number; baselineDelta: number; noiseFloor: number }[];
    releaseCandidates: { awaiting: Brief[]; settledUndecided: number };
  };
};

const MORNING = /* GraphQL */ `{
  morningView {
    branches(perBranch: 3) { branch baseline { ${BRIEF} } builds { ${BRIEF} } }
    bandExits { branch build { ${BRIEF} } baseline { ${BRIEF} } case model quantity value verdict baselineValue baselineVerdict lower upper }
    openDrifts { branch build { ${BRIEF} } case model quantity reason pValue slopePerBuild baselineDelta noiseFloor }
    releaseCandidates { awaiting { ${BRIEF} } settledUndecided }
  }
}`;

async function morning(): Promise<MorningData["morningView"]> {
  const res = await postGraphQL<MorningData>({ query: MORNING, cookie: developer });
  expect(res.body.errors).toBeUndefined();
  return res.body.data!.morningView;
}

describe("morning view", () => {
  it("reports the k–ε decay exponent on main as having left its band since the baseline", async () => {
    const view = await morning();
    const main = view.branches.find((b) => b.branch === "main")!;
    const exit = view.bandExits.find((e) => e.branch === "main" && e.case === "decaying-hit" && e.model === "k-epsilon" && e.quantity === "decay_exponent");
    expect(exit).toBeDefined();
    expect(exit!.build.id).toBe(main.builds[0].id);
    expect(exit!.baseline.id).toBe(main.baseline!.id);
    expect(exit!.baseline.gate).toBe("approved");
    expect([exit!.verdict, exit!.baselineVerdict]).toEqual(["outside", "within"]);
    // k–ε isotropic decay n = 1/(C_ε2 − 1) (reference sheet §2.2; Launder & Spalding 1974):
    // the baseline runs C_ε2 = 1.92 (n = 1.08696), the regression C_ε2 = 1.87 (n = 1.14943).
    expect(exit!.baselineValue).toBeCloseTo(1 / 0.92, 3);
    expect(exit!.value).toBeCloseTo(1 / 0.87, 3);
    expect(exit!.value).toBeGreaterThan(exit!.upper);
  });

  it("lists the SST flat-plate c_f drift on release/4.2 with the Mann–Kendall p and Theil–Sen slope of its last 8 builds", async () => {
    const view = await morning();
    const drift = view.openDrifts.find((d) => d.branch === "release/4.2" && d.case === "flat-plate-zpg" && d.model === "sst" && d.quantity === "cf_at_x");
    expect(drift).toBeDefined();
    expect(Math.abs(drift!.baselineDelta)).toBeGreaterThan(drift!.noiseFloor);

    const trend = await trendChart({ case: "flat-plate-zpg", quantity: "cf_at_x", models: ["sst"], branch: "release/4.2", last: 8 });
    const values = trend.series[0].points.map((p) => p.value!);
    expect(values).toHaveLength(8);
    // Mann–Kendall S and its normal approximation with continuity correction, no ties
    // (Kendall 1975; Gilbert 1987 eq. 16.4, from memory); Φ from jstat (registry reference library).
    let s = 0;
    for (let i = 0; i < 8; i++) for (let j = i + 1; j < 8; j++) s += Math.sign(values[j] - values[i]);
    expect(new Set(values).size).toBe(8);
    const z = (s - Math.sign(s)) / Math.sqrt((8 * 7 * 21) / 18);
    expect(drift!.pValue).toBeCloseTo(2 * (1 - jStat.normal.cdf(Math.abs(z), 0, 1)), 10);
    expect(drift!.pValue).toBeLessThan(0.05);
    // Theil–Sen slope: median of the pairwise slopes per build (Sen 1968), median from simple-statistics.
    const slopes: number[] = [];
    for (let i = 0; i < 8; i++) for (let j = i + 1; j < 8; j++) slopes.push((values[j] - values[i]) / (j - i));
    expect(drift!.slopePerBuild).toBeCloseTo(median(slopes), 12);
    expect(drift!.slopePerBuild).toBeGreaterThan(0);
  });

  it("shows the newest release/4.2 build as the candidate awaiting a decision, and no decided build", async () => {
    const view = await morning();
    // Other tests post candidates on their own release branches at the same time: look at release/4.2's.
    const newest = await postGraphQL<{ builds: { items: Brief[] } }>({ query: `{ builds(branch: "release/4.2", first: 1) { items { ${BRIEF} } } }`, cookie: developer });
    const awaiting42 = view.releaseCandidates.awaiting.filter((b) => b.branch === "release/4.2");
    expect(awaiting42[0].id).toBe(newest.body.data!.builds.items[0].id);
    expect(view.releaseCandidates.awaiting.every((b) => b.gate === "pending" && b.branch.startsWith("release/"))).toBe(true);
    for (let i = 1; i < view.releaseCandidates.awaiting.length; i++) {
      expect(Date.parse(view.releaseCandidates.awaiting[i - 1].receivedAt)).toBeGreaterThanOrEqual(Date.parse(view.releaseCandidates.awaiting[i].receivedAt));
    }
    // Every listed candidate is newer than the last decided build of its branch.
    const decided = await postGraphQL<{ builds: { items: Brief[] } }>({ query: `{ builds(branch: "release/4.2", first: 200) { items { ${BRIEF} } } }`, cookie: developer });
    const lastDecided = Math.max(...decided.body.data!.builds.items.filter((b) => b.gate !== "pending").map((b) => Date.parse(b.receivedAt)));
    for (const b of view.releaseCandidates.awaiting.filter((x) => x.branch === "release/4.2")) expect(Date.parse(b.receivedAt)).toBeGreaterThan(lastDecided);
    expect(view.releaseCandidates.settledUndecided).toBeGreaterThan(0);
  });

  it("puts main and the release lines first, newest build first within each branch", async () => {
    const view = await morning();
    expect(view.branches[0].branch).toBe("main");
    expect(view.branches[1].branch.startsWith("release/")).toBe(true);
    for (const b of view.branches) {
      expect(b.builds.length).toBeLessThanOrEqual(3);
      for (let i = 1; i < b.builds.length; i++) expect(Date.parse(b.builds[i - 1].receivedAt)).toBeGreaterThanOrEqual(Date.parse(b.builds[i].receivedAt));
    }
  });

  it("refuses the morning view to a CI token and to a visitor without a session", async () => {
    const ci = await postGraphQL({ query: "{ morningView { id } }", token: ciToken() });
    expect(ci.body.errors?.[0].extensions?.code).toBe("FORBIDDEN");
    const anonymous = await postGraphQL({ query: "{ morningView { id } }" });
    expect(anonymous.body.errors?.[0].extensions?.code).toBe("UNAUTHENTICATED");
  });
});

type TrendData = {
  trendChart: {
    builds: { id: string; receivedAt: string }[];
    baseline: Brief | null;
    series: { model: string; points: { buildId: string; value: number | null; verdict: string; bandModel: string | null; lower: number | null; upper: number | null; bandVersion: number | null }[] }[];
  };
};

async function trendChart(variables: Record<string, unknown>): Promise<TrendData["trendChart"]> {
  const res = await postGraphQL<TrendData>({
    query: /* GraphQL */ `query($case: String!, $quantity: String!, $models: [String!]!, $branch: String!, $last: Int) {
      trendChart(case: $case, quantity: $quantity, models: $models, branch: $branch, last: $last) {
        builds { id receivedAt }
        baseline { ${BRIEF} }
        series { model points { buildId value verdict bandModel lower upper bandVersion } }
      }
    }`,
    variables,
    cookie: developer,
  });
  expect(res.body.errors).toBeUndefined();
  return res.body.data!.trendChart;
}

describe("trend chart", () => {
  it("returns points per model on one shared, oldest-first build axis, each against its own band", async () => {
    const chart = await trendChart({ case: "decaying-hit", quantity: "decay_exponent", models: ["k-epsilon", "k-omega", "k-epsilon"], branch: "main", last: 30 });
    expect(chart.series.map((s) => s.model)).toEqual(["k-epsilon", "k-omega"]);
    expect(chart.builds.length).toBeLessThanOrEqual(30);
    for (let i = 1; i < chart.builds.length; i++) expect(Date.parse(chart.builds[i].receivedAt)).toBeGreaterThanOrEqual(Date.parse(chart.builds[i - 1].receivedAt));
    const axis = new Set(chart.builds.map((b) => b.id));
    for (const s of chart.series) {
      expect(s.points.length).toBeGreaterThan(10);
      expect(s.points.every((p) => axis.has(p.buildId) && p.bandModel === s.model && p.bandVersion !== null)).toBe(true);
    }
    // Wilcox 2006 k–ω isotropic decay n = β*/β0 = 0.09/0.0708 (reference sheet §2.3).
    const kOmega = chart.series[1].points.at(-1)!;
    expect(kOmega.value).toBeCloseTo(0.09 / 0.0708, 3);
    expect(kOmega.verdict).toBe("within");
    expect(chart.baseline?.gate).toBe("approved");
  });

  it("rejects a chart without models or with more than six", async () => {
    for (const models of [[], ["a", "b", "c", "d", "e", "f", "g"]]) {
      const res = await postGraphQL({
        query: `query($m: [String!]!) { trendChart(case: "decaying-hit", quantity: "decay_exponent", models: $m, branch: "main") { case } }`,
        variables: { m: models },
        cookie: developer,
      });
      expect(res.body.errors?.[0].extensions?.code).toBe("BAD_USER_INPUT");
    }
  });
});

describe("case library fields", () => {
  it("lists the quantities a case has, and every band version with its author and reason", async () => {
    const res = await postGraphQL<{ case: { quantities: { key: string; unit: string; derivedFrom: string | null }[]; grids: string[]; bandRecords: { quantity: string; model: string | null; version: number; reason: string; author: string; supersededAt: string | null }[] } }>({
      query: `{ case(key: "decaying-hit") { quantities { key unit derivedFrom } grids bandRecords { quantity model version reason author supersededAt } } }`,
      cookie: developer,
    });
    expect(res.body.errors).toBeUndefined();
    const c = res.body.data!.case;
    expect(c.quantities.find((q) => q.key === "decay_exponent")).toMatchObject({ unit: "1", derivedFrom: "k_decay" });
    expect(c.quantities.some((q) => q.key === "kappa")).toBe(false);
    expect(c.grids).toContain("default");
    const inForce = c.bandRecords.filter((b) => b.quantity === "decay_exponent" && b.supersededAt === null);
    expect(inForce.map((b) => b.model).sort()).toEqual([null, "k-epsilon", "k-omega", "lrr", "ssg", "sst"].sort());
    expect(c.bandRecords.every((b) => b.reason.length > 10 && b.author.length > 0)).toBe(true);
  });
});
