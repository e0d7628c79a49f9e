import { beforeAll, describe, expect, it } from "vitest";
import { ciToken, postGraphQL } from "../helpers/graphql";
import { signIn } from "../helpers/session";

// The read side the pages use, through real HTTP, for a signed-in person and for CI.

let developer: string;

beforeAll(async () => {
  developer = await signIn("developer@fenwick-hydro.test");
});

type BuildsData = { builds: { totalCount: number; items: { id: string; branch: string; verdict: string; commit: string }[] } };

describe("queries for the pages", () => {
  it("pages and filters builds by branch and verdict", async () => {
    const all = await postGraphQL<BuildsData>({ query: "{ builds(first: 5) { totalCount items { id branch verdict commit } } }", cookie: developer });
    expect(all.body.errors).toBeUndefined();
    expect(all.body.data!.builds.items).toHaveLength(5);
    expect(all.body.data!.builds.totalCount).toBeGreaterThanOrEqual(50);

    const release = await postGraphQL<BuildsData>({
      query: `{ builds(branch: "release/4.2", first: 200) { totalCount items { branch verdict } } }`,
      cookie: developer,
    });
    expect(release.body.data!.builds.items.every((b) => b.branch === "release/4.2")).toBe(true);
    expect(release.body.data!.builds.totalCount).toBe(release.body.data!.builds.items.length);

    const outside = await postGraphQL<BuildsData>({ query: `{ builds(verdict: outside, first: 200) { items { verdict } } }`, cookie: developer });
    expect(outside.body.data!.builds.items.length).toBeGreaterThan(0);
    expect(outside.body.data!.builds.items.every((b) => b.verdict === "outside")).toBe(true);
  });

  it("returns one build with its runs, quantities and plotted series", async () => {
    const list = await postGraphQL<BuildsData>({ query: `{ builds(branch: "main", first: 1) { items { id } } }`, cookie: developer });
    const id = list.body.data!.builds.items[0].id;
    const res = await postGraphQL<{ build: { id: string; runs: { case: string; quantities: { key: string; verdict: string }[]; series: { key: string; x: number[]; y: number[] }[] }[] } }>({
      query: `query($id: ID!) { build(id: $id) { id verdict gate runs { case model verdict quantities { key value verdict reference source lower upper } series { key x y } } } }`,
      variables: { id },
      cookie: developer,
    });
    expect(res.body.errors).toBeUndefined();
    expect(res.body.data!.build.id).toBe(id);
    expect(res.body.data!.build.runs.length).toBeGreaterThan(5);
    const withSeries = res.body.data!.build.runs.flatMap((r) => r.series);
    expect(withSeries.length).toBeGreaterThan(0);
    for (const s of withSeries) expect(s.x.length).toBe(s.y.length);
  });

  it("lists the canonical cases with bands that cite their sources", async () => {
    const res = await postGraphQL<{ cases: { key: string; bands: { quantity: string; source: string; kind: string }[] }[] }>({
      query: "{ cases { key title models bands { quantity model kind reference source lower upper version } } }",
      cookie: developer,
    });
    const keys = res.body.data!.cases.map((c) => c.key);
    for (const k of ["channel-re180", "flat-plate-zpg", "decaying-hit", "homogeneous-shear", "backstep", "grid-study"]) expect(keys).toContain(k);
    for (const c of res.body.data!.cases) for (const b of c.bands) expect(b.source.length).toBeGreaterThan(10);
  });

  it("returns a trend with the band limits each point was judged against, oldest first", async () => {
    const res = await postGraphQL<{ trend: { points: { receivedAt: string; value: number; lower: number | null; upper: number | null; bandVersion: number }[] } }>({
      query: `{ trend(case: "decaying-hit", quantity: "decay_exponent", model: "k-epsilon", branch: "main", last: 20) { points { receivedAt value verdict lower upper bandVersion drift } } }`,
      cookie: developer,
    });
    expect(res.body.errors).toBeUndefined();
    const points = res.body.data!.trend.points;
    expect(points.length).toBeGreaterThan(5);
    expect(points.length).toBeLessThanOrEqual(20);
    for (let i = 1; i < points.length; i++) expect(Date.parse(points[i].receivedAt)).toBeGreaterThanOrEqual(Date.parse(points[i - 1].receivedAt));
    expect(points.every((p) => p.bandVersion >= 1 && (p.lower !== null || p.upper !== null))).toBe(true);
  });
});

describe("who may read", () => {
  it("refuses page queries without a session", async () => {
    const res = await postGraphQL({ query: "{ builds { totalCount } }" });
    expect(res.status).toBe(401);
    expect(res.body.errors?.[0].extensions?.code).toBe("UNAUTHENTICATED");
  });

  it("refuses page queries to a CI token, which may only submit and read the gate", async () => {
    const res = await postGraphQL({ query: "{ builds { totalCount } }", token: ciToken() });
    expect(res.status).toBe(403);
    expect(res.body.errors?.[0].extensions?.code).toBe("FORBIDDEN");
    const gate = await postGraphQL<{ releaseGate: { state: string } }>({ query: `{ releaseGate(commit: "0000000") { state blocking } }`, token: ciToken() });
    expect(gate.body.errors).toBeUndefined();
    expect(gate.body.data!.releaseGate.state).toBe("pending");
  });
});
