import type { Metadata } from "next";
import type { ReactNode } from "react";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Tauline", template: "%s · Tauline" },
  description: "Release gate for the in-house RANS solver: canonical cases, tolerance bands, trends and decisions.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body className="min-h-screen">
        <header className="border-b border-ink/10 bg-paper-raised/80 dark:bg-white/5">
          <div className="mx-auto flex max-w-7xl items-baseline gap-4 px-6 py-3">
            <a href="/" className="font-semibold tracking-tight text-tide-700 dark:text-tide-300">
              Tauline
            </a>
            <span className="text-sm text-ink-faint">release gate for the Cormorant RANS solver</span>
          </div>
        </header>
        <main className="mx-auto max-w-7xl px-6 py-6">{children}</main>
        <footer className="mx-auto max-w-7xl px-6 pb-8 text-xs leading-relaxed text-ink-faint">
          Passing the canonical cases does not validate the solver for any particular application or design. Where results
          are used for anything safety-relevant, the applicable codes, standards and licensed engineering practice govern.
        </footer>
      </body>
    </html>
  );
}
