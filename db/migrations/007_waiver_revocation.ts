import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // A waiver can be withdrawn before it expires; who withdrew it and why stay on
  // the row (the audit log has them too) so the gate page can say it at a glance.
  await knex.schema.alterTable("waivers", (t) => {
    t.bigInteger("revoked_by").references("users.id").onDelete("SET NULL");
    t.text("revoke_reason");
    // A waiver names a quantity the library knows, like a band does.
    t.foreign("quantity_key").references("quantity_definitions.key");
    t.check(
      "(revoked_at is null and revoke_reason is null) or (revoked_at is not null and length(trim(revoke_reason)) > 0)",
      [],
      "waivers_revocation_check",
    );
  });
  // The gate looks waivers up by case and quantity among those not withdrawn.
  await knex.raw("create index waivers_scope_idx on waivers (case_key, quantity_key, expires_at) where revoked_at is null");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists waivers_scope_idx");
  await knex.schema.alterTable("waivers", (t) => {
    t.dropChecks(["waivers_revocation_check"]);
    t.dropForeign(["quantity_key"]);
    t.dropColumn("revoke_reason");
    t.dropColumn("revoked_by");
  });
}
