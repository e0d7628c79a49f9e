import type { OutboxRow } from "@/db/queries/outbox";
import type { SubscriptionRow } from "@/db/queries/subscriptions";
import { getMailboxMessage, listMailbox, listMailOutbox } from "@/lib/services/mailbox";
import { listMySubscriptions, removeMySubscription, saveMySubscription } from "@/lib/services/subscriptions";
import type { GraphQLContext } from "../context";

type Ctx = GraphQLContext;

function toSubscription(r: SubscriptionRow) {
  return { id: String(r.id), caseKey: r.case_key, caseTitle: r.case_title, branch: r.branch, mode: r.mode, createdAt: r.created_at };
}

function toOutboxMessage(r: OutboxRow) {
  return {
    id: String(r.id),
    eventKey: r.event_key,
    kind: r.kind,
    recipients: r.recipients,
    bcc: r.bcc,
    subject: r.subject,
    status: r.status,
    attempts: r.attempts,
    lastError: r.last_error,
    createdAt: r.created_at,
    nextAttemptAt: r.next_attempt_at,
    sentAt: r.sent_at,
    buildId: r.build_id === null ? null : String(r.build_id),
  };
}

export const alertsResolvers = {
  Query: {
    async myAlerts(_: unknown, __: unknown, ctx: Ctx) {
      const mine = await listMySubscriptions({ actor: ctx.actor });
      return { releaseManager: mine.releaseManager, subscriptions: mine.subscriptions.map(toSubscription) };
    },
    storedMail: (_: unknown, args: { first: number; offset: number }, ctx: Ctx) => listMailbox({ actor: ctx.actor, first: args.first, offset: args.offset }),
    storedMailMessage: (_: unknown, args: { name: string }, ctx: Ctx) => getMailboxMessage({ actor: ctx.actor, name: args.name }),
    async mailOutbox(_: unknown, args: { first: number; unsentOnly: boolean }, ctx: Ctx) {
      return (await listMailOutbox({ actor: ctx.actor, first: args.first, unsentOnly: args.unsentOnly })).map(toOutboxMessage);
    },
  },
  Mutation: {
    async saveAlertSubscription(_: unknown, args: { input: unknown }, ctx: Ctx) {
      return toSubscription(await saveMySubscription({ actor: ctx.actor, unsafeInput: args.input }));
    },
    async removeAlertSubscription(_: unknown, args: { id: string }, ctx: Ctx) {
      return String(await removeMySubscription({ actor: ctx.actor, unsafeId: args.id }));
    },
  },
};
