import type { Metadata } from "next";
import { connection } from "next/server";
import type { ReactNode } from "react";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Tauline", template: "%s · Tauline" },
  description: "Release gate for the in-house RANS solver: canonical cases, tolerance bands, trends and decisions.",
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page is rendered per request: Next stamps the proxy's per-request CSP
  // nonce (proxy.ts) on its scripts only while rendering, never into a page
  // prerendered at build time.
  await connection();
  return (
    <html lang="en">
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
