import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";

// How run_series keeps its arrays (db/migrations/011_series_storage.ts): lz4
// where the server has it, else uncompressed out of line — never pglz, which
// spent most of a series insert compressing. The values read back must be the
// very doubles written, compressed or not.

afterAll(closeTestDb);

describe("series storage", () => {
  it("compresses series with lz4 (or stores them uncompressed without it), not with pglz", async () => {
    const db = testDb();
    const lz4 = (await db.raw<{ rows: { lz4: boolean }[] }>("select 'lz4' = any(enumvals) as lz4 from pg_settings where name = 'default_toast_compression'")).rows[0].lz4;
    const columns = (await db.raw<{ rows: { attname: string; attcompression: string; attstorage: string }[] }>(
      "select attname, attcompression, attstorage from pg_attribute where attrelid = 'run_series'::regclass and attname in ('x', 'y') order by attname",
    )).rows;
    expect(columns.map((c) => c.attname)).toEqual(["x", "y"]);
    for (const c of columns) {
      // pg_attribute: attcompression 'l' = lz4; attstorage 'x' = extended (compressible), 'e' = external (never compressed).
      if (lz4) expect({ compression: c.attcompression, storage: c.attstorage }).toEqual({ compression: "l", storage: "x" });
      else expect(c.attstorage).toBe("e");
    }
  });

  it("gives back the exact doubles written, and compresses a compressible series", async () => {
    const db = testDb();
    // Edge doubles (IEEE 754: smallest subnormal, largest finite, 0.1 + 0.2) and a long run of iteration numbers that compresses well.
    const edges = [5e-324, 1.7976931348623157e308, -1.7976931348623157e308, 0.1 + 0.2, 2 ** -1074 * 3, 1 / 3, -2.5e-310];
    const x = Array.from({ length: 2000 }, (_, i) => i + 1);
    const y = Array.from({ length: 2000 }, (_, i) => edges[i % edges.length] * (i % 2 === 0 ? 1 : -1));
    await db.transaction(async (trx) => {
      const run = (await trx.raw<{ rows: { id: string }[] }>("select id from runs order by id limit 1")).rows[0];
      expect(run).toBeDefined();
      const inserted = await trx.raw<{ rows: { x: number[]; y: number[]; x_bytes: number; y_bytes: number }[] }>(
        `insert into run_series (run_id, key, x, y) values (?, 'storage-check', ?::float8[], ?::float8[])
         returning x, y, pg_column_size(x) as x_bytes, pg_column_size(y) as y_bytes`,
        [run.id, `{${x.join(",")}}`, `{${y.map((v) => v.toExponential(16)).join(",")}}`],
      );
      const stored = (await trx.raw<{ rows: { x: number[]; y: number[]; x_bytes: number }[] }>(
        "select x, y, pg_column_size(x) as x_bytes from run_series where run_id = ? and key = 'storage-check'",
        [run.id],
      )).rows[0];
      expect(inserted.rows).toHaveLength(1);
      expect(stored.x).toEqual(x);
      expect(stored.y.map((v) => Object.is(v, -0) ? 0 : v)).toEqual(y);
      const raw = 8 * x.length;
      const lz4 = (await trx.raw<{ rows: { lz4: boolean }[] }>("select 'lz4' = any(enumvals) as lz4 from pg_settings where name = 'default_toast_compression'")).rows[0].lz4;
      if (lz4) expect(stored.x_bytes).toBeLessThan(raw * 0.75);
      else expect(stored.x_bytes).toBeGreaterThanOrEqual(raw);
      await trx.rollback();
    }).catch((error: unknown) => {
      // knex rejects a transaction rolled back without an error with undefined.
      if (error !== undefined) throw error;
    });
  });
});
