import type { AlertFacts } from "./alert-facts";
import {
  alertSubject,
  buildUrl,
  countFindings,
  describeBuild,
  describeDrift,
  describeExit,
  describeIncomplete,
  describeWhere,
  quantityName,
  runUrl,
} from "./alert-lines";
import { html, link, type SafeHtml } from "./html";
import { MAIL_STYLE, mailPage } from "./layout";

// One alert as mail: what left its band (value, limits, unit), which runs did
// not complete, what drifts and why, each with the link to its run page.

export interface ComposedMail {
  subject: string;
  text: string;
  html: string;
}

export function alertFooterText(appUrl: string): string {
  return `Sent to the release managers and to everyone subscribed to these cases or branches. Choose your own alerts at ${appUrl}/settings.`;
}

/** The findings as plain text, without the header lines (shared with the digest). */
export function alertTextSections(f: AlertFacts, appUrl: string): string {
  const out: string[] = [];
  const id = f.build.id;
  if (f.exits.length) {
    out.push(`Outside the band (${f.exits.length})`);
    for (const e of f.exits) out.push(`- ${describeWhere(e)}`, `  ${quantityName(e)} ${describeExit(e)}`, `  Run: ${runUrl(appUrl, id, e.runId)}`);
    out.push("");
  }
  if (f.incompleteRuns.length) {
    out.push(`Runs that did not complete (${f.incompleteRuns.length})`);
    for (const r of f.incompleteRuns) out.push(`- ${describeWhere(r)}: ${describeIncomplete(r)}`, `  Run: ${runUrl(appUrl, id, r.runId)}`);
    out.push("");
  }
  if (f.drifts.length) {
    out.push(`Drifts (${f.drifts.length})`);
    for (const d of f.drifts) out.push(`- ${describeWhere(d)}`, `  ${quantityName(d)} ${describeDrift(d)}`, `  Run: ${runUrl(appUrl, id, d.runId)}`);
    out.push("");
  }
  return out.join("\n");
}

export function alertHtmlSections(f: AlertFacts, appUrl: string): SafeHtml {
  const id = f.build.id;
  return html`${
    f.exits.length
      ? html`<h3 style="${MAIL_STYLE.heading}">Outside the band (${f.exits.length})</h3>${f.exits.map(
          (e) => html`<p style="${MAIL_STYLE.item}"><span style="${MAIL_STYLE.where}">${describeWhere(e)}</span><br>${quantityName(e)} <span style="${MAIL_STYLE.mono}">${describeExit(e)}</span><br>${link(runUrl(appUrl, id, e.runId), "Open the run")}</p>`,
        )}`
      : ""
  }${
    f.incompleteRuns.length
      ? html`<h3 style="${MAIL_STYLE.heading}">Runs that did not complete (${f.incompleteRuns.length})</h3>${f.incompleteRuns.map(
          (r) => html`<p style="${MAIL_STYLE.item}"><span style="${MAIL_STYLE.where}">${describeWhere(r)}</span>: ${describeIncomplete(r)}<br>${link(runUrl(appUrl, id, r.runId), "Open the run")}</p>`,
        )}`
      : ""
  }${
    f.drifts.length
      ? html`<h3 style="${MAIL_STYLE.heading}">Drifts (${f.drifts.length})</h3>${f.drifts.map(
          (d) => html`<p style="${MAIL_STYLE.driftItem}"><span style="${MAIL_STYLE.where}">${describeWhere(d)}</span><br>${quantityName(d)} <span style="${MAIL_STYLE.mono}">${describeDrift(d)}</span><br>${link(runUrl(appUrl, id, d.runId), "Open the run")}</p>`,
        )}`
      : ""
  }`;
}

export function composeAlert(f: AlertFacts, appUrl: string): ComposedMail {
  const head = [
    `${describeBuild(f)}: ${countFindings(f)}.`,
    `Build ${f.build.solver} ${f.build.version}, commit ${f.build.commit}, branch ${f.build.branch}; build verdict ${f.build.verdict}.`,
    `Build page: ${buildUrl(appUrl, f.build.id)}`,
    ...(f.build.pipelineUrl ? [`CI pipeline: ${f.build.pipelineUrl}`] : []),
    "",
  ];
  const text = [...head, alertTextSections(f, appUrl), "--", alertFooterText(appUrl), ""].join("\n");
  const body = html`<h2 style="margin:4px 0 2px;font-size:17px">${describeBuild(f)}</h2>
<p style="margin:0 0 8px">${countFindings(f)}. Commit <span style="${MAIL_STYLE.mono}">${f.build.commit}</span>, branch <span style="${MAIL_STYLE.mono}">${f.build.branch}</span>; build verdict <b>${f.build.verdict}</b>.<br>${link(buildUrl(appUrl, f.build.id), "Open the build")}${f.build.pipelineUrl ? html` · ${link(f.build.pipelineUrl, "CI pipeline")}` : ""}</p>
${alertHtmlSections(f, appUrl)}`;
  const footer = html`Sent to the release managers and to everyone subscribed to these cases or branches. ${link(`${appUrl}/settings`, "Choose your own alerts")}.`;
  return { subject: alertSubject(f), text, html: mailPage({ title: alertSubject(f), body, footer }).value };
}
