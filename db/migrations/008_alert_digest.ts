import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // An alert that waits for a person's periodic digest instead of going out at
  // once. The facts are kept as they were when the alert was raised, so the
  // digest tells what the submission said even if the build is re-posted later.
  // outbox_id is set when the digest that carries the item is queued.
  await knex.schema.createTable("alert_digest_items", (t) => {
    t.bigIncrements("id");
    t.bigInteger("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("event_key").notNullable();
    t.bigInteger("build_id").references("builds.id").onDelete("SET NULL");
    t.jsonb("facts").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.bigInteger("outbox_id").references("mail_outbox.id").onDelete("SET NULL");
    t.unique(["user_id", "event_key"]);
  });
  await knex.raw("create index alert_digest_items_pending_idx on alert_digest_items (user_id, id) where outbox_id is null");

  // Recipients who must not see each other (subscribers) are sent as Bcc; the
  // visible To line is `recipients` minus `bcc`.
  await knex.schema.alterTable("mail_outbox", (t) => {
    t.specificType("bcc", "text[]").notNullable().defaultTo("{}");
  });
  await knex.raw("alter table mail_outbox add constraint mail_outbox_bcc_check check (bcc <@ recipients)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("alter table mail_outbox drop constraint mail_outbox_bcc_check");
  await knex.schema.alterTable("mail_outbox", (t) => t.dropColumn("bcc"));
  await knex.schema.dropTable("alert_digest_items");
}
