import type { Knex } from "knex";

const VERDICTS = "('within','marginal','outside','unbanded','missing')";

export async function up(knex: Knex): Promise<void> {
  // A re-judgement also covers a quantity that a band added later now expects and
  // the run never produced: it is judged `missing` with no stored value to point
  // to. So each re-judged row names its run and quantity itself, and the stored
  // value is optional.
  await knex.schema.alterTable("reevaluated_values", (t) => {
    t.bigInteger("run_id").references("runs.id").onDelete("CASCADE");
    t.text("quantity_key");
  });
  await knex.raw(
    "update reevaluated_values rv set run_id = q.run_id, quantity_key = q.quantity_key from quantity_values q where q.id = rv.quantity_value_id",
  );
  await knex.raw(
    "alter table reevaluated_values alter column run_id set not null, alter column quantity_key set not null, alter column quantity_value_id drop not null",
  );
  await knex.raw("create unique index reevaluated_values_run_quantity_uq on reevaluated_values (reevaluation_id, run_id, quantity_key)");

  // The build's verdict as it was judged when the re-judgement ran: a later re-post
  // may change builds.verdict, and the record must still say what it was compared with.
  await knex.schema.alterTable("reevaluations", (t) => {
    t.text("original_verdict");
    t.check(`original_verdict is null or original_verdict in ${VERDICTS}`, [], "reevaluations_original_verdict_check");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("reevaluations", (t) => {
    t.dropChecks(["reevaluations_original_verdict_check"]);
    t.dropColumn("original_verdict");
  });
  await knex("reevaluated_values").whereNull("quantity_value_id").delete();
  await knex.raw("drop index reevaluated_values_run_quantity_uq");
  await knex.raw("alter table reevaluated_values alter column quantity_value_id set not null");
  await knex.schema.alterTable("reevaluated_values", (t) => {
    t.dropColumn("quantity_key");
    t.dropColumn("run_id");
  });
}
