import "server-only";
import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import type { Knex } from "knex";
import type { PoolClient } from "pg";
import { from as copyFrom } from "pg-copy-streams";

// Profiles are most of a submission (a large build: 600 series, 1.2 million
// numbers). Sent as float8[] parameters, pg writes each number as text and
// escapes it with a regular expression (its array serialiser), which cost more
// than the whole derivation. Binary COPY sends the IEEE doubles as they are:
// 12 bytes per number, no formatting, no parsing on the server.

export interface SeriesRow {
  runId: number;
  key: string;
  x: readonly number[];
  y: readonly number[];
}

const SIGNATURE = Buffer.from("PGCOPY\n\xff\r\n\0", "latin1");
const FLOAT8_OID = 701;

/** Writes series rows with one binary COPY on the transaction's own connection. */
export async function copySeriesRows({ trx, rows }: { trx: Knex.Transaction; rows: readonly SeriesRow[] }): Promise<void> {
  if (rows.length === 0) return;
  // Inside a transaction knex hands out the transaction's connection (and never releases it).
  const connection = (await trx.client.acquireConnection()) as PoolClient;
  const stream = connection.query(copyFrom("COPY run_series (run_id, key, x, y) FROM STDIN (FORMAT binary)"));
  await pipeline(Readable.from(encodeSeriesCopy(rows)), stream);
}

/** The binary COPY stream: header, one tuple per row (encoded lazily, so only one row's buffer lives at a time), trailer. */
export function* encodeSeriesCopy(rows: readonly SeriesRow[]): Generator<Buffer> {
  const header = Buffer.alloc(SIGNATURE.length + 8);
  SIGNATURE.copy(header, 0);
  yield header;
  for (const row of rows) yield encodeRow(row);
  const trailer = Buffer.alloc(2);
  trailer.writeInt16BE(-1, 0);
  yield trailer;
}

function encodeRow(row: SeriesRow): Buffer {
  const key = Buffer.from(row.key, "utf8");
  const size = 2 + (4 + 8) + (4 + key.length) + arraySize(row.x.length) + arraySize(row.y.length);
  const buffer = Buffer.allocUnsafe(size);
  const view = new DataView(buffer.buffer, buffer.byteOffset, buffer.byteLength);
  let at = 0;
  view.setInt16(at, 4);
  at += 2;
  view.setInt32(at, 8);
  view.setBigInt64(at + 4, BigInt(row.runId));
  at += 12;
  view.setInt32(at, key.length);
  key.copy(buffer, at + 4);
  at += 4 + key.length;
  at = writeFloatArray(view, at, row.x);
  writeFloatArray(view, at, row.y);
  return buffer;
}

// An array value: its length, then ndim, has-nulls flag, element type, and per
// dimension its size and lower bound (1), then each element as length + value.
const arraySize = (n: number) => 4 + 20 + 12 * n;

function writeFloatArray(view: DataView, start: number, values: readonly number[]): number {
  let at = start;
  view.setInt32(at, arraySize(values.length) - 4);
  view.setInt32(at + 4, 1);
  view.setInt32(at + 8, 0);
  view.setInt32(at + 12, FLOAT8_OID);
  view.setInt32(at + 16, values.length);
  view.setInt32(at + 20, 1);
  at += 24;
  for (let i = 0; i < values.length; i++) {
    view.setInt32(at, 8);
    // + 0 turns -0 into 0, as the text path ("0") stores it.
    view.setFloat64(at + 4, values[i] + 0);
    at += 12;
  }
  return at;
}
