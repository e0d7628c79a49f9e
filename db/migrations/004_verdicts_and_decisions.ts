import type { Knex } from "knex";

const VERDICTS = "('within','marginal','outside','unbanded','missing')";

export async function up(knex: Knex): Promise<void> {
  // Every judged value of a run: reported or derived, the band version it was judged
  // against, the verdict, and its change against the branch baseline. The build,
  // case, model, grid and branch are copied in so a trend is one index range scan.
  await knex.schema.createTable("quantity_values", (t) => {
    t.bigIncrements("id");
    t.bigInteger("run_id").notNullable().references("runs.id").onDelete("CASCADE");
    t.bigInteger("build_id").notNullable().references("builds.id").onDelete("CASCADE");
    t.text("case_key").notNullable();
    t.text("model_key").notNullable();
    t.text("grid").notNullable();
    t.text("branch").notNullable();
    t.timestamp("build_received_at", { useTz: true }).notNullable();
    t.text("quantity_key").notNullable();
    t.double("value");
    t.text("origin").notNullable();
    t.bigInteger("band_id").references("bands.id");
    t.text("verdict").notNullable();
    t.bigInteger("baseline_build_id").references("builds.id").onDelete("SET NULL");
    t.double("baseline_value");
    t.double("baseline_delta");
    t.boolean("drift").notNullable().defaultTo(false);
    t.text("drift_reason");
    t.double("drift_p_value");
    t.double("drift_slope");
    t.jsonb("details").notNullable().defaultTo("{}");
    t.unique(["run_id", "quantity_key"]);
    t.check("origin in ('reported','derived','expected')", [], "quantity_values_origin_check");
    t.check(`verdict in ${VERDICTS}`, [], "quantity_values_verdict_check");
    t.check("drift_reason is null or drift_reason in ('baseline','trend')", [], "quantity_values_drift_check");
    t.check("length(quantity_key) between 1 and 64", [], "quantity_values_key_check");
  });
  await knex.raw(
    "create index quantity_values_trend_idx on quantity_values (case_key, quantity_key, model_key, branch, grid, build_received_at desc, build_id desc)",
  );
  await knex.raw("create index quantity_values_build_idx on quantity_values (build_id)");

  // A release decision on a build; the newest row is the build's gate state.
  await knex.schema.createTable("gate_decisions", (t) => {
    t.bigIncrements("id");
    t.bigInteger("build_id").notNullable().references("builds.id").onDelete("CASCADE");
    t.text("state").notNullable();
    t.text("comment").notNullable();
    t.bigInteger("decided_by").notNullable().references("users.id");
    t.timestamp("decided_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("state in ('approved','held','rejected')", [], "gate_decisions_state_check");
    t.check("length(trim(comment)) > 0", [], "gate_decisions_comment_check");
  });
  await knex.raw("create index gate_decisions_build_idx on gate_decisions (build_id, decided_at desc, id desc)");

  // Lets a named quantity of a case through until a date, for a stated reason.
  await knex.schema.createTable("waivers", (t) => {
    t.bigIncrements("id");
    t.text("case_key").notNullable().references("cases.key");
    t.text("quantity_key").notNullable();
    t.text("model_key").references("models.key");
    t.text("branch");
    t.text("reason").notNullable();
    t.bigInteger("granted_by").notNullable().references("users.id");
    t.timestamp("granted_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("revoked_at", { useTz: true });
    t.check("length(trim(reason)) > 0", [], "waivers_reason_check");
    t.check("expires_at > granted_at", [], "waivers_expiry_check");
  });

  // Who did what, when: every change of bands, gates, waivers, users, tokens, and each submission.
  await knex.schema.createTable("audit_log", (t) => {
    t.bigIncrements("id");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.bigInteger("actor_user_id").references("users.id").onDelete("SET NULL");
    t.text("actor_label").notNullable();
    t.text("action").notNullable();
    t.text("entity").notNullable();
    t.text("entity_id");
    t.jsonb("details").notNullable().defaultTo("{}");
  });
  await knex.raw("create index audit_log_entity_idx on audit_log (entity, entity_id, at desc)");

  // Mail waiting to go out; event_key makes one event produce one message at most.
  await knex.schema.createTable("mail_outbox", (t) => {
    t.bigIncrements("id");
    t.text("event_key").notNullable().unique();
    t.specificType("recipients", "text[]").notNullable();
    t.text("subject").notNullable();
    t.text("text_body").notNullable();
    t.text("html_body").notNullable();
    t.text("status").notNullable().defaultTo("queued");
    t.integer("attempts").notNullable().defaultTo(0);
    t.text("last_error");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("next_attempt_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("sent_at", { useTz: true });
    t.check("status in ('queued','sending','sent','failed')", [], "mail_outbox_status_check");
    t.check("cardinality(recipients) > 0", [], "mail_outbox_recipients_check");
  });
  await knex.raw("create index mail_outbox_due_idx on mail_outbox (next_attempt_at) where status in ('queued','failed')");
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["mail_outbox", "audit_log", "waivers", "gate_decisions", "quantity_values"]) {
    await knex.schema.dropTable(table);
  }
}
