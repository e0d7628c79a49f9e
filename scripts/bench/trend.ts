import { Client } from "pg";
import { graphQLBody, requireEnv, timedGraphQL } from "./http";
import { BENCH_APPLICATION_NAME, captureRequestStatements, replayStatements } from "./statement-count";
import { measureRepeated, ratio, timeRepeated, type Timing } from "./stats";

// Section 2: trend(case, quantity, model, branch, last) as history grows. Each
// history size lives on a branch of its own in the same tables, so the larger
// histories also sit beside the smaller ones, as on a real server.

const TREND = /* GraphQL */ `
  query Trend($case: String!, $quantity: String!, $model: String!, $branch: String!, $last: Int!) {
    trend(case: $case, quantity: $quantity, model: $model, branch: $branch, last: $last) {
      points { buildId commit version receivedAt value verdict drift driftReason bandVersion reference lower upper marginalMargin }
    }
  }
`;

const WARM_UP = 20;

const SERIES = { case: "flat-plate-zpg", quantity: "kappa", model: "sa", grid: "default" };

export interface TrendSize {
  history: number;
  last: number;
  seedSeconds: number;
  http: Timing;
  bare: Timing;
  trendRatio: number;
  httpPerPointMs: number;
  barePerPointMs: number;
  /** Node types of the plan PostgreSQL chose for the trend statement, outermost first. */
  plan: string[];
  /** SQL statements one trend request sends (the bare side replays them all). */
  statements: number;
  /**
   * The same signed-in round trip asking `{ _version }` (session check, no
   * data): what any answer costs before its first row, shown beside the ratio
   * because it alone can exceed twice the trend's SQL.
   */
  emptyQuery: Timing;
}

/** Bulk path: builds, runs and quantity_values of one series from generate_series in one statement. */
async function seedHistory(client: Client, branch: string, n: number): Promise<void> {
  const band = await client.query<{ id: string }>(
    "select id from bands where case_key = $1 and quantity_key = $2 and (model_key = $3 or model_key is null) order by version desc limit 1",
    [SERIES.case, SERIES.quantity, SERIES.model],
  );
  await client.query(
    `with b as (
       insert into builds (solver, version, commit, branch, received_at, updated_at, verdict)
       select 'Cormorant', '9.' || g, md5($1 || g) || left(md5('c' || $1 || g), 8), $1,
              now() - make_interval(mins => $2 - g), now() - make_interval(mins => $2 - g), 'within'
         from generate_series(1, $2::int) g
       returning id, received_at),
     r as (
       insert into runs (build_id, case_key, model_key, grid, status, verdict, received_at)
       select id, $3, $4, $5, 'COMPLETED', 'within', received_at from b
       returning id, build_id, received_at)
     insert into quantity_values (run_id, build_id, case_key, model_key, grid, branch, build_received_at, quantity_key, value, origin, band_id, verdict)
     select r.id, r.build_id, $3, $4, $5, $1, r.received_at, $6, 0.41 + 0.002 * (random() - 0.5), 'derived', $7, 'within' from r`,
    [branch, n, SERIES.case, SERIES.model, SERIES.grid, SERIES.quantity, band.rows[0]?.id ?? null],
  );
}

export async function benchTrend({ sizes, last, repeats, cookie }: { sizes: number[]; last: number; repeats: number; cookie: string }): Promise<TrendSize[]> {
  const client = new Client({ connectionString: requireEnv("DATABASE_URL"), application_name: BENCH_APPLICATION_NAME });
  await client.connect();
  const out: TrendSize[] = [];
  try {
    for (const n of sizes) {
      const branch = `bench/trend-${n}-${process.pid}`;
      const started = Date.now();
      await seedHistory(client, branch, n);
      // Vacuumed as well as analysed: otherwise autovacuum starts on the fresh rows
      // while the section measures, and takes one of the machine's two cores.
      await client.query("vacuum analyze builds, runs, quantity_values");
      const seedSeconds = (Date.now() - started) / 1000;
      const variables = { case: SERIES.case, quantity: SERIES.quantity, model: SERIES.model, branch, last };
      const body = graphQLBody(TREND, variables);
      let points = 0;
      const ask = () =>
        timedGraphQL(body, { cookie }, (data) => {
          points = (data as { trend: { points: unknown[] } }).trend.points.length;
        });
      // The bare side is the very SQL this request sends (session check
      // included), taken from PostgreSQL's log and replayed with pg.
      const statements = await captureRequestStatements(ask);
      const trendStatement = statements.find((s) => /from quantity_values/i.test(s.text));
      if (!trendStatement) throw new Error(`trend request sent no quantity_values statement (${statements.length} statements logged)`);
      // Steady state on both sides: 20 unmeasured rounds first (the first requests of a
      // fresh server compile the query with graphql-jit and warm V8's optimiser).
      const http = await measureRepeated(ask, repeats, WARM_UP);
      const emptyBody = graphQLBody("query Empty { _version }", {});
      const emptyQuery = await measureRepeated(() => timedGraphQL(emptyBody, { cookie }), repeats, WARM_UP);
      const bare = await timeRepeated(() => replayStatements(client, statements), repeats, WARM_UP);
      const returned = Math.max(points, 1);
      const explained = await client.query<{ "QUERY PLAN": [{ Plan: PlanNode }] }>(`explain (format json) ${trendStatement.text}`, trendStatement.params);
      out.push({
        history: n, last: points, seedSeconds, http, bare,
        trendRatio: ratio(http.median, bare.median),
        httpPerPointMs: http.median / returned,
        barePerPointMs: bare.median / returned,
        plan: listNodes(explained.rows[0]["QUERY PLAN"][0].Plan),
        statements: statements.length,
        emptyQuery,
      });
    }
  } finally {
    await client.end();
  }
  return out;
}

interface PlanNode {
  "Node Type": string;
  "Index Name"?: string;
  Plans?: PlanNode[];
}

function listNodes(node: PlanNode): string[] {
  const here = node["Index Name"] ? `${node["Node Type"]} (${node["Index Name"]})` : node["Node Type"];
  return [here, ...(node.Plans ?? []).flatMap(listNodes)];
}
