import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // Recent sign-in attempts per account and per address (lib/auth/sign-in-throttle.ts),
  // in PostgreSQL so that every app instance counts the same attempts. The columns
  // are the ones rate-limiter-flexible's PostgreSQL store reads and writes: the
  // key ("account:<sha-256 of the e-mail>" or "address:<ip>"), the attempts counted
  // in the current window, and the window's end in epoch milliseconds.
  await knex.schema.createTable("sign_in_throttle", (t) => {
    t.string("key", 255).primary();
    t.integer("points").notNullable().defaultTo(0);
    t.bigInteger("expire");
  });
  // The store deletes windows that ended an hour ago, every five minutes.
  await knex.raw("create index sign_in_throttle_expire_idx on sign_in_throttle (expire)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("sign_in_throttle");
}
