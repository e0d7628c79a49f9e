import type { Knex } from "knex";

// Series arrays compressed with lz4 instead of pglz (issue 5). pglz, the
// default, spent most of a series insert compressing: on PostgreSQL 15 here,
// 600 stored series of 1,000 points (the large bench build) went in in
// 103–108 ms with pglz, 32–35 ms with lz4, 29–31 ms uncompressed. lz4 also
// compresses them better: the solver's profiles 8.1 kB → 5.1 kB (pglz gave up
// on them), residual iteration numbers 8.0 kB → 1.7 kB (pglz: 3.3 kB). A server
// built without lz4 (it is optional at compile time) stores series
// uncompressed instead, which is as fast. Rows already stored keep their form;
// reads do not change.

export async function up(knex: Knex): Promise<void> {
  if (await hasLz4(knex)) {
    await knex.raw("alter table run_series alter column x set compression lz4, alter column y set compression lz4");
  } else {
    await knex.raw("alter table run_series alter column x set storage external, alter column y set storage external");
  }
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(
    "alter table run_series alter column x set compression default, alter column y set compression default, " +
      "alter column x set storage extended, alter column y set storage extended",
  );
}

async function hasLz4(knex: Knex): Promise<boolean> {
  const result = await knex.raw<{ rows: { lz4: boolean }[] }>(
    "select 'lz4' = any(enumvals) as lz4 from pg_settings where name = 'default_toast_compression'",
  );
  return result.rows[0]?.lz4 === true;
}
