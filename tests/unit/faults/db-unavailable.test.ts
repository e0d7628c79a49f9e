import knexFactory from "knex";
import pg from "pg";
import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable } from "@/lib/db-unavailable";
import { findFreePort } from "../../helpers/stack-process";

// Which failures the API answers with 503 + Retry-After (retry later) instead of
// 500. The socket errors are produced for real against a closed port on
// 127.0.0.1; SQLSTATEs are those PostgreSQL sends (PostgreSQL documentation,
// Appendix A "PostgreSQL Error Codes").

function pgError(message: string, code: string): Error {
  return Object.assign(new Error(message), { code });
}

describe("isDatabaseUnavailable", () => {
  it("recognises a refused connection from node-pg and from a Knex pool", async () => {
    const port = await findFreePort();
    const client = new pg.Client({ connectionString: `postgres://nobody@127.0.0.1:${port}/none` });
    const direct = await client.connect().then(() => null, (e: unknown) => e);
    expect(isDatabaseUnavailable(direct)).toBe(true);

    const db = knexFactory({ client: "pg", connection: `postgres://nobody@127.0.0.1:${port}/none`, pool: { min: 0, max: 1 }, acquireConnectionTimeout: 2000 });
    const pooled = await db.raw("select 1").then(() => null, (e: unknown) => e);
    await db.destroy();
    expect(isDatabaseUnavailable(pooled)).toBe(true);
  });

  it("recognises the server's shutdown, start-up and connection-slot errors by SQLSTATE", () => {
    expect(isDatabaseUnavailable(pgError("terminating connection due to administrator command", "57P01"))).toBe(true);
    expect(isDatabaseUnavailable(pgError("terminating connection because of crash of another server process", "57P02"))).toBe(true);
    expect(isDatabaseUnavailable(pgError("the database system is starting up", "57P03"))).toBe(true);
    expect(isDatabaseUnavailable(pgError("sorry, too many clients already", "53300"))).toBe(true);
  });

  it("recognises the failed ROLLBACK that Knex reports in place of the cut connection's error", () => {
    expect(isDatabaseUnavailable(new Error("ROLLBACK - Client has encountered a connection error and is not queryable"))).toBe(true);
  });

  it("looks inside wrappers: an error's cause and an AggregateError of connect attempts", () => {
    const refused = pgError("connect ECONNREFUSED 127.0.0.1:5432", "ECONNREFUSED");
    expect(isDatabaseUnavailable(new Error("request failed", { cause: refused }))).toBe(true);
    expect(isDatabaseUnavailable(new AggregateError([refused], "all addresses failed"))).toBe(true);
  });

  it("leaves errors of the request itself alone: constraint violations, syntax, plain bugs", () => {
    expect(isDatabaseUnavailable(pgError('duplicate key value violates unique constraint "builds_commit_key"', "23505"))).toBe(false);
    expect(isDatabaseUnavailable(pgError('syntax error at or near "selct"', "42601"))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("Cannot read properties of undefined"))).toBe(false);
    expect(isDatabaseUnavailable("ECONNREFUSED")).toBe(false); // not an Error
  });
});
