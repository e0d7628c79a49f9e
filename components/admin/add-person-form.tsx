"use client";

import { useMutation } from "@apollo/client/react";
import { useState, type FormEvent } from "react";
import { CREATE_USER, INVITE_USER, type PasswordLink } from "@/graphql/operations/admin";
import { createUserSchema, inviteUserSchema, PASSWORD_MIN_CHARS, ROLES, type Role } from "@/lib/validation/users";
import { ROLE_DUTIES, ROLE_NAMES } from "./account-words";
import { BUTTON, Field, INPUT } from "./form-parts";
import { readServerError } from "./server-errors";

type Entry = "link" | "password";
const REFETCH = ["UserAccounts", "AccountChanges"];

/**
 * Adds a person in one of two ways: a set-password link (they choose their own
 * password; nobody else ever knows it) or a first password the admin passes on.
 * The password lives only in this form and is cleared once the account exists.
 */
export function AddPersonForm({ onLink }: { onLink: (link: PasswordLink) => void }) {
  const [entry, setEntry] = useState<Entry>("link");
  const [role, setRole] = useState<Role>("developer");
  const [fields, setFields] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [createUser, created] = useMutation(CREATE_USER, { refetchQueries: REFETCH });
  const [inviteUser, invited] = useMutation(INVITE_USER, { refetchQueries: REFETCH });
  const pending = created.loading || invited.loading;

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    const raw = { name: String(data.get("name") ?? ""), email: String(data.get("email") ?? ""), role };
    const withPassword = createUserSchema.safeParse({ ...raw, password: String(data.get("password") ?? "") });
    const withLink = inviteUserSchema.safeParse(raw);
    const checked = entry === "password" ? withPassword : withLink;
    if (!checked.success) {
      setFields(Object.fromEntries(checked.error.issues.map((i) => [String(i.path[0] ?? "form"), i.message])));
      setMessage(null);
      return;
    }
    setFields({});
    try {
      if (entry === "password" && withPassword.success) {
        const res = await createUser({ variables: { input: withPassword.data } });
        setMessage({ ok: true, text: `${res.data?.createUser.name} can sign in now as ${ROLE_NAMES[raw.role]}; pass the password on by a separate channel.` });
      } else if (withLink.success) {
        const res = await inviteUser({ variables: { input: withLink.data } });
        if (res.data) onLink(res.data.inviteUser);
        setMessage({ ok: true, text: `${res.data?.inviteUser.account.name} is invited; the link is shown above and was mailed to ${res.data?.inviteUser.mailedTo}.` });
      }
      form.reset();
      setRole("developer");
    } catch (error) {
      const read = readServerError(error);
      setFields(read.fields);
      setMessage({ ok: false, text: read.message });
    }
  }

  return (
    <form onSubmit={onSubmit} className="space-y-3" noValidate>
      <fieldset className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
        <legend className="sr-only">How the person gets in</legend>
        <label className="inline-flex items-center gap-1.5">
          <input type="radio" name="entry" checked={entry === "link"} onChange={() => setEntry("link")} />
          Send a set-password link
        </label>
        <label className="inline-flex items-center gap-1.5">
          <input type="radio" name="entry" checked={entry === "password"} onChange={() => setEntry("password")} />
          Set a first password myself
        </label>
      </fieldset>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Name" error={fields.name}>
          <input name="name" autoComplete="off" className={INPUT} />
        </Field>
        <Field label="E-mail" error={fields.email}>
          <input name="email" type="email" autoComplete="off" className={INPUT} />
        </Field>
        <Field label="Role" error={fields.role} hint={ROLE_DUTIES[role]}>
          <select name="role" value={role} onChange={(e) => setRole(e.target.value as Role)} className={INPUT}>
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_NAMES[r]}
              </option>
            ))}
          </select>
        </Field>
        {entry === "password" && (
          <Field label="First password" error={fields.password} hint={`At least ${PASSWORD_MIN_CHARS} characters; stored only as a bcrypt hash.`}>
            <input name="password" type="password" autoComplete="new-password" className={INPUT} />
          </Field>
        )}
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className={BUTTON} disabled={pending}>
          {pending ? "Adding…" : entry === "link" ? "Invite" : "Add the account"}
        </button>
        {message && (
          <p role={message.ok ? "status" : "alert"} className={`text-sm ${message.ok ? "text-ink-soft dark:text-white/70" : "text-verdict-outside"}`}>
            {message.text}
          </p>
        )}
      </div>
    </form>
  );
}
