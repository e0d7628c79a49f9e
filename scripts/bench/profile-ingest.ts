import { Client } from "pg";
import { closeDb } from "@/db";
import { yoga } from "@/graphql/server";
import type { FitSettings } from "@/lib/evaluation/types";
import { writeFloorSubmission } from "./floor";
import { graphQLBody, requireEnv } from "./http";
import { generateBenchRuns, withFreshBuild } from "./payload";
import { ratio, timeRepeated } from "./stats";

// In-process ingest probe for profiling (issue 5): the yoga handler the route
// re-exports, called with a real Request, against the floor in the same process
// and on the same database. Run it under `node --cpu-prof` to see where the
// endpoint's time goes without HTTP or Next in the picture:
//   DATABASE_URL=… npx tsx --conditions=react-server scripts/bench/profile-ingest.ts [runs] [repeats]
// It posts on the branch bench/profile; point it at a database of your own.

const SUBMIT = /* GraphQL */ `mutation Submit($input: ResultSubmission!) { submitResults(input: $input) { created build { id } } }`;

async function main() {
  const runs = Number(process.argv[2] ?? 200);
  const repeats = Number(process.argv[3] ?? 4);
  const token = requireEnv("TAULINE_CI_TOKEN");
  const generated = generateBenchRuns(runs, "profile");
  let n = 0;
  const body = () => {
    const input = withFreshBuild(generated, `profile-${process.pid}-${Date.now()}-${n++}`);
    return graphQLBody(SUBMIT, { input: { ...input, build: { ...input.build, branch: "bench/profile" } } });
  };

  const endpointBodies = Array.from({ length: repeats + 1 }, body);
  let e = 0;
  const cpu = cpuMeter();
  const endpoint = await timeRepeated(async () => {
    const res = await yoga.fetch("http://127.0.0.1/api/graphql", {
      method: "POST",
      headers: { "content-type": "application/json", authorization: `Bearer ${token}` },
      body: endpointBodies[e++],
    });
    const text = await res.text();
    if (res.status !== 200 || text.includes('"errors"')) throw new Error(`endpoint answered ${res.status}: ${text.slice(0, 300)}`);
  }, repeats);
  const endpointCpu = cpu.read(repeats + 1);

  const client = new Client({ connectionString: requireEnv("DATABASE_URL") });
  await client.connect();
  const settings = new Map((await client.query<{ key: string; parameters: FitSettings }>("select key, parameters from cases")).rows.map((r) => [r.key, r.parameters]));
  const floorBodies = Array.from({ length: repeats + 1 }, body);
  let f = 0;
  const floorMeter = cpuMeter();
  const floor = await timeRepeated(() => writeFloorSubmission(client, floorBodies[f++], settings), repeats);
  const floorCpu = floorMeter.read(repeats + 1);
  await client.end();
  await closeDb();
  const mb = Buffer.byteLength(endpointBodies[0]) / 1e6;
  console.log(JSON.stringify({ runs, payloadMb: +mb.toFixed(1), endpointMs: endpoint.samples.map(Math.round), floorMs: floor.samples.map(Math.round), ratio: +ratio(endpoint.median, floor.median).toFixed(2), cpuMsPerPost: { endpoint: endpointCpu, floor: floorCpu }, rssMb: Math.round(process.memoryUsage().rss / 2 ** 20) }));
}

/** This process's CPU time (user + system) per call: wall time on a shared machine is noisy, CPU time less so. */
function cpuMeter() {
  const start = process.cpuUsage();
  return {
    read(calls: number) {
      const used = process.cpuUsage(start);
      return Math.round((used.user + used.system) / 1000 / calls);
    },
  };
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
