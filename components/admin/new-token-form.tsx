"use client";

import { useMutation } from "@apollo/client/react";
import { useState, type FormEvent } from "react";
import { CREATE_CI_TOKEN } from "@/graphql/operations/admin";
import { ciTokenSchema } from "@/lib/validation/users";
import { BUTTON, Field, INPUT } from "./form-parts";
import { readServerError } from "./server-errors";

/** A date picked in the form means "valid through that day": it expires at the end of the day, UTC. */
export function endOfDayUtc(day: string): string | null {
  return day ? `${day}T23:59:59.999Z` : null;
}

export function NewTokenForm({ onCreated }: { onCreated: (name: string, secret: string) => void }) {
  const [fields, setFields] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [createToken, { loading }] = useMutation(CREATE_CI_TOKEN, { refetchQueries: ["CiTokens", "AccountChanges"] });

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    const input = { name: String(data.get("name") ?? ""), expiresAt: endOfDayUtc(String(data.get("expires") ?? "")) };
    const checked = ciTokenSchema.safeParse(input);
    if (!checked.success) {
      setFields(Object.fromEntries(checked.error.issues.map((i) => [String(i.path[0] ?? "form"), i.message])));
      return;
    }
    setFields({});
    setMessage(null);
    try {
      const res = await createToken({ variables: { input: { name: checked.data.name, expiresAt: input.expiresAt } } });
      if (res.data) onCreated(res.data.createCiToken.token.name, res.data.createCiToken.secret);
      form.reset();
    } catch (error) {
      const read = readServerError(error);
      setFields(read.fields);
      setMessage(read.message);
    }
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-wrap items-start gap-3" noValidate>
      <div className="min-w-56 max-w-md flex-1">
        <Field label="Name" error={fields.name} hint="Which pipeline uses it, e.g. “nightly canonical suite”.">
          <input name="name" autoComplete="off" className={INPUT} />
        </Field>
      </div>
      <div className="w-56">
        <Field label="Valid through (UTC, optional)" error={fields.expiresAt} hint="Empty: until revoked.">
          <input name="expires" type="date" className={INPUT} />
        </Field>
      </div>
      <button type="submit" className={`${BUTTON} mt-6`} disabled={loading}>
        {loading ? "Creating…" : "Create token"}
      </button>
      {message && (
        <p role="alert" className="w-full text-sm text-verdict-outside">
          {message}
        </p>
      )}
    </form>
  );
}
