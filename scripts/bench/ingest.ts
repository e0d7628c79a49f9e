import { Client } from "pg";
import type { FitSettings } from "@/lib/evaluation/types";
import { graphQLBody, postGraphQLBody, readServerPeakRssMb, requireEnv, appUrl } from "./http";
import { writeFloorSubmission } from "./floor";
import { generateBenchRuns, withFreshBuild } from "./payload";
import { ratio, timeRepeated, type Timing } from "./stats";

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
}

export async function benchIngest({ runs, repeats, label }: { runs: number; repeats: number; label: string }): Promise<IngestSize> {
  const generated = generateBenchRuns(runs, `bench-${label}`);
  let post = 0;
  // Bodies are serialised before the clock starts; only the round trip is timed.
  const bodyFor = (kind: string) => graphQLBody(SUBMIT, { input: withFreshBuild(generated, `${label}-${kind}-${post++}-${process.pid}-${Date.now()}`) });
  const sample = bodyFor("size");
  const token = requireEnv("TAULINE_CI_TOKEN");

  let lastBuildId = "";
  const bodies: string[] = [];
  for (let i = 0; i < repeats + 1; i++) bodies.push(bodyFor("endpoint"));
  let next = 0;
  const endpoint = await timeRepeated(async () => {
    const data = (await postGraphQLBody(bodies[next++], { token })) as { submitResults: { build: { id: string } } };
    lastBuildId = data.submitResults.build.id;
  }, repeats);
  const serverPeakRssMb = readServerPeakRssMb();

  const client = new Client({ connectionString: requireEnv("DATABASE_URL") });
  await client.connect();
  try {
    const settings = await readCaseSettings(client);
    const floorBodies: string[] = [];
    for (let i = 0; i < repeats + 1; i++) floorBodies.push(bodyFor("floor"));
    let f = 0;
    const floor = await timeRepeated(() => writeFloorSubmission(client, floorBodies[f++], settings), repeats);
    return {
      label,
      runs,
      payloadMb: Buffer.byteLength(sample) / 1e6,
      endpoint,
      floor,
      ingestRatio: ratio(endpoint.median, floor.median),
      serverPeakRssMb,
      lastBuildId,
    };
  } finally {
    await client.end();
  }
}

/** The bare route: a GET of /api/health, the smallest round trip the app serves. */
export async function benchBareRoute(repeats: number): Promise<Timing> {
  return timeRepeated(async () => {
    const res = await fetch(`${appUrl()}/api/health`);
    await res.text();
  }, repeats, 3);
}

async function readCaseSettings(client: Client): Promise<Map<string, FitSettings>> {
  const res = await client.query<{ key: string; parameters: FitSettings }>("select key, parameters from cases");
  return new Map(res.rows.map((r) => [r.key, r.parameters]));
}
