import nodemailer from "nodemailer";
import { requireEnv } from "../helpers/env";
import type { GraphQLResponse } from "../helpers/graphql";
import { waitForStoredMail } from "../helpers/mail";

// The alert operations for the role matrix (roles.test.ts): subscriptions are
// every person's own; the mailbox and the outbox are the administrator's.

type Caller = "anonymous" | "ci" | "developer" | "qa" | "release" | "admin";
type Call = (caller: Caller, query: string, variables?: Record<string, unknown>) => Promise<GraphQLResponse>;

const PEOPLE: Caller[] = ["developer", "qa", "release", "admin"];
const SAVE = "mutation($input: AlertSubscriptionInput!) { saveAlertSubscription(input: $input) { id } }";

/** A name the admin can open: the newest stored message, or one sent to the fake for the purpose. */
async function storedMailName(call: Call): Promise<string> {
  const list = async () => ((await call("admin", "{ storedMail(first: 1) { entries { name } } }")).body.data as { storedMail: { entries: { name: string }[] } }).storedMail.entries;
  const existing = await list();
  if (existing.length) return existing[0].name;
  const subject = `role matrix mailbox check ${Date.now()}`;
  await nodemailer.createTransport({ host: "127.0.0.1", port: Number(requireEnv("SMTP_PORT")), secure: false, ignoreTLS: true }).sendMail({ from: "tauline@fenwick-hydro.test", to: "admin@fenwick-hydro.test", subject, text: subject });
  await waitForStoredMail(subject);
  return (await list())[0].name;
}

export function alertOperations(call: Call) {
  return [
    { name: "myAlerts", allowed: PEOPLE, run: (c: Caller) => call(c, "{ myAlerts { releaseManager subscriptions { id } } }") },
    {
      name: "saveAlertSubscription",
      allowed: PEOPLE,
      // The answer is what the matrix judges; a saved subscription is removed again so demo people keep clean settings.
      run: async (c: Caller) => {
        const res = await call(c, SAVE, { input: { caseKey: "backstep", branch: `test/roles-alerts-${c}`, mode: "digest" } });
        const saved = res.body.data as { saveAlertSubscription?: { id: string } } | null | undefined;
        if (saved?.saveAlertSubscription) await call(c, "mutation($id: ID!) { removeAlertSubscription(id: $id) }", { id: saved.saveAlertSubscription.id });
        return res;
      },
    },
    {
      name: "removeAlertSubscription",
      allowed: PEOPLE,
      // A person removes a subscription of their own, made just before; others try an id.
      run: async (c: Caller) => {
        const own = PEOPLE.includes(c) ? ((await call(c, SAVE, { input: { caseKey: "channel-re180", branch: `test/roles-remove-${c}`, mode: "immediate" } })).body.data as { saveAlertSubscription: { id: string } }) : null;
        return call(c, "mutation($id: ID!) { removeAlertSubscription(id: $id) }", { id: own?.saveAlertSubscription.id ?? "1" });
      },
    },
    { name: "storedMail", allowed: ["admin"] as Caller[], run: (c: Caller) => call(c, "{ storedMail(first: 5) { total } }") },
    { name: "storedMailMessage", allowed: ["admin"] as Caller[], run: async (c: Caller) => call(c, "query($name: ID!) { storedMailMessage(name: $name) { subject } }", { name: await storedMailName(call) }) },
    { name: "mailOutbox", allowed: ["admin"] as Caller[], run: (c: Caller) => call(c, "{ mailOutbox(first: 5) { id status } }") },
  ];
}
