import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../helpers/db";
import { requireEnv } from "../helpers/env";
import { SUBMIT, ciToken, postGraphQL, randomCommit } from "../helpers/graphql";
import { runDigestJobNow } from "../helpers/jobs";
import { addressesOf, envelopeOf, findStoredMail, waitForStoredMail } from "../helpers/mail";
import { signIn } from "../helpers/session";
import { startSmtpFake, stopSmtpFake } from "../helpers/smtp-fake";

// Alert mail end to end: real HTTP submissions, the app's outbox and pg-boss
// workers, real SMTP to the local fake, messages read back from MAIL_DIR.
// Everything happens on a branch of this run's own, so subscriptions and
// mail of other tests do not meet ours.

const BRANCH = `test/alerts-${randomCommit().slice(0, 8)}`;
const DOMAIN = "fenwick-hydro.test";
const cookies: Record<string, string> = {};
const subscriptionIds: { role: string; id: string }[] = [];

/** k = k0 [1 + (Cε2 − 1) ε0 t / k0]^(−1/(Cε2 − 1)): k–ε decay of isotropic turbulence (reference sheet §2.2). */
function decaySeries(cEps2: number) {
  const t = Array.from({ length: 60 }, (_, i) => i * 0.5);
  return { key: "k_decay", x: t, y: t.map((ti) => 1.5 * Math.pow(1 + ((cEps2 - 1) * 0.9 * ti) / 1.5, -1 / (cEps2 - 1))) };
}

