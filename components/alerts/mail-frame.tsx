"use client";

// An HTML mail body shown without trusting it: a sandboxed frame with no
// permissions (no scripts, forms, popups, same-origin access or top navigation),
// and a Content-Security-Policy that blocks every remote load (tracking pixels,
// stylesheets), allowing only inline styles and data: images.
const POLICY = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; font-src data:";

export function MailFrame({ html, title }: { html: string; title: string }) {
  const srcDoc = `<meta http-equiv="Content-Security-Policy" content="${POLICY}">${html}`;
  return <iframe title={title} sandbox="" srcDoc={srcDoc} referrerPolicy="no-referrer" className="h-[32rem] w-full rounded border border-ink/10 bg-white dark:border-white/10" />;
}
