import { Client } from "pg";
import { graphQLBody, postGraphQLBody, requireEnv } from "./http";
import { StatementLog } from "./statement-count";
import { ratio, timeRepeated, type Timing } from "./stats";

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

// What that answer needs, read the plainest way: the build, its newest gate
// decision, its runs, and every quantity value joined to its band and definition.
const BARE_BUILD_SQL = [
  "select * from builds where id = $1",
  "select state from gate_decisions where build_id = $1 order by decided_at desc, id desc limit 1",
  "select * from runs where build_id = $1 order by id",
  `select v.*, d.reference, d.source, d.lower, d.upper, d.marginal_margin, q.label, q.unit
     from quantity_values v
     left join bands d on d.id = v.band_id
     left join quantity_definitions q on q.key = v.quantity_key
    where v.build_id = $1
    order by v.run_id, v.id`,
];

export interface BuildViewResult {
  runs: number;
  quantityValues: number;
  http: Timing;
  bare: Timing;
  buildRatio: number;
  statements: { runs: number; count: number }[];
}

export async function benchBuildView({ buildId, smallBuildId, repeats, cookie }: { buildId: string; smallBuildId: string; repeats: number; cookie: string }): Promise<BuildViewResult> {
  const body = graphQLBody(BUILD, { id: buildId });
  let runs = 0;
  let quantityValues = 0;
  const http = await timeRepeated(async () => {
    const data = (await postGraphQLBody(body, { cookie })) as { build: { runs: { quantities: unknown[] }[] } };
    runs = data.build.runs.length;
    quantityValues = data.build.runs.reduce((s, r) => s + r.quantities.length, 0);
  }, repeats, 2);

  const client = new Client({ connectionString: requireEnv("DATABASE_URL") });
  await client.connect();
  let bare: Timing;
  try {
    bare = await timeRepeated(async () => {
      for (const sql of BARE_BUILD_SQL) await client.query(sql, [buildId]);
    }, repeats, 2);
  } finally {
    await client.end();
  }

  // Counted after the timings: logging every statement slows the server down.
  const log = await StatementLog.open();
  const statements: { runs: number; count: number }[] = [];
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
      statements.push({ runs: runCount, count: Math.min(...counts) });
    }
  } finally {
    await log.setLogging(false).catch(() => undefined);
    await log.close();
  }
  return { runs, quantityValues, http, bare, buildRatio: ratio(http.median, bare.median), statements };
}
