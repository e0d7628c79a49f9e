import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import type { Client } from "pg";
import { from as copyFrom } from "pg-copy-streams";
import { prepared } from "@/db/prepared";
import { encodeSeriesCopy } from "@/db/queries/series-copy";
import { deriveRunQuantities } from "@/lib/evaluation/derive";
import type { FitSettings } from "@/lib/evaluation/types";
import type { RunSubmission } from "@/lib/validation/submission";

// The ingest floor of issue 5: parse the very JSON the endpoint receives, run
// the same lib/analysis derivations (deriveRunQuantities), and write the same
// rows (build, runs, run_series as float8[], run_coefficients, quantity_values)
// in one transaction with the fastest path the schema allows: series by binary
// COPY (the same encoder the endpoint uses); runs, coefficients and quantity
// values in one statement of JSON documents (as the endpoint).
// No GraphQL, no zod, no judging against bands (every value is stored 'unbanded').

interface PostedBody {
  variables: { input: { build: { solver: string; version: string; commit: string; branch: string }; runs: RunSubmission[] } };
}

// Prepared, as the endpoint's hot statements are (db/prepared.ts): the floor takes the fastest path pg offers.
const INSERT_BUILD = "insert into builds (solver, version, commit, branch, verdict) values ($1, $2, $3, $4, 'unbanded') returning id, received_at";
const INSERT_RUNS = `with r as (
       insert into runs (build_id, case_key, model_key, grid, status, iterations, wall_seconds, verdict)
       select $1::bigint, x.c, x.m, x.g, x.s, x.i, x.w, 'unbanded' from json_to_recordset($4::json) as x(c text, m text, g text, s text, i int, w float8)
       returning id, case_key, model_key, grid
     ), coefficients as (
       insert into run_coefficients (run_id, name, value)
       select r.id, x.n, x.v from json_to_recordset($5::json) as x(c text, m text, g text, n text, v float8)
         join r on r.case_key = x.c and r.model_key = x.m and r.grid = x.g
     ), "values" as (
       insert into quantity_values (build_id, branch, build_received_at, run_id, case_key, model_key, grid, quantity_key, value, origin, verdict, details)
       select $1::bigint, $2::text, $3::timestamptz, r.id, r.case_key, r.model_key, r.grid, x.k, x.v, x.o, 'unbanded', coalesce(x.dt, '{}')
         from json_to_recordset($6::json) as x(c text, m text, g text, k text, v float8, o text, dt jsonb)
         join r on r.case_key = x.c and r.model_key = x.m and r.grid = x.g
     )
     select id, case_key, model_key, grid from r`;

export async function writeFloorSubmission(client: Client, body: string, caseSettings: Map<string, FitSettings>): Promise<void> {
  const { build, runs } = (JSON.parse(body) as PostedBody).variables.input;
  const derived = runs.map((run) => deriveRunQuantities({ ...run, grid: run.grid ?? "default" }, () => caseSettings.get(run.case) ?? {}));

  await client.query("begin");
  try {
    const b = await client.query<{ id: string; received_at: Date }>({
      ...prepared(INSERT_BUILD),
      text: INSERT_BUILD,
      values: [build.solver, build.version, build.commit, build.branch],
    });
    const buildId = b.rows[0].id;
    const receivedAt = b.rows[0].received_at;
    // Runs, coefficients and quantity values in one statement, rows as JSON documents (the endpoint's way).
    const key = (r: RunSubmission) => ({ c: r.case, m: r.model, g: r.grid ?? "default" });
    const runRows = runs.map((r) => ({ ...key(r), s: r.status, i: r.iterations ?? null, w: r.wallSeconds ?? null }));
    const coefficientRows = runs.flatMap((r) => (r.coefficients ?? []).map((c) => ({ ...key(r), n: c.name, v: c.value })));
    const valueRows = runs.flatMap((r, i) => derived[i].quantities.map((q) => ({ ...key(r), k: q.key, v: q.value, o: q.origin, dt: q.details })));
    const inserted = await client.query<{ id: string; case_key: string; model_key: string; grid: string }>({
      ...prepared(INSERT_RUNS),
      text: INSERT_RUNS,
      values: [buildId, build.branch, receivedAt, JSON.stringify(runRows), JSON.stringify(coefficientRows), JSON.stringify(valueRows)],
    });
    const idOf = new Map(inserted.rows.map((r) => [`${r.case_key}|${r.model_key}|${r.grid}`, Number(r.id)]));
    const seriesRows = runs.flatMap((r) => (r.series ?? []).map((s) => ({ runId: idOf.get(`${r.case}|${r.model}|${r.grid ?? "default"}`)!, key: s.key, x: s.x, y: s.y })));
    await pipeline(Readable.from(encodeSeriesCopy(seriesRows)), client.query(copyFrom("COPY run_series (run_id, key, x, y) FROM STDIN (FORMAT binary)")));
    await client.query("commit");
  } catch (error) {
    await client.query("rollback");
    throw error;
  }
}
