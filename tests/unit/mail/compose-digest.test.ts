import { describe, expect, it } from "vitest";
import { composeDigest } from "@/lib/mail/compose-digest";
import { decayAlert } from "./alert-fixture";

const APP = "https://tauline.fenwick-hydro.test";

describe("composeDigest", () => {
  it("collects alerts oldest first with their findings, links and the time each was raised", () => {
    const newer = decayAlert({ build: { ...decayAlert().build, id: 51, version: "4.3.0-dev.41", branch: "release/4.2" } });
    const older = decayAlert();
    const mail = composeDigest({
      entries: [
        { facts: newer, raisedAt: new Date("2026-03-02T10:15:00Z") },
        { facts: older, raisedAt: new Date("2026-03-02T09:05:00Z") },
      ],
      recipientName: "Tomasz Breck",
      appUrl: APP,
    });
    expect(mail.subject).toBe("Tauline digest: 2 alerts on main, release/4.2");
    expect(mail.text.indexOf("4.3.0-dev.40")).toBeLessThan(mail.text.indexOf("4.3.0-dev.41"));
    expect(mail.text).toContain("since 2 Mar 2026, 09:05 UTC");
    expect(mail.text).toContain(`${APP}/builds/51/runs/7`);
    expect(mail.text).toContain("Decay exponent n (decay_exponent) = 1.149");
    expect(mail.html).toContain(`href="${APP}/builds/42"`);
  });

  it("says 'alert' for one", () => {
    const mail = composeDigest({ entries: [{ facts: decayAlert(), raisedAt: new Date("2026-03-02T09:05:00Z") }], recipientName: "Ines", appUrl: APP });
    expect(mail.subject).toBe("Tauline digest: 1 alert on main");
  });
});
