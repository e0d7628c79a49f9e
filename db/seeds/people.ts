import "server-only";
import { createHash } from "node:crypto";
import bcrypt from "bcryptjs";
import type { Knex } from "knex";

// bcrypt cost: 2^11 rounds, about 0.1 s per check here; above the common minimum of 10.
export const BCRYPT_COST = 11;

export const DEMO_USERS = [
  { email: "developer@fenwick-hydro.test", name: "Ines Varga", role: "developer" },
  { email: "qa@fenwick-hydro.test", name: "Tomasz Breck", role: "qa" },
  { email: "release@fenwick-hydro.test", name: "Maren Olwe", role: "release" },
  { email: "admin@fenwick-hydro.test", name: "Priya Castellane", role: "admin" },
] as const;

export function hashCiToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** One demo user per role (only when there are no users) and the demo CI token (when its hash is new). */
export async function seedPeople({ db, password, ciToken }: { db: Knex; password: string; ciToken: string }) {
  const [{ count }] = await db("users").count<{ count: number }[]>({ count: "*" });
  let usersCreated = false;
  if (Number(count) === 0) {
    const hash = await bcrypt.hash(password, BCRYPT_COST);
    await db("users").insert(DEMO_USERS.map((u) => ({ ...u, password_hash: hash })));
    usersCreated = true;
  }
  const inserted = await db("ci_tokens")
    .insert({ name: "Cormorant CI (demo)", token_hash: hashCiToken(ciToken) })
    .onConflict("token_hash")
    .ignore()
    .returning("id");
  return { usersCreated, tokenCreated: inserted.length > 0 };
}
