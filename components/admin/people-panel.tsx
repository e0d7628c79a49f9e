"use client";

import { useMutation, useQuery } from "@apollo/client/react";
import { useState, type ReactNode } from "react";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { formatUtc } from "@/components/builds/format-time";
import { DEACTIVATE_USER, ISSUE_PASSWORD_LINK, REACTIVATE_USER, SET_USER_ROLE, USER_ACCOUNTS, type PasswordLink, type UserAccount } from "@/graphql/operations/admin";
import type { Role } from "@/lib/validation/users";
import { ROLE_NAMES } from "./account-words";
import { AddPersonForm } from "./add-person-form";
import { OneTimeSecret } from "./one-time-secret";
import { PeopleTable, type PeopleActions } from "./people-table";
import { readServerError } from "./server-errors";

// Role and activation changes return the account, which Apollo merges by id; the
// change record is refetched so the audit entry shows up beside the change.
const AFTER = { refetchQueries: ["AccountChanges"] };

/** People and roles with the form to add someone; `beside` fills the column next to the form. */
export function PeoplePanel({ meId, beside }: { meId: number; beside?: ReactNode }) {
  const { data, loading, error } = useQuery(USER_ACCOUNTS);
  const [link, setLink] = useState<PasswordLink | null>(null);
  const [busyId, setBusyId] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const [setRole] = useMutation(SET_USER_ROLE, AFTER);
  const [deactivate] = useMutation(DEACTIVATE_USER, AFTER);
  const [reactivate] = useMutation(REACTIVATE_USER, AFTER);
  const [issueLink] = useMutation(ISSUE_PASSWORD_LINK, AFTER);

  async function run(account: UserAccount, what: string, action: () => Promise<unknown>) {
    setBusyId(account.id);
    setFailure(null);
    try {
      await action();
    } catch (e) {
      setFailure(`Could not ${what} ${account.name}: ${readServerError(e).message}`);
    } finally {
      setBusyId(null);
    }
  }

  const actions: PeopleActions = {
    setRole: (a, role: Role) => run(a, `make ${ROLE_NAMES[role]}`, () => setRole({ variables: { userId: a.id, role } })),
    deactivate: (a) => run(a, "deactivate", () => deactivate({ variables: { userId: a.id } })),
    reactivate: (a) => run(a, "reactivate", () => reactivate({ variables: { userId: a.id } })),
    issueLink: (a) =>
      run(a, "issue a link for", async () => {
        const res = await issueLink({ variables: { userId: a.id } });
        if (res.data) setLink(res.data.issuePasswordLink);
      }),
  };

  const accounts = data?.userAccounts ?? [];
  const counts = { active: accounts.filter((a) => a.status === "active").length, invited: accounts.filter((a) => a.status === "invited").length };
  return (
    <div className="space-y-5">
      <Panel title="People and roles" subtitle={data ? `${counts.active} can sign in, ${counts.invited} invited, ${accounts.length - counts.active - counts.invited} switched off` : undefined}>
        {link && (
          <div className="mb-3">
            <OneTimeSecret title={`Set-password link for ${link.account.name}`} secret={link.url} onDismiss={() => setLink(null)}>
              Also mailed to {link.mailedTo}. It works once, until {formatUtc(link.expiresAt)}; any older link of this person no longer works.
            </OneTimeSecret>
          </div>
        )}
        {failure && (
          <p role="alert" className="mb-3 rounded border border-verdict-outside/40 bg-verdict-outside/5 px-3 py-2 text-sm text-verdict-outside">
            {failure}
          </p>
        )}
        {loading && !data ? (
          <LoadingBlock label="Loading the accounts" rows={5} />
        ) : error ? (
          <ErrorNotice title="Could not load the accounts" error={error} />
        ) : accounts.length === 0 ? (
          <EmptyState title="No accounts">Seed the demo people (npm run db:seed) or add someone below.</EmptyState>
        ) : (
          <PeopleTable accounts={accounts} meId={meId} busyId={busyId} actions={actions} />
        )}
        <p className="mt-2 text-xs text-ink-faint">
          A change counts on the person&apos;s next request: switching an account off signs it out at once (switching it back on does not revive old
          sessions), a new role applies to the next page or API call, and a password set through a link ends the sessions opened with the old one. Nobody can
          switch themselves off or change their own role, and the last active administrator stays.
        </p>
      </Panel>
      <div className="grid items-start gap-5 lg:grid-cols-2">
        <Panel title="Add a person">
          <AddPersonForm onLink={setLink} />
        </Panel>
        {beside}
      </div>
    </div>
  );
}
