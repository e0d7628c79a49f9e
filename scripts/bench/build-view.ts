import { Client } from "pg";
import { exchangeGraphQL, graphQLBody, postGraphQLBody, requireEnv } from "./http";
import { generateBenchRuns, withFreshBuild } from "./payload";
import { BENCH_APPLICATION_NAME, StatementLog, captureRequestStatements, replayStatements } from "./statement-count";
import { measureRepeated, ratio, summarise, timeRepeated, type Timing } from "./stats";

// Section 3: the build page's query, build(id), for a build of many runs.

const BUILD = /* GraphQL */ `
  query Build($id: ID!) {
    build(id: $id) {
      id solver version commit branch pipelineUrl receivedAt verdict gate
      runCounts { within marginal outside unbanded missing }
      runs {
        id case model grid status iterations wallSeconds verdict
        quantities {
          key label unit value origin verdict reference source lower upper marginalMargin
          deviation deviationPct baselineValue baselineDelta drift driftReason
        }
      }
    }
  }
`;

export interface BuildViewResult {
  runs: number;
  quantityValues: number;
  http: Timing;
  bare: Timing;
  buildRatio: number;
  statements: { runs: number; count: number }[];
  /** The answer: JSON bytes, bytes on the wire and their encoding. */
  answerBytes: number;
  wireBytes: number;
  encoding: string;
  /** The client's own decoding and JSON.parse of the answer, after the clock stopped. */
  clientDecode: Timing;
}

export async function benchBuildView({ buildId, smallBuildId, repeats, cookie }: { buildId: string; smallBuildId: string; repeats: number; cookie: string }): Promise<BuildViewResult> {
  const body = graphQLBody(BUILD, { id: buildId });
  let runs = 0;
  let quantityValues = 0;
  let answerBytes = 0;
  let wireBytes = 0;
  let encoding = "";
  const decodeSamples: number[] = [];
  const http = await measureRepeated(async (i) => {
    const exchange = await exchangeGraphQL(body, { cookie });
    const data = exchange.data as { build: { runs: { quantities: unknown[] }[] } };
    runs = data.build.runs.length;
    quantityValues = data.build.runs.reduce((s, r) => s + r.quantities.length, 0);
    answerBytes = Buffer.byteLength(JSON.stringify({ data }));
    ({ wireBytes, encoding } = exchange);
    if (i >= 0) decodeSamples.push(exchange.clientMs);
    return exchange.ms;
  }, repeats, 2);

  // The bare side: the statements this very request sends (session check
  // included), taken from PostgreSQL's log with their values and replayed with pg.
  const statements = await captureRequestStatements(() => postGraphQLBody(body, { cookie }));
  const client = new Client({ connectionString: requireEnv("DATABASE_URL"), application_name: BENCH_APPLICATION_NAME });
  await client.connect();
  let bare: Timing;
  try {
    bare = await timeRepeated(() => replayStatements(client, statements), repeats, 2);
  } finally {
    await client.end();
  }

  // Counted after the timings: logging every statement slows the server down.
  const log = await StatementLog.open();
  const counted: { runs: number; count: number }[] = [];
  try {
    await log.setLogging(true);
    for (const id of [smallBuildId, buildId]) {
      const b = graphQLBody(BUILD, { id });
      await postGraphQLBody(b, { cookie });
      // The fewest of three: a statement of some background task cannot lower the count.
      const counts: number[] = [];
      let runCount = 0;
      for (let i = 0; i < 3; i++) {
        counts.push(await log.countDuring(async () => {
          const data = (await postGraphQLBody(b, { cookie })) as { build: { runs: unknown[] } };
          runCount = data.build.runs.length;
        }));
      }
      counted.push({ runs: runCount, count: Math.min(...counts) });
    }
  } finally {
    await log.setLogging(false).catch(() => undefined);
    await log.close();
  }
  return {
    runs, quantityValues, http, bare, buildRatio: ratio(http.median, bare.median), statements: counted,
    answerBytes, wireBytes, encoding, clientDecode: summarise(decodeSamples),
  };
}

const SUBMIT = /* GraphQL */ `mutation Submit($input: ResultSubmission!) { submitResults(input: $input) { build { id } } }`;

/** Builds of 5 and of `runs` runs posted for this section alone (`--only build`, without the ingest section's). */
export async function postViewBuilds(runs: number): Promise<{ buildId: string; smallBuildId: string }> {
  const token = requireEnv("TAULINE_CI_TOKEN");
  const post = async (n: number) => {
    const input = withFreshBuild(generateBenchRuns(n, `bench-view-${n}`), `view-${n}-${process.pid}-${Date.now()}`);
    const data = (await postGraphQLBody(graphQLBody(SUBMIT, { input }), { token })) as { submitResults: { build: { id: string } } };
    return data.submitResults.build.id;
  };
  return { smallBuildId: await post(5), buildId: await post(runs) };
}
