import { afterAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { insertOutboxMessage } from "@/db/queries/outbox";
import { deliverOutboxMessage } from "@/lib/jobs/deliver";
import { randomCommit } from "../helpers/graphql";
import { findStoredMail, waitForStoredMail } from "../helpers/mail";

// The outbox claim, run here in the test process as a second "app instance"
// beside the server's own worker: many senders racing for one row send it once.

afterAll(closeDb);

describe("outbox delivery", () => {
  it("sends a row once when eight senders try it at the same time", async () => {
    const eventKey = `notice:race:${randomCommit().slice(0, 12)}`; // short: long header lines are folded
    const { id } = await insertOutboxMessage({
      db: getDb(),
      message: { eventKey, kind: "notice", recipients: ["release@fenwick-hydro.test"], subject: `delivery race ${eventKey}`, text: "one of eight", html: "<p>one of eight</p>" },
    });
    expect(id).not.toBeNull();
    const outcomes = await Promise.all(Array.from({ length: 8 }, () => deliverOutboxMessage({ outboxId: id! })));
    expect(outcomes.filter((o) => o === "sent")).toHaveLength(1);
    expect(outcomes.filter((o) => o === "not-claimable")).toHaveLength(7);

    await waitForStoredMail(`X-Tauline-Event: ${eventKey}`);
    await new Promise((r) => setTimeout(r, 1500));
    expect(await findStoredMail(`X-Tauline-Event: ${eventKey}`)).toHaveLength(1);
    const row = await getDb()("mail_outbox").where({ id }).first();
    expect(row).toMatchObject({ status: "sent", attempts: 1, last_error: null });
    // A later try of the same row (a late job, a sweep) finds it sent and does nothing.
    expect(await deliverOutboxMessage({ outboxId: id! })).toBe("not-claimable");
  });

  it("queues one message per event key: the second insert of the same event is ignored", async () => {
    const eventKey = `notice:dedupe:${randomCommit()}`;
    const message = { eventKey, kind: "notice" as const, recipients: ["qa@fenwick-hydro.test"], subject: "dedupe", text: "x", html: "<p>x</p>" };
    const first = await insertOutboxMessage({ db: getDb(), message });
    const second = await insertOutboxMessage({ db: getDb(), message });
    expect(first.id).not.toBeNull();
    expect(second.id).toBeNull();
    await getDb()("mail_outbox").where({ event_key: eventKey }).delete();
  });
});
