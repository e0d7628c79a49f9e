import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // A turbulence closure the solver offers (sa, k-epsilon, k-omega, sst, lrr, ssg).
  await knex.schema.createTable("models", (t) => {
    t.text("key").primary();
    t.text("name").notNullable();
    t.text("family").notNullable();
    t.text("reference").notNullable();
    t.check("key ~ '^[a-z0-9][a-z0-9-]*$'", [], "models_key_check");
  });

  // A canonical benchmark case; `parameters` holds the default fit settings
  // (Re_tau, log-law window, c_f station, ...) that the derivations read.
  await knex.schema.createTable("cases", (t) => {
    t.text("key").primary();
    t.text("title").notNullable();
    t.text("description").notNullable();
    t.specificType("model_keys", "text[]").notNullable().defaultTo("{}");
    t.jsonb("parameters").notNullable().defaultTo("{}");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("key ~ '^[a-z0-9][a-z0-9-]*$'", [], "cases_key_check");
  });

  // What a quantity is: unit, meaning, and the series it is derived from (null = reported).
  await knex.schema.createTable("quantity_definitions", (t) => {
    t.text("key").primary();
    t.text("label").notNullable();
    t.text("unit").notNullable();
    t.text("meaning").notNullable();
    t.text("derived_from");
    t.check(
      "derived_from is null or derived_from in ('u_plus','k_decay','cf','residual','stresses','gridStudy')",
      [],
      "quantity_definitions_derived_from_check",
    );
  });

  // The tolerance band of a quantity for a case (optionally one model), versioned:
  // a change inserts a new row and closes the old one (superseded_at), so a build
  // stays judged against the version in force when it was evaluated.
  await knex.schema.createTable("bands", (t) => {
    t.bigIncrements("id");
    t.text("case_key").notNullable().references("cases.key").onDelete("CASCADE");
    t.text("quantity_key").notNullable().references("quantity_definitions.key");
    t.text("model_key").references("models.key");
    t.integer("version").notNullable();
    t.text("kind").notNullable();
    t.double("reference");
    t.text("source").notNullable();
    t.double("lower");
    t.double("upper");
    t.double("marginal_margin").notNullable().defaultTo(0);
    t.double("noise_floor").notNullable().defaultTo(0);
    t.jsonb("fit_settings").notNullable().defaultTo("{}");
    t.bigInteger("author_id").references("users.id").onDelete("SET NULL");
    t.text("author_label").notNullable();
    t.text("reason").notNullable();
    t.timestamp("valid_from", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("superseded_at", { useTz: true });
    t.check("kind in ('verification','validation')", [], "bands_kind_check");
    t.check("version >= 1", [], "bands_version_check");
    t.check("lower is null or upper is null or lower <= upper", [], "bands_limits_order_check");
    t.check("marginal_margin >= 0 and noise_floor >= 0", [], "bands_margins_check");
    t.check("length(trim(reason)) > 0 and length(trim(source)) > 0", [], "bands_reason_source_check");
  });
  await knex.raw(
    "create unique index bands_scope_version_uq on bands (case_key, quantity_key, coalesce(model_key, ''), version)",
  );
  await knex.raw(
    "create unique index bands_scope_current_uq on bands (case_key, quantity_key, coalesce(model_key, '')) where superseded_at is null",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("bands");
  await knex.schema.dropTable("quantity_definitions");
  await knex.schema.dropTable("cases");
  await knex.schema.dropTable("models");
}
