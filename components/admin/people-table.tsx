"use client";

import { useState } from "react";
import type { UserAccount } from "@/graphql/operations/admin";
import { ROLES, type Role } from "@/lib/validation/users";
import { describeStatus, formatDay, ROLE_NAMES } from "./account-words";
import { BUTTON, ConfirmButton, QUIET_BUTTON } from "./form-parts";

export interface PeopleActions {
  setRole: (account: UserAccount, role: Role) => void;
  deactivate: (account: UserAccount) => void;
  reactivate: (account: UserAccount) => void;
  issueLink: (account: UserAccount) => void;
}

/** Every account with its role and whether it can sign in; the acting admin's own row has no actions. */
export function PeopleTable({ accounts, meId, busyId, actions }: { accounts: UserAccount[]; meId: number; busyId: string | null; actions: PeopleActions }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-ink/10 dark:border-white/10">
      <table className="w-full text-sm">
        <thead className="bg-paper-sunk/60 text-left text-xs uppercase tracking-wide text-ink-faint dark:bg-white/5 dark:text-white/50">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">Person</th>
            <th scope="col" className="px-3 py-2 font-medium">Role</th>
            <th scope="col" className="px-3 py-2 font-medium">Access</th>
            <th scope="col" className="px-3 py-2 font-medium whitespace-nowrap">Added</th>
            <th scope="col" className="px-3 py-2 font-medium"><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {accounts.map((a) => (
            <PersonRow key={a.id} account={a} me={Number(a.id) === meId} busy={busyId === a.id} actions={actions} />
          ))}
        </tbody>
      </table>
    </div>
  );
}

function PersonRow({ account: a, me, busy, actions }: { account: UserAccount; me: boolean; busy: boolean; actions: PeopleActions }) {
  const [draftRole, setDraftRole] = useState<Role | null>(null);
  const status = describeStatus(a);
  const off = a.status === "deactivated";
  return (
    <tr className={`border-t border-ink/5 align-top dark:border-white/5 ${off ? "text-ink-faint dark:text-white/45" : ""}`} data-account={a.email}>
      <td className="px-3 py-2">
        <span className="font-medium">{a.name}</span>
        {me && <span className="ml-1.5 rounded bg-tide-100 px-1 text-xs text-tide-900 dark:bg-tide-900 dark:text-tide-100">you</span>}
        <span className="block font-mono text-xs text-ink-faint">{a.email}</span>
      </td>
      <td className="px-3 py-2">
        {me ? (
          <span title="Another administrator can change your role">{ROLE_NAMES[a.role]}</span>
        ) : (
          <span className="inline-flex flex-wrap items-center gap-1.5">
            <select
              aria-label={`Role of ${a.name}`}
              value={draftRole ?? a.role}
              disabled={busy || off}
              onChange={(e) => setDraftRole(e.target.value === a.role ? null : (e.target.value as Role))}
              className="rounded border border-ink/15 bg-paper-raised px-1.5 py-0.5 text-sm dark:border-white/20 dark:bg-[#0f171e]"
            >
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_NAMES[r]}
                </option>
              ))}
            </select>
            {draftRole && (
              <>
                <button
                  type="button"
                  className={`${BUTTON} px-2 py-0.5 text-xs`}
                  disabled={busy}
                  onClick={() => {
                    actions.setRole(a, draftRole);
                    setDraftRole(null);
                  }}
                >
                  Apply
                </button>
                <button type="button" className="text-xs text-ink-soft underline dark:text-white/70" onClick={() => setDraftRole(null)}>
                  keep {ROLE_NAMES[a.role]}
                </button>
              </>
            )}
          </span>
        )}
      </td>
      <td className="px-3 py-2">
        <span className={`mr-1 ${status.tone}`} aria-hidden>
          {status.mark}
        </span>
        <span className="font-medium">{a.status}</span>
        {status.text && <span className="block text-xs text-ink-faint">{status.text}</span>}
      </td>
      <td className="px-3 py-2 whitespace-nowrap text-ink-soft dark:text-white/60">{formatDay(a.createdAt)}</td>
      <td className="px-3 py-2 text-right whitespace-nowrap">
        {!me && (
          <span className="inline-flex items-center gap-1.5">
            {a.status !== "deactivated" && (
              <button type="button" className={QUIET_BUTTON} disabled={busy} onClick={() => actions.issueLink(a)} title="A one-time link to set a password; older links stop working">
                {a.status === "invited" ? "New invite link" : "Password link"}
              </button>
            )}
            {a.status === "deactivated" ? (
              <button type="button" className={QUIET_BUTTON} disabled={busy} onClick={() => actions.reactivate(a)}>
                Reactivate
              </button>
            ) : (
              <ConfirmButton label="Deactivate" confirmLabel={`Lock ${a.name.split(" ")[0]} out`} disabled={busy} onConfirm={() => actions.deactivate(a)} />
            )}
          </span>
        )}
      </td>
    </tr>
  );
}
