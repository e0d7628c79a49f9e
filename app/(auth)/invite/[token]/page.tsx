import type { Metadata } from "next";
import Link from "next/link";
import { SetPasswordForm } from "@/components/admin/set-password-form";
import { formatUtc } from "@/components/builds/format-time";
import { describePasswordLink } from "@/lib/services/invites";

// Rendered per request: the link's state (open, used, expired) changes, and a
// cached "open" page would offer a form for a link that no longer works.
export const dynamic = "force-dynamic";

// The secret sits in the path: keep it out of Referer headers and search indexes.
export const metadata: Metadata = { title: "Set your password · Tauline", referrer: "no-referrer", robots: { index: false, follow: false } };

const CLOSED: Record<"used" | "expired" | "unknown", { title: string; text: string }> = {
  used: { title: "This link has been used", text: "The password for this account is already set. Sign in with it, or ask an administrator for a new link if you forgot it." },
  expired: { title: "This link is no longer valid", text: "It has expired or was replaced by a newer link. Ask a Tauline administrator to send you a new one." },
  unknown: { title: "This is not a set-password link of this server", text: "Check that the whole link was copied from the e-mail or message, or ask an administrator for a new one." },
};

export default async function SetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = await describePasswordLink({ token });
  return (
    <section className="mx-auto mt-16 max-w-sm">
      {link.state === "open" ? (
        <>
          <h1 className="text-2xl font-semibold tracking-tight">Set your Tauline password</h1>
          <p className="mt-2 text-sm text-ink-soft dark:text-white/60">
            For <span className="font-medium text-ink dark:text-white">{link.name}</span> ({link.email}). The link works once, until {formatUtc(link.expiresAt)}.
          </p>
          <SetPasswordForm token={token} email={link.email} />
        </>
      ) : (
        <>
          <h1 className="text-2xl font-semibold tracking-tight">{CLOSED[link.state].title}</h1>
          <p className="mt-2 text-sm text-ink-soft dark:text-white/60">{CLOSED[link.state].text}</p>
          <p className="mt-6 text-sm">
            <Link href="/sign-in" className="underline">
              Go to sign-in
            </Link>
          </p>
        </>
      )}
    </section>
  );
}
