import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import type { Client } from "pg";
import { from as copyFrom } from "pg-copy-streams";
import { encodeSeriesCopy } from "@/db/queries/series-copy";
import { deriveRunQuantities } from "@/lib/evaluation/derive";
import type { FitSettings } from "@/lib/evaluation/types";
import type { RunSubmission } from "@/lib/validation/submission";

// The ingest floor of issue 5: parse the very JSON the endpoint receives, run
// the same lib/analysis derivations (deriveRunQuantities), and write the same
// rows (build, runs, run_series as float8[], run_coefficients, quantity_values)
// in one transaction with the fastest path the schema allows: series by binary
// COPY (the same encoder the endpoint uses), quantity values as one JSON
// document (as the endpoint), the few runs and coefficients by multi-row inserts.
// No GraphQL, no zod, no judging against bands (every value is stored 'unbanded').

// PostgreSQL allows at most 65,535 bind parameters per statement.
const MAX_PARAMS = 60_000;

interface PostedBody {
  variables: { input: { build: { solver: string; version: string; commit: string; branch: string }; runs: RunSubmission[] } };
}

export async function writeFloorSubmission(client: Client, body: string, caseSettings: Map<string, FitSettings>): Promise<void> {
  const { build, runs } = (JSON.parse(body) as PostedBody).variables.input;
  const derived = runs.map((run) => deriveRunQuantities({ ...run, grid: run.grid ?? "default" }, () => caseSettings.get(run.case) ?? {}));

  await client.query("begin");
  try {
    const b = await client.query<{ id: string; received_at: Date }>(
      "insert into builds (solver, version, commit, branch, verdict) values ($1, $2, $3, $4, 'unbanded') returning id, received_at",
      [build.solver, build.version, build.commit, build.branch],
    );
    const buildId = b.rows[0].id;
    const receivedAt = b.rows[0].received_at;
    const runRows = runs.map((r) => [buildId, r.case, r.model, r.grid ?? "default", r.status, r.iterations ?? null, r.wallSeconds ?? null, "unbanded"]);
    const runIds = (await insertRows<{ id: string }>(client, "runs (build_id, case_key, model_key, grid, status, iterations, wall_seconds, verdict)", runRows, "returning id")).map((r) => r.id);

    const seriesRows = runs.flatMap((r, i) => (r.series ?? []).map((s) => ({ runId: Number(runIds[i]), key: s.key, x: s.x, y: s.y })));
    await pipeline(Readable.from(encodeSeriesCopy(seriesRows)), client.query(copyFrom("COPY run_series (run_id, key, x, y) FROM STDIN (FORMAT binary)")));
    const coefficientRows = runs.flatMap((r, i) => (r.coefficients ?? []).map((c) => [runIds[i], c.name, c.value]));
    await insertRows(client, "run_coefficients (run_id, name, value)", coefficientRows);
    // The endpoint's own way for thousands of rows: one JSON document unpacked by json_to_recordset.
    const values = runs.flatMap((r, i) => derived[i].quantities.map((q) => ({ r: runIds[i], k: q.key, v: q.value, o: q.origin, dt: q.details })));
    await client.query(
      `insert into quantity_values (build_id, branch, build_received_at, run_id, case_key, model_key, grid, quantity_key, value, origin, verdict, details)
       select $1::bigint, $2::text, $3::timestamptz, x.r, run.case_key, run.model_key, run.grid, x.k, x.v, x.o, 'unbanded', coalesce(x.dt, '{}')
         from json_to_recordset($4::json) as x(r bigint, k text, v float8, o text, dt jsonb)
         join runs run on run.id = x.r`,
      [buildId, build.branch, receivedAt, JSON.stringify(values)],
    );
    await client.query("commit");
  } catch (error) {
    await client.query("rollback");
    throw error;
  }
}

/** Multi-row INSERT, split only where the bind-parameter limit forces it. */
async function insertRows<T extends object = Record<string, unknown>>(
  client: Client,
  target: string,
  rows: unknown[][],
  suffix = "",
): Promise<T[]> {
  if (rows.length === 0) return [];
  const width = rows[0].length;
  const perStatement = Math.floor(MAX_PARAMS / width);
  const out: T[] = [];
  for (let start = 0; start < rows.length; start += perStatement) {
    const chunk = rows.slice(start, start + perStatement);
    const values = chunk.map((_, r) => `(${Array.from({ length: width }, (_, c) => `$${r * width + c + 1}`).join(", ")})`).join(", ");
    const res = await client.query<T & object>(`insert into ${target} values ${values} ${suffix}`, chunk.flat());
    out.push(...(res.rows as T[]));
  }
  return out;
}