// Cε2 = 1.87 instead of Launder & Spalding's 1.92 (sheet §3.1): n = 1/0.87 = 1.149, outside the k–ε band 1.076 – 1.098.
const DECAY_RUN = { case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", series: [decaySeries(1.87)] };
const DIVERGED_RUN = { case: "backstep", model: "sa", status: "DIVERGED", iterations: 812 };

type Receipt = { submitResults: { build: { id: string; verdict: string }; runs: { id: string; case: string }[] } };

async function submit(commit: string, runs: unknown[], version = "9.9.0-alerts") {
  const res = await postGraphQL<Receipt>({ query: SUBMIT, token: ciToken(), variables: { input: { build: { solver: "Cormorant", version, commit, branch: BRANCH }, runs } } });
  expect(res.body.errors).toBeUndefined();
  return res.body.data!.submitResults;
}

const SAVE = "mutation($input: AlertSubscriptionInput!) { saveAlertSubscription(input: $input) { id caseKey branch mode } }";
const REMOVE = "mutation($id: ID!) { removeAlertSubscription(id: $id) }";

async function subscribe(role: string, input: { caseKey: string | null; branch: string | null; mode: string }) {
  const res = await postGraphQL<{ saveAlertSubscription: { id: string } }>({ query: SAVE, variables: { input }, cookie: cookies[role] });
  expect(res.body.errors).toBeUndefined();
  subscriptionIds.push({ role, id: res.body.data!.saveAlertSubscription.id });
  return res.body.data!.saveAlertSubscription.id;
}

const marker = (buildId: string) => `X-Tauline-Event: alert:build:${buildId}:`;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

beforeAll(async () => {
  for (const role of ["developer", "qa", "release", "admin"]) cookies[role] = await signIn(`${role}@${DOMAIN}`);
  await subscribe("developer", { caseKey: "decaying-hit", branch: BRANCH, mode: "immediate" });
  await subscribe("qa", { caseKey: null, branch: BRANCH, mode: "digest" });
  // On another case: not mailed while the alert touches only the decay case.
  await subscribe("admin", { caseKey: "backstep", branch: BRANCH, mode: "immediate" });
});

afterAll(async () => {
  for (const s of subscriptionIds) await postGraphQL({ query: REMOVE, variables: { id: s.id }, cookie: cookies[s.role] });
  await closeTestDb();
});

describe.sequential("alert mail", () => {
  const commit = randomCommit();
  let buildId = "";

  it("mails ONE message to the release manager (To) and the case's immediate subscriber (Bcc) when a quantity leaves its band", async () => {
    const receipt = await submit(commit, [DECAY_RUN], "9.9.0-alerts <i>rc</i>");
    buildId = receipt.build.id;
    expect(receipt.build.verdict).toBe("outside");
    const runId = receipt.runs[0].id;

    const [{ mail }] = await waitForStoredMail(marker(buildId));
    await sleep(2000);
    expect(await findStoredMail(marker(buildId))).toHaveLength(1);

    expect(addressesOf(mail.to)).toContain(`release@${DOMAIN}`);
    expect(addressesOf(mail.to)).not.toContain(`developer@${DOMAIN}`);
    const envelope = envelopeOf(mail);
    expect(envelope).toEqual(expect.arrayContaining([`release@${DOMAIN}`, `developer@${DOMAIN}`]));
    expect(envelope).not.toContain(`qa@${DOMAIN}`); // digest subscriber
    expect(envelope).not.toContain(`admin@${DOMAIN}`); // subscribed to another case
    expect(mail.subject).toBe(`Tauline: Cormorant 9.9.0-alerts <i>rc</i> (${commit.slice(0, 10)}) on ${BRANCH} — 1 band exit`);
    expect(mail.text).toContain(`commit ${commit}, branch ${BRANCH}`);
    expect(mail.text).toContain("Decay exponent n (decay_exponent) = 1.149");
    expect(mail.text).toContain("accepted 1.076 – 1.098");
    expect(mail.text).toContain(`Run: ${requireEnv("TAULINE_TEST_URL")}/builds/${buildId}/runs/${runId}`);
    expect(mail.html).toContain("9.9.0-alerts &lt;i&gt;rc&lt;/i&gt;");
    expect(mail.html).not.toContain("<i>rc</i>");

    const rows = await testDb()("mail_outbox").where({ build_id: buildId });
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "sent", kind: "alert", bcc: [`developer@${DOMAIN}`] });
  });

  it("does not mail again when the same build is re-posted with the same findings", async () => {
    await submit(commit, [DECAY_RUN], "9.9.0-alerts <i>rc</i>");
    await sleep(4000);
    expect(await findStoredMail(marker(buildId))).toHaveLength(1);
    expect(await testDb()("mail_outbox").where({ build_id: buildId })).toHaveLength(1);
  });

  it("mails again when a re-post adds a finding, now to the subscriber of the newly touched case as well", async () => {
    await submit(commit, [DECAY_RUN, DIVERGED_RUN], "9.9.0-alerts <i>rc</i>");
    const found = await waitForStoredMail(marker(buildId), { count: 2 });
    const second = found.find((m) => /run not completed/.test(m.mail.subject ?? ""))!;
    expect(second.mail.text).toContain("backstep · sa · grid default: diverged after 812 iterations");
    expect(envelopeOf(second.mail)).toEqual(expect.arrayContaining([`release@${DOMAIN}`, `developer@${DOMAIN}`, `admin@${DOMAIN}`]));
  });

  it("collects the alerts of a digest subscriber and mails them in one digest when the digest job runs", async () => {
    const qa = await testDb()("users").where({ email: `qa@${DOMAIN}` }).first("id");
    const items = await testDb()("alert_digest_items").where({ user_id: qa.id, build_id: buildId });
    expect(items).toHaveLength(2); // the first event and the re-post that added the diverged run
    await runDigestJobNow();
    const digests = await waitForStoredMail(commit.slice(0, 10), { where: (m) => m.mail.subject?.startsWith("Tauline digest") ?? false });
    expect(digests).toHaveLength(1);
    expect(envelopeOf(digests[0].mail)).toEqual([`qa@${DOMAIN}`]);
    expect(digests[0].mail.text).toContain("Decay exponent n (decay_exponent) = 1.149");
    const after = await testDb()("alert_digest_items").where({ user_id: qa.id, build_id: buildId }).whereNull("outbox_id");
    expect(after).toHaveLength(0);
  });

  it("keeps a message while SMTP is down, retries, and delivers it exactly once when SMTP is back", async () => {
    const downCommit = randomCommit();
    let id = "";
    await stopSmtpFake();
    try {
      id = (await submit(downCommit, [DECAY_RUN])).build.id;
      const deadline = Date.now() + 30_000;
      let row = await testDb()("mail_outbox").where({ build_id: id }).first();
      while (!(row?.status === "failed" && row.attempts >= 1) && Date.now() < deadline) {
        await sleep(200);
        row = await testDb()("mail_outbox").where({ build_id: id }).first();
      }
      expect(row).toMatchObject({ status: "failed" });
      expect(row.last_error).toMatch(/ECONNREFUSED|connect/i);
      expect(await findStoredMail(marker(id))).toHaveLength(0);
    } finally {
      await startSmtpFake();
    }
    await waitForStoredMail(marker(id), { timeoutMs: 60_000 });
    await sleep(5000);
    expect(await findStoredMail(marker(id))).toHaveLength(1);
    const row = await testDb()("mail_outbox").where({ build_id: id }).first();
    expect(row.status).toBe("sent");
    expect(row.attempts).toBeGreaterThanOrEqual(2);
  });
});

