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
