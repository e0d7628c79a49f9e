import { describe, expect, it } from "vitest";
import { prepared } from "@/db/prepared";

// pg keeps a named statement per connection and refuses a name reused for
// another text ("Prepared statements must be unique"); PostgreSQL truncates
// identifiers beyond 63 bytes (NAMEDATALEN - 1, PostgreSQL documentation,
// "Identifiers and Key Words"), which could make two names collide.

describe("prepared", () => {
  it("gives one text one name, every time", () => {
    const sql = "select id from builds where id = ?";
    expect(prepared(sql)).toEqual(prepared(`${"select id from builds"} where id = ?`));
  });

  it("gives different texts different names, even texts that differ by one character or only in spacing", () => {
    const texts = ["select 1", "select 2", "select  1", "select 1 ", "SELECT 1", "select id from runs where id = ?", "select id from runs where id = $1"];
    const names = texts.map((t) => prepared(t).name);
    expect(new Set(names).size).toBe(texts.length);
  });

  it("makes names PostgreSQL keeps whole: a lower-case identifier under 64 bytes", () => {
    const name = prepared("select verdict from builds where id = ?").name;
    expect(name).toMatch(/^[a-z_][a-z0-9_]*$/);
    expect(Buffer.byteLength(name)).toBeLessThanOrEqual(63);
  });

  it("refuses statements that select or return *, whose cached plan breaks when a column is added", () => {
    // PostgreSQL answers such a prepared statement with "cached plan must not change result type" after
    // ALTER TABLE … ADD COLUMN (PostgreSQL documentation, PREPARE: plans are re-planned, result types may not change).
    for (const sql of ["select * from builds", "SELECT DISTINCT * FROM runs", 'select "b".* from "builds" as "b"', "insert into t (a) values (?) returning *", "select r.* from runs r", "select id, * from runs"]) {
      expect(() => prepared(sql), sql).toThrow(/name its columns/);
    }
    for (const sql of ["select count(*) from builds", "select id, 2 * value from quantity_values", "select id from runs where a * b > 1", "insert into t (a) values (?) returning id"]) {
      expect(() => prepared(sql), sql).not.toThrow();
    }
  });
});
