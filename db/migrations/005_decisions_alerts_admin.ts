import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // What a person wants to hear about: a case (or all), a branch (or all), at once or as a digest.
  await knex.schema.createTable("subscriptions", (t) => {
    t.bigIncrements("id");
    t.bigInteger("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("case_key").references("cases.key").onDelete("CASCADE");
    t.text("branch");
    t.text("mode").notNullable().defaultTo("immediate");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("mode in ('immediate','digest')", [], "subscriptions_mode_check");
  });
  await knex.raw("create unique index subscriptions_scope_uq on subscriptions (user_id, coalesce(case_key, ''), coalesce(branch, ''))");

  // A re-judgement of a build against bands changed after it was evaluated. The
  // original verdicts stay in quantity_values; these rows sit beside them.
  await knex.schema.createTable("reevaluations", (t) => {
    t.bigIncrements("id");
    t.bigInteger("build_id").notNullable().references("builds.id").onDelete("CASCADE");
    t.bigInteger("requested_by").references("users.id").onDelete("SET NULL");
    t.text("reason").notNullable();
    t.timestamp("evaluated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("verdict").notNullable();
    t.check("verdict in ('within','marginal','outside','unbanded','missing')", [], "reevaluations_verdict_check");
  });
  await knex.raw("create index reevaluations_build_idx on reevaluations (build_id, evaluated_at desc)");
  await knex.schema.createTable("reevaluated_values", (t) => {
    t.bigIncrements("id");
    t.bigInteger("reevaluation_id").notNullable().references("reevaluations.id").onDelete("CASCADE");
    t.bigInteger("quantity_value_id").notNullable().references("quantity_values.id").onDelete("CASCADE");
    t.bigInteger("band_id").references("bands.id");
    t.text("verdict").notNullable();
    t.check("verdict in ('within','marginal','outside','unbanded','missing')", [], "reevaluated_values_verdict_check");
    t.unique(["reevaluation_id", "quantity_value_id"]);
  });

  // A one-time link for an invited person to set a password (only a hash is stored).
  await knex.schema.createTable("user_invites", (t) => {
    t.bigIncrements("id");
    t.bigInteger("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("token_hash").notNullable().unique();
    t.bigInteger("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
  });

  await knex.schema.alterTable("mail_outbox", (t) => {
    t.text("kind").notNullable().defaultTo("alert");
    t.bigInteger("build_id").references("builds.id").onDelete("SET NULL");
    t.check("kind in ('alert','digest','invite','notice')", [], "mail_outbox_kind_check");
  });
  await knex.schema.alterTable("users", (t) => {
    t.timestamp("deactivated_at", { useTz: true });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => t.dropColumn("deactivated_at"));
  await knex.schema.alterTable("mail_outbox", (t) => {
    t.dropChecks(["mail_outbox_kind_check"]);
    t.dropColumn("build_id");
    t.dropColumn("kind");
  });
  for (const table of ["user_invites", "reevaluated_values", "reevaluations", "subscriptions"]) await knex.schema.dropTable(table);
}
