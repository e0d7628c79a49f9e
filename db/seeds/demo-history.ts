import "server-only";
import type { Knex } from "knex";
import { buildDemoHistory } from "@/fixtures/scenarios/cormorant";
import { getUserByEmail } from "@/db/queries/identities";
import { insertGateDecision } from "@/db/queries/gate";
import { insertAuditEntry } from "@/db/queries/audit";
import { submitResults } from "@/lib/services/ingest";

/**
 * Posts the invented Cormorant history through the same ingest path CI uses
 * (verdicts are computed, not inserted), shifted in time so that the newest
 * build arrived an hour ago, and records the release manager's past decisions.
 */
export async function seedDemoHistory({ db, now = new Date() }: { db: Knex; now?: Date }): Promise<number> {
  const [{ count }] = await db("builds").count<{ count: number }[]>({ count: "*" });
  if (Number(count) > 0) return 0;
  const history = buildDemoHistory();
  const newest = Math.max(...history.map((b) => Date.parse(b.receivedAt)));
  const shift = now.getTime() - 3600_000 - newest;
  const at = (iso: string) => new Date(Date.parse(iso) + shift);

  for (const item of history) {
    const { buildId } = await submitResults({
      actor: { kind: "system", label: "demo seed" },
      unsafeInput: item.submission,
      receivedAt: at(item.receivedAt),
    });
    if (item.decision) {
      const user = await getUserByEmail({ db, email: item.decision.by });
      if (!user) throw new Error(`demo decision by unknown user ${item.decision.by}`);
      const decidedAt = at(item.decision.at);
      await insertGateDecision({ db, buildId, state: item.decision.state, comment: item.decision.comment, userId: user.id, decidedAt });
      await insertAuditEntry({
        db,
        entry: { actorUserId: user.id, actorLabel: user.email, action: `gate.${item.decision.state}`, entity: "build", entityId: buildId, details: { comment: item.decision.comment }, at: decidedAt },
      });
    }
  }
  return history.length;
}

/** When the demo history starts (after shifting), so version-1 bands can be in force before it. */
export function demoHistoryStart(now = new Date()): Date {
  const history = buildDemoHistory();
  const times = history.map((b) => Date.parse(b.receivedAt));
  return new Date(Math.min(...times) + (now.getTime() - 3600_000 - Math.max(...times)) - 86_400_000);
}