describe("alert subscriptions", () => {
  const MINE = "{ myAlerts { releaseManager subscriptions { id caseKey branch mode } } }";
  const scope = { caseKey: "channel-re180", branch: `${BRANCH}-crud` };

  it("adds, changes the delivery of the same scope in place, lists, and removes a person's own subscription", async () => {
    const first = await postGraphQL<{ saveAlertSubscription: { id: string; mode: string } }>({ query: SAVE, variables: { input: { ...scope, mode: "immediate" } }, cookie: cookies.developer });
    const id = first.body.data!.saveAlertSubscription.id;
    const changed = await postGraphQL<{ saveAlertSubscription: { id: string; mode: string } }>({ query: SAVE, variables: { input: { ...scope, mode: "digest" } }, cookie: cookies.developer });
    expect(changed.body.data!.saveAlertSubscription).toMatchObject({ id, mode: "digest" });

    const mine = await postGraphQL<{ myAlerts: { releaseManager: boolean; subscriptions: { id: string; mode: string }[] } }>({ query: MINE, cookie: cookies.developer });
    expect(mine.body.data!.myAlerts.releaseManager).toBe(false);
    expect(mine.body.data!.myAlerts.subscriptions.filter((s) => s.id === id)).toEqual([{ id, ...scope, mode: "digest" }]);
    const theirs = await postGraphQL<{ myAlerts: { releaseManager: boolean; subscriptions: { id: string }[] } }>({ query: MINE, cookie: cookies.release });
    expect(theirs.body.data!.myAlerts.releaseManager).toBe(true);
    expect(theirs.body.data!.myAlerts.subscriptions.map((s) => s.id)).not.toContain(id);

    // Someone else's id reads as absent and stays.
    const foreign = await postGraphQL({ query: REMOVE, variables: { id }, cookie: cookies.qa });
    expect(foreign.body.errors?.[0]?.extensions?.code).toBe("NOT_FOUND");
    expect(await testDb()("subscriptions").where({ id })).toHaveLength(1);

    const removed = await postGraphQL<{ removeAlertSubscription: string }>({ query: REMOVE, variables: { id }, cookie: cookies.developer });
    expect(removed.body.data!.removeAlertSubscription).toBe(id);
    const again = await postGraphQL({ query: REMOVE, variables: { id }, cookie: cookies.developer });
    expect(again.body.errors?.[0]?.extensions?.code).toBe("NOT_FOUND");

    const audit = await testDb()("audit_log").where({ entity: "subscription", entity_id: id }).orderBy("id").pluck("action");
    expect(audit).toEqual(["subscription.added", "subscription.changed", "subscription.removed"]);
  });

  it("names the field of a bad subscription: unknown case, branch with spaces", async () => {
    const unknown = await postGraphQL({ query: SAVE, variables: { input: { caseKey: "no-such-case", branch: null, mode: "immediate" } }, cookie: cookies.developer });
    expect(unknown.body.errors?.[0]?.extensions?.code).toBe("BAD_USER_INPUT");
    expect(unknown.body.errors?.[0]?.extensions?.issues?.map((i) => i.path)).toEqual(["input.caseKey"]);
    const spaced = await postGraphQL({ query: SAVE, variables: { input: { caseKey: null, branch: "main branch", mode: "immediate" } }, cookie: cookies.developer });
    expect(spaced.body.errors?.[0]?.extensions?.issues?.map((i) => i.path)).toEqual(["input.branch"]);
  });

  it("refuses a CI token: subscriptions belong to people", async () => {
    const res = await postGraphQL({ query: MINE, token: ciToken() });
    expect(res.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
  });
});

describe("admin mailbox", () => {
  const LIST = "{ storedMail(first: 200) { total entries { name subject envelopeTo } } }";
  const OPEN = "query($name: ID!) { storedMailMessage(name: $name) { name subject eventKey text html envelopeTo } }";

  it("refuses every role but admin, on the server", async () => {
    for (const role of ["developer", "qa", "release"]) {
      for (const query of [LIST, "{ mailOutbox { id } }"]) {
        const res = await postGraphQL({ query, cookie: cookies[role] });
        expect(res.status, `${role}: ${query}`).toBe(403);
        expect(res.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
      }
      const one = await postGraphQL({ query: OPEN, variables: { name: "any.eml" }, cookie: cookies[role] });
      expect(one.body.errors?.[0]?.extensions?.code).toBe("FORBIDDEN");
    }
  });

  it("lets the admin list the stored alert and open it with its text and HTML parts", async () => {
    const list = await postGraphQL<{ storedMail: { entries: { name: string; subject: string; envelopeTo: string[] }[] } }>({ query: LIST, cookie: cookies.admin });
    expect(list.body.errors).toBeUndefined();
    const entry = list.body.data!.storedMail.entries.find((e) => e.subject.includes(`on ${BRANCH} — 1 band exit`));
    expect(entry, "the alert of this run is listed").toBeDefined();
    const open = await postGraphQL<{ storedMailMessage: { eventKey: string; text: string; html: string } }>({ query: OPEN, variables: { name: entry!.name }, cookie: cookies.admin });
    expect(open.body.data!.storedMailMessage.eventKey).toMatch(/^alert:build:\d+:[0-9a-f]{20}$/);
    expect(open.body.data!.storedMailMessage.text).toContain("Decay exponent n");
    expect(open.body.data!.storedMailMessage.html).toContain("<!doctype html>");
  });

  it("answers not found for a name outside the mail folder", async () => {
    const res = await postGraphQL({ query: OPEN, variables: { name: "../../secret.eml" }, cookie: cookies.admin });
    expect(res.body.errors?.[0]?.extensions?.code).toBe("NOT_FOUND");
  });
});
