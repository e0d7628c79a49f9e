import type { Metadata } from "next";
import { headers } from "next/headers";
import type { ReactNode } from "react";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Tauline", template: "%s · Tauline" },
  description: "Release gate for the in-house RANS solver: canonical cases, tolerance bands, trends and decisions.",
};

const ZOD_JITLESS = "globalThis.__zod_globalConfig = Object.assign(globalThis.__zod_globalConfig || {}, { jitless: true });";

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Reading the request makes every page render per request: Next stamps the
  // proxy's per-request CSP nonce (proxy.ts) on its scripts only while
  // rendering, never into a page prerendered at build time.
  const nonce = (await headers()).get("x-nonce") ?? undefined;
  return (
    <html lang="en">
      <head>
        {/* zod 4 probes for eval with `new Function` when its first object schema is built; the CSP
            blocks it (zod copes) but the browser reports a violation. jitless skips the probe. This must
            run before any chunk, hence an inline script, allowed by the nonce. */}
        <script nonce={nonce} dangerouslySetInnerHTML={{ __html: ZOD_JITLESS }} />
      </head>
      <body className="flex min-h-screen flex-col">
        <div className="flex-1">{children}</div>
        <footer className="mx-auto w-full max-w-7xl px-6 pb-6 pt-10 text-xs leading-relaxed text-ink-faint">
          Passing the canonical cases does not validate the solver for any particular application or design. Where results
          are used for anything safety-relevant, the applicable codes, standards and licensed engineering practice govern.
        </footer>
      </body>
    </html>
  );
}
