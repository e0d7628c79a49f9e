import { Client } from "pg";
import type { FitSettings } from "@/lib/evaluation/types";
import { graphQLBody, postGraphQLBody, readServerPeakRssMb, requireEnv, appUrl, timedGraphQL } from "./http";
import { writeFloorSubmission } from "./floor";
import { generateBenchRuns, withFreshBuild } from "./payload";
import { measureRepeated, ratio, summarise, timeOnce, timeRepeated, type Timing } from "./stats";

// Section 1: the CI ingest through real HTTP against its floor.

const SUBMIT = /* GraphQL */ `mutation Submit($input: ResultSubmission!) { submitResults(input: $input) { created build { id } } }`;

export interface IngestSize {
  label: string;
  runs: number;
  payloadMb: number;
  endpoint: Timing;
  floor: Timing;
  ingestRatio: number;
  serverPeakRssMb: number;
  lastBuildId: string;
  /**
   * The bare route (see benchBareRoute) timed in the same loop, one request
   * beside each submission, with a body of this submission's size: the fair
   * denominator for "small ingest / bare route" on a machine with shared CPU.
   */
  bare: Timing;
  smallVsBare: number;
}

export async function benchIngest({ runs, repeats, label }: { runs: number; repeats: number; label: string }): Promise<IngestSize> {
  const generated = generateBenchRuns(runs, `bench-${label}`);
  let post = 0;
  // Bodies are serialised before the clock starts; only the round trip is timed.
  const bodyFor = (kind: string) => graphQLBody(SUBMIT, { input: withFreshBuild(generated, `${label}-${kind}-${post++}-${process.pid}-${Date.now()}`) });
  const sample = bodyFor("size");
  const token = requireEnv("TAULINE_CI_TOKEN");

  let lastBuildId = "";
  const endpointBodies = Array.from({ length: repeats + 1 }, () => bodyFor("endpoint"));
  const floorBodies = Array.from({ length: repeats + 1 }, () => bodyFor("floor"));
  const client = new Client({ connectionString: requireEnv("DATABASE_URL") });
  await client.connect();
  try {
    const settings = await readCaseSettings(client);
    // Endpoint and floor alternate, post for post: on a machine whose CPU is
    // shared, a burst of load then slows both sides of the ratio alike instead of
    // landing on whichever ran during it.
    const endpointSamples: number[] = [];
    const floorSamples: number[] = [];
    const bareSamples: number[] = [];
    const bareBody = graphQLBody(BARE_QUERY, { input: withFreshBuild(generated, `${label}-bare-${process.pid}`) });
    // Warm-up pairs (not timed): a fresh server loads route chunks and compiles
    // the ingest path on its first posts; a CI server answers warm.
    const warmups = runs <= 20 ? 3 : 1;
    for (let i = 0; i < warmups; i++) {
      await postGraphQLBody(bodyFor("warm-up"), { token });
      await writeFloorSubmission(client, bodyFor("warm-up"), settings);
      await postGraphQLBody(bareBody, { token });
    }
    for (let i = 1; i <= repeats; i++) {
      const e = await timedGraphQL(endpointBodies[i], { token }, (data) => {
        lastBuildId = (data as { submitResults: { build: { id: string } } }).submitResults.build.id;
      });
      const f = await timeOnce(() => writeFloorSubmission(client, floorBodies[i], settings));
      endpointSamples.push(e);
      floorSamples.push(f);
      bareSamples.push(await timedGraphQL(bareBody, { token }));
    }
    const endpoint = summarise(endpointSamples);
    const floor = summarise(floorSamples);
    const bare = summarise(bareSamples);
    console.log(`[bench] ${label}: endpoint ${endpoint.median.toFixed(1)} ms, floor ${floor.median.toFixed(1)} ms, bare route (same body size) ${bare.median.toFixed(1)} ms — medians of ${repeats} interleaved samples`);
    return {
      label,
      runs,
      payloadMb: Buffer.byteLength(sample) / 1e6,
      endpoint,
      floor,
      ingestRatio: ratio(endpoint.median, floor.median),
      serverPeakRssMb: readServerPeakRssMb(),
      lastBuildId,
      bare,
      smallVsBare: ratio(endpoint.median, bare.median),
    };
  } finally {
    await client.end();
  }
}

/**
 * The bare route the small submission is compared with. A GET of /api/health
 * carries no body, so against a 0.5 MB POST it would charge the ingest for the
 * upload itself. The honest bare route is the same request minus the work: the
 * small submission's very body (same size, same CI token, same route), posted
 * with a query that only reads the server's version — HTTP, body upload, JSON
 * parse, token check and GraphQL round trip, with the submission's variables
 * carried but unused. The health GET is still timed and printed for reference.
 */
export async function benchBareRoute(repeats: number): Promise<Timing> {
  const token = requireEnv("TAULINE_CI_TOKEN");
  const input = withFreshBuild(generateBenchRuns(SMALL_RUNS, "bench-bare"), `bare-${process.pid}`);
  const body = graphQLBody(BARE_QUERY, { input });
  const health = await timeRepeated(async () => {
    const res = await fetch(`${appUrl()}/api/health`);
    await res.text();
  }, repeats, 3);
  const bare = await measureRepeated(() => timedGraphQL(body, { token }), repeats, 3);
  console.log(
    `[bench] bare route = POST /api/graphql with the small submission's ${(Buffer.byteLength(body) / 1e6).toFixed(2)} MB body and { _version }: ` +
      `median ${bare.median.toFixed(1)} ms (GET /api/health, no body: ${health.median.toFixed(1)} ms)`,
  );
  return bare;
}

/** Runs in the small submission (the bare route carries a body of the same size). */
export const SMALL_RUNS = 5;
const BARE_QUERY = /* GraphQL */ `query Bare { _version }`;

async function readCaseSettings(client: Client): Promise<Map<string, FitSettings>> {
  const res = await client.query<{ key: string; parameters: FitSettings }>("select key, parameters from cases");
  return new Map(res.rows.map((r) => [r.key, r.parameters]));
}
