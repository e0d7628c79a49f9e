import type { AlertFacts } from "./alert-facts";
import { buildUrl, countFindings, describeBuild } from "./alert-lines";
import { alertHtmlSections, alertTextSections, type ComposedMail } from "./compose-alert";
import { html, link } from "./html";
import { mailPage } from "./layout";

// The periodic digest: every alert a person chose to read in one batch, oldest
// first, each with the same findings and links the immediate mail would carry.

export interface DigestEntry {
  facts: AlertFacts;
  raisedAt: Date;
}

const stamp = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

function when(d: Date): string {
  return `${stamp.format(d)} UTC`;
}

export function composeDigest({ entries, recipientName, appUrl }: { entries: DigestEntry[]; recipientName: string; appUrl: string }): ComposedMail {
  const sorted = [...entries].sort((a, b) => a.raisedAt.getTime() - b.raisedAt.getTime());
  const branches = [...new Set(sorted.map((e) => e.facts.build.branch))].sort();
  const subject = `Tauline digest: ${sorted.length} ${sorted.length === 1 ? "alert" : "alerts"} on ${branches.join(", ")}`;
  const since = when(sorted[0].raisedAt);

  const text = [
    `${recipientName}, these alerts matched your digest subscriptions since ${since}:`,
    "",
    ...sorted.flatMap((e) => [
      `== ${describeBuild(e.facts)} — ${countFindings(e.facts)}`,
      `   raised ${when(e.raisedAt)}; build page ${buildUrl(appUrl, e.facts.build.id)}`,
      "",
      alertTextSections(e.facts, appUrl),
    ]),
    "--",
    `You receive this digest because of your subscriptions. Change them at ${appUrl}/settings.`,
    "",
  ].join("\n");

  const body = html`<h2 style="margin:4px 0 2px;font-size:17px">${subject.replace(/^Tauline /, "")}</h2>
<p style="margin:0 0 8px">${recipientName}, these alerts matched your digest subscriptions since ${since}.</p>
${sorted.map(
  (e) => html`<div style="margin:18px 0 0;padding-top:10px;border-top:1px solid #e2e0d8">
<h3 style="margin:0;font-size:15px">${describeBuild(e.facts)}</h3>
<p style="margin:2px 0 6px;color:#3b4a58">${countFindings(e.facts)} · raised ${when(e.raisedAt)} · ${link(buildUrl(appUrl, e.facts.build.id), "Open the build")}</p>
${alertHtmlSections(e.facts, appUrl)}</div>`,
)}`;
  const footer = html`You receive this digest because of your subscriptions. ${link(`${appUrl}/settings`, "Change them")}.`;
  return { subject, text, html: mailPage({ title: subject, body, footer }).value };
}
