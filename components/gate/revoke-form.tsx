"use client";

import { useMutation } from "@apollo/client/react";
import { useId, useState } from "react";
import { REVOKE_WAIVER, type WaiverItem } from "@/graphql/operations/gate";
import { waiverRevokeSchema } from "@/lib/validation/gate";
import { FieldError, FormMessage, inputClass, quietButton } from "./form-bits";
import { readServerError } from "./server-errors";

/** Withdraws a waiver at once, with the reason; what it let through blocks again. */
export function RevokeForm({ waiver, onDone }: { waiver: WaiverItem; onDone: () => void }) {
  const uid = useId();
  const [reason, setReason] = useState("");
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [message, setMessage] = useState<string | null>(null);
  const [revoke, { loading }] = useMutation(REVOKE_WAIVER, { refetchQueries: "active", awaitRefetchQueries: true });

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const checked = waiverRevokeSchema.safeParse({ id: waiver.id, reason });
    if (!checked.success) {
      setFieldError(checked.error.issues[0].message);
      return;
    }
    setFieldError(undefined);
    try {
      await revoke({ variables: { id: waiver.id, reason } });
      onDone();
    } catch (error) {
      setMessage(readServerError(error).message);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="mt-1.5 space-y-1.5">
      <label htmlFor={`${uid}-reason`} className="block text-xs text-ink-soft dark:text-white/70">
        Why withdraw waiver #{waiver.id}?
      </label>
      <textarea id={`${uid}-reason`} rows={2} value={reason} onChange={(e) => setReason(e.target.value)} aria-invalid={Boolean(fieldError)} aria-describedby={`${uid}-error`} className={inputClass} />
      <FieldError id={`${uid}-error`} message={fieldError} />
      {message && <FormMessage>{message}</FormMessage>}
      <div className="flex gap-2">
        <button type="submit" disabled={loading} className={`${quietButton} text-verdict-outside`}>
          {loading ? "Withdrawing…" : "Withdraw waiver"}
        </button>
        <button type="button" onClick={onDone} className={quietButton}>
          Cancel
        </button>
      </div>
    </form>
  );
}
