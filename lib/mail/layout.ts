import { html, type SafeHtml } from "./html";

// The frame of every HTML mail: inline styles only (mail clients drop <style>
// blocks and external sheets), one column, readable without images.

export const MAIL_STYLE = {
  heading: "margin:20px 0 6px;font-size:15px;color:#14202b",
  item: "margin:0 0 10px;padding:0 0 0 10px;border-left:3px solid #b2452f",
  driftItem: "margin:0 0 10px;padding:0 0 0 10px;border-left:3px solid #c08a1e",
  where: "font-weight:600",
  mono: "font-family:'IBM Plex Mono',ui-monospace,monospace",
  faint: "color:#6b7a88;font-size:12px",
} as const;

export function mailPage({ title, body, footer }: { title: string; body: SafeHtml; footer: SafeHtml }): SafeHtml {
  return html`<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>${title}</title></head>
<body style="margin:0;padding:16px;background:#f6f5f1;color:#14202b;font-family:system-ui,sans-serif;font-size:14px;line-height:1.45">
<div style="max-width:760px;margin:0 auto;background:#ffffff;border:1px solid #e2e0d8;border-radius:6px;padding:16px 20px">
<p style="margin:0 0 4px;font-weight:600;color:#1b5f59">Tauline</p>
${body}
<p style="${MAIL_STYLE.faint};margin-top:24px;border-top:1px solid #e2e0d8;padding-top:8px">${footer}</p>
</div></body></html>`;
}
