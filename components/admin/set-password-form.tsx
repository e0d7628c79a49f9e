"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { PASSWORD_MAX_BYTES, PASSWORD_MIN_CHARS, passwordSchema } from "@/lib/validation/users";

const SET_PASSWORD = "mutation SetPassword($input: SetPasswordInput!) { setPasswordWithLink(input: $input) { email } }";

interface Answer {
  data?: { setPasswordWithLink: { email: string } } | null;
  errors?: { message: string; extensions?: { issues?: { path: string; message: string }[] } }[];
}

// The page outside the dashboard has no Apollo client; one plain JSON POST to the
// same GraphQL route does the job. After the password is set we sign in with it.
export function SetPasswordForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const password = String(form.get("password") ?? "");
    const checked = passwordSchema.safeParse(password);
    if (!checked.success) return setError(`The password ${checked.error.issues[0].message}.`);
    if (password !== String(form.get("confirm") ?? "")) return setError("The two passwords differ.");
    setPending(true);
    setError(null);
    try {
      const res = await fetch("/api/graphql", {
        method: "POST",
        headers: { "content-type": "application/json", accept: "application/graphql-response+json, application/json" },
        body: JSON.stringify({ query: SET_PASSWORD, variables: { input: { token, password } } }),
      });
      const answer = (await res.json()) as Answer;
      if (answer.errors?.length) {
        const first = answer.errors[0];
        const issue = first.extensions?.issues?.[0];
        setPending(false);
        return setError(issue && issue.path !== "input.token" ? `The password ${issue.message}.` : first.message);
      }
      const result = await signIn("credentials", { email, password, redirect: false });
      if (!result || result.error) {
        router.replace("/sign-in");
        return;
      }
      router.replace("/");
      router.refresh();
    } catch {
      setPending(false);
      setError("The server could not be reached; try again in a moment.");
    }
  }

  return (
    <form onSubmit={onSubmit} className="mt-8 space-y-4" aria-describedby={error ? "set-password-error" : "set-password-rule"}>
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <label className="block text-sm">
        <span className="font-medium">New password</span>
        <input name="password" type="password" autoComplete="new-password" required minLength={PASSWORD_MIN_CHARS} className={INPUT} />
      </label>
      <label className="block text-sm">
        <span className="font-medium">The same again</span>
        <input name="confirm" type="password" autoComplete="new-password" required className={INPUT} />
      </label>
      <p id="set-password-rule" className="text-xs text-ink-faint">
        At least {PASSWORD_MIN_CHARS} characters and at most {PASSWORD_MAX_BYTES} bytes; a phrase of a few words is easier to remember than symbols.
      </p>
      {error && (
        <p id="set-password-error" role="alert" className="text-sm text-verdict-outside">
          {error}
        </p>
      )}
      <button type="submit" disabled={pending} className="w-full rounded bg-tide-700 px-3 py-2 text-sm font-medium text-white hover:bg-tide-900 disabled:opacity-60">
        {pending ? "Setting the password…" : "Set password and sign in"}
      </button>
    </form>
  );
}

const INPUT = "mt-1 w-full rounded border border-ink/20 bg-paper-raised px-3 py-2 dark:border-white/20 dark:bg-white/5";
