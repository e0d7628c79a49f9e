import "server-only";
import type { Db } from "../index";

// What each person wants to hear about (migration 005): a case or every case,
// a branch or every branch, at once or in the periodic digest.

export type SubscriptionMode = "immediate" | "digest";

export interface SubscriptionRow {
  id: number;
  user_id: number;
  case_key: string | null;
  case_title: string | null;
  branch: string | null;
  mode: SubscriptionMode;
  created_at: Date;
}

export async function listSubscriptionsOfUser({ db, userId }: { db: Db; userId: number }): Promise<SubscriptionRow[]> {
  return db("subscriptions as s")
    .leftJoin("cases as c", "c.key", "s.case_key")
    .where("s.user_id", userId)
    .orderByRaw("s.case_key nulls first, s.branch nulls first, s.id")
    .select("s.id", "s.user_id", "s.case_key", "c.title as case_title", "s.branch", "s.mode", "s.created_at");
}

/** Adds a scope, or changes the mode of the same scope (one row per person, case and branch). */
export async function upsertSubscription({
  db,
  userId,
  caseKey,
  branch,
  mode,
}: {
  db: Db;
  userId: number;
  caseKey: string | null;
  branch: string | null;
  mode: SubscriptionMode;
}): Promise<{ id: number; inserted: boolean }> {
  const result = await db.raw(
    `insert into subscriptions (user_id, case_key, branch, mode) values (?, ?, ?, ?)
     on conflict (user_id, coalesce(case_key, ''), coalesce(branch, '')) do update set mode = excluded.mode
     returning id, (xmax = 0) as inserted`,
    [userId, caseKey, branch, mode],
  );
  return result.rows[0];
}

/** Deletes one of the person's own subscriptions; 0 when it is not theirs or gone. */
export async function deleteSubscription({ db, id, userId }: { db: Db; id: number; userId: number }): Promise<number> {
  return db("subscriptions").where({ id, user_id: userId }).delete();
}

export interface AlertRecipientRow {
  user_id: number;
  email: string;
  release_manager: boolean;
  immediate: boolean;
  digest: boolean;
}

/**
 * Who hears of an alert on `branch` touching `caseKeys`: every active release
 * manager, and every active person with a subscription whose case and branch
 * match (null = every case / every branch), with the modes they chose.
 */
export async function findAlertRecipients({ db, branch, caseKeys }: { db: Db; branch: string; caseKeys: string[] }): Promise<AlertRecipientRow[]> {
  const result = await db.raw(
    `select u.id as user_id, u.email,
            u.role = 'release' as release_manager,
            coalesce(bool_or(s.mode = 'immediate'), false) as immediate,
            coalesce(bool_or(s.mode = 'digest'), false) as digest
       from users u
       left join subscriptions s on s.user_id = u.id
        and (s.branch is null or s.branch = ?)
        and (s.case_key is null or s.case_key = any(?::text[]))
      where u.active and u.deactivated_at is null
      group by u.id
     having u.role = 'release' or count(s.id) > 0
      order by u.id`,
    [branch, caseKeys],
  );
  return result.rows;
}
