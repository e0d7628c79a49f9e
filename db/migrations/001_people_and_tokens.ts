import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // A person who signs in. One role each; `admin` implies every other role.
  await knex.schema.createTable("users", (t) => {
    t.bigIncrements("id");
    t.text("email").notNullable();
    t.text("name").notNullable();
    t.text("role").notNullable();
    t.text("password_hash").notNullable();
    t.boolean("active").notNullable().defaultTo(true);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("role in ('developer','qa','release','admin')", [], "users_role_check");
    t.check("email = lower(email)", [], "users_email_lower_check");
    t.unique(["email"]);
  });

  // A bearer token a CI pipeline uses. Only a SHA-256 of the secret is stored.
  await knex.schema.createTable("ci_tokens", (t) => {
    t.bigIncrements("id");
    t.text("name").notNullable();
    t.text("token_hash").notNullable().unique();
    t.bigInteger("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true });
    t.timestamp("revoked_at", { useTz: true });
    t.timestamp("last_used_at", { useTz: true });
    t.check("length(token_hash) = 64", [], "ci_tokens_hash_check");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("ci_tokens");
  await knex.schema.dropTable("users");
}
