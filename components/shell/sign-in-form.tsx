"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useEffect, useState, type FormEvent } from "react";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  // Until React has attached the submit handler the button stays disabled: a
  // native submit would put the password into the page URL.
  const [ready, setReady] = useState(false);
  useEffect(() => setReady(true), []);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setPending(true);
    setError(null);
    const result = await signIn("credentials", {
      email: String(form.get("email") ?? ""),
      password: String(form.get("password") ?? ""),
      redirect: false,
    });
    setPending(false);
    if (!result || result.error) {
      // A throttled attempt (429) carries the server's own words: which limit, and for how many minutes.
      setError(result?.status === 429 ? (result.error ?? "Too many attempts; wait a few minutes and try again.") : "E-mail or password is not right, or the account is inactive.");
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} method="post" data-ready={ready ? "true" : "false"} className="mt-8 space-y-4" aria-describedby={error ? "sign-in-error" : undefined}>
      <label className="block text-sm">
        <span className="font-medium">E-mail</span>
        <input
          name="email"
          type="email"
          autoComplete="username"
          required
          className="mt-1 w-full rounded border border-ink/20 bg-paper-raised px-3 py-2 dark:border-white/20 dark:bg-white/5"
        />
      </label>
      <label className="block text-sm">
        <span className="font-medium">Password</span>
        <input
          name="password"
          type="password"
          autoComplete="current-password"
          required
          className="mt-1 w-full rounded border border-ink/20 bg-paper-raised px-3 py-2 dark:border-white/20 dark:bg-white/5"
        />
      </label>
      {error && (
        <p id="sign-in-error" role="alert" className="text-sm text-verdict-outside">
          {error}
        </p>
      )}
      <button
        type="submit"
        disabled={pending || !ready}
        className="w-full rounded bg-tide-700 px-3 py-2 text-sm font-medium text-white hover:bg-tide-900 disabled:opacity-60"
      >
        {pending ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
