import { simpleParser } from "mailparser";
import nodemailer from "nodemailer";
import { describe, expect, it } from "vitest";
import { composeAlert } from "@/lib/mail/compose-alert";
import { decayAlert, N_CHANGED, N_STANDARD } from "./alert-fixture";

const APP = "https://tauline.fenwick-hydro.test";

describe("composeAlert", () => {
  it("names the build, the quantity, its value, how far it is outside, the limits and the run link", () => {
    const mail = composeAlert(decayAlert(), APP);
    expect(mail.subject).toBe("Tauline: Cormorant 4.3.0-dev.40 (0123456789) on main — 1 band exit");
    // n = 1/0.87 = 1.1494 to four significant figures (reference sheet §2.2).
    expect(N_CHANGED.toPrecision(4)).toBe("1.149");
    expect(mail.text).toContain("Decay exponent n (decay_exponent) = 1.149");
    // 1.1494 − 1.098 = 0.0514 above the upper limit, three significant figures.
    expect(mail.text).toContain(`${(N_CHANGED - 1.098).toPrecision(3)} above the upper limit`);
    expect(mail.text).toContain("accepted 1.076 – 1.098 (reference 1.087; verification band v1)");
    expect(Math.abs(N_STANDARD - 1.087)).toBeLessThan(5e-4); // the band's reference is 1/(1.92 − 1) rounded
    expect(mail.text).toContain("commit 0123456789abcdef0123456789abcdef01234567, branch main");
    expect(mail.text).toContain(`Run: ${APP}/builds/42/runs/7`);
    expect(mail.html).toContain(`href="${APP}/builds/42/runs/7"`);
  });

  it("writes a one-sided band as ≥ or ≤ and a value below the lower limit as such, with its unit", () => {
    const e = decayAlert().exits[0];
    const drop = { ...e, caseKey: "channel-re180", quantity: "residual_drop_orders", label: "Residual drop", unit: "orders of magnitude", value: 3.2, lower: 5, upper: null, reference: null };
    const mail = composeAlert(decayAlert({ exits: [drop] }), APP);
    expect(mail.text).toContain("Residual drop (residual_drop_orders) = 3.2 orders of magnitude, 1.8 orders of magnitude below the lower limit; accepted ≥ 5 orders of magnitude (verification band v1)");
  });

  it("states a baseline drift with its change in percent and a trend with Theil–Sen slope and Mann–Kendall p", () => {
    const common = { runId: 3, caseKey: "flat-plate-zpg", model: "sst", grid: "default", quantity: "cf_at_x", label: "Skin friction c_f at the station", unit: "1", verdict: "within" };
    const mail = composeAlert(
      decayAlert({
        exits: [],
        drifts: [
          { ...common, value: 0.0029, reason: "baseline", baselineValue: 0.003, baselineDelta: -0.0001, noiseFloor: 0.00005, pValue: null, slopePerBuild: null },
          { ...common, runId: 4, value: 0.00295, reason: "trend", baselineValue: null, baselineDelta: null, noiseFloor: 0.00005, pValue: 0.0008366, slopePerBuild: -0.0000125 },
        ],
      }),
      APP,
    );
    expect(mail.subject).toContain("— 2 drifts");
    // −0.0001 / 0.003 = −3.33 %.
    expect(mail.text).toContain("changed by −1.00×10⁻⁴ (−3.33 %) against the baseline 0.003; noise floor 5.00×10⁻⁵");
    expect(mail.text).toContain("still within its band");
    expect(mail.text).toContain("monotone trend over the last 8 builds, Theil–Sen slope −1.25×10⁻⁵ per build, Mann–Kendall p = 8.4×10⁻⁴");
  });

  it("reports a run that did not complete with its iteration count", () => {
    const mail = composeAlert(decayAlert({ exits: [], incompleteRuns: [{ runId: 9, caseKey: "backstep", model: "sa", grid: "fine", status: "DIVERGED", iterations: 812 }] }), APP);
    expect(mail.subject).toContain("1 run not completed");
    expect(mail.text).toContain("- backstep · sa · grid fine: diverged after 812 iterations");
  });

  it("escapes markup that arrives in CI-supplied names instead of passing it into the HTML", async () => {
    const f = decayAlert({ build: { ...decayAlert().build, version: `4.3<script>alert("x")</script>`, solver: `Cor"mor'ant` } });
    const mail = composeAlert(f, APP);
    expect(mail.html).not.toContain("<script>");
    expect(mail.html).toContain("4.3&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;");
    expect(mail.html).toContain("Cor&quot;mor&#39;ant");
    // The plain-text part keeps the name as it is: text is not HTML.
    expect(mail.text).toContain(`4.3<script>alert("x")</script>`);
    // And the whole message survives a real MIME round trip (nodemailer → mailparser).
    const raw = await nodemailer.createTransport({ streamTransport: true, buffer: true }).sendMail({ from: "a@fenwick-hydro.test", to: "b@fenwick-hydro.test", ...mail });
    const parsed = await simpleParser(raw.message as Buffer);
    expect(parsed.subject).toBe(mail.subject);
    expect(parsed.text?.trim()).toBe(mail.text.trim());
    expect(parsed.html).toContain("4.3&lt;script&gt;");
  });
});
