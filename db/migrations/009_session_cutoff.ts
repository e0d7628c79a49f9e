import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  // Sessions are JWTs that live for hours. A session signed in before this
  // instant is refused: set when an account is switched off (so switching it
  // back on does not revive old cookies) and when a password is set through a
  // link (so a reset ends sessions opened with the old password).
  await knex.schema.alterTable("users", (t) => {
    t.timestamp("sessions_valid_from", { useTz: true });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => t.dropColumn("sessions_valid_from"));
}
