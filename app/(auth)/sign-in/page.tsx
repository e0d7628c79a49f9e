import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/shell/sign-in-form";
import { getCurrentSession } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string; error?: string }> }) {
  const [session, params] = await Promise.all([getCurrentSession(), searchParams]);
  const callbackUrl = safeCallback(params.callbackUrl);
  if (session?.user) redirect(callbackUrl);
  return (
    <section className="mx-auto mt-16 max-w-sm">
      <h1 className="text-2xl font-semibold tracking-tight">Sign in to Tauline</h1>
      <p className="mt-2 text-sm text-ink-soft dark:text-white/60">
        Canonical-case results of every Cormorant build, their tolerance bands and the release decisions.
      </p>
      <SignInForm callbackUrl={callbackUrl} />
    </section>
  );
}

// Only same-site paths: an absolute URL here would turn sign-in into an open redirect.
function safeCallback(raw: string | undefined): string {
  if (!raw) return "/";
  try {
    const url = new URL(raw, "http://local.invalid");
    if (url.origin !== "http://local.invalid" && !/^https?:\/\/(127\.0\.0\.1|localhost)(:\d+)?$/.test(url.origin)) return "/";
    return url.pathname.startsWith("/sign-in") ? "/" : `${url.pathname}${url.search}`;
  } catch {
    return "/";
  }
}
