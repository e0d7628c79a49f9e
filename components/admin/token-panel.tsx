"use client";

import { useMutation, useQuery } from "@apollo/client/react";
import { useState } from "react";
import { formatUtc } from "@/components/builds/format-time";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { CI_TOKENS, REVOKE_CI_TOKEN, type CiToken } from "@/graphql/operations/admin";
import { ConfirmButton } from "./form-parts";
import { NewTokenForm } from "./new-token-form";
import { OneTimeSecret } from "./one-time-secret";
import { readServerError } from "./server-errors";

const STATE: Record<CiToken["status"], { mark: string; tone: string }> = {
  usable: { mark: "●", tone: "text-verdict-within" },
  expired: { mark: "◔", tone: "text-verdict-marginal" },
  revoked: { mark: "✕", tone: "text-verdict-outside" },
};

export function TokenPanel() {
  const { data, loading, error } = useQuery(CI_TOKENS);
  const [revoke] = useMutation(REVOKE_CI_TOKEN, { refetchQueries: ["AccountChanges"] });
  const [fresh, setFresh] = useState<{ name: string; secret: string } | null>(null);
  const [failure, setFailure] = useState<string | null>(null);

  async function onRevoke(token: CiToken) {
    setFailure(null);
    try {
      await revoke({ variables: { id: token.id } });
    } catch (e) {
      setFailure(`Could not revoke “${token.name}”: ${readServerError(e).message}`);
    }
  }

  const tokens = data?.ciTokens ?? [];
  return (
    <Panel title="CI tokens" subtitle="Bearer tokens with which pipelines post results and read the release gate. A revoked or expired token is refused on its next request.">
      {fresh && (
        <div className="mb-3">
          <OneTimeSecret title={`Secret of “${fresh.name}”`} secret={fresh.secret} onDismiss={() => setFresh(null)}>
            Store it in the pipeline&apos;s secret variables and send it as <code className="font-mono">Authorization: Bearer …</code>.
          </OneTimeSecret>
        </div>
      )}
      {failure && (
        <p role="alert" className="mb-3 text-sm text-verdict-outside">
          {failure}
        </p>
      )}
      {loading && !data ? (
        <LoadingBlock label="Loading the CI tokens" rows={3} />
      ) : error ? (
        <ErrorNotice title="Could not load the CI tokens" error={error} />
      ) : tokens.length === 0 ? (
        <EmptyState title="No CI tokens">Create one below for each pipeline that posts results.</EmptyState>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-ink/10 dark:border-white/10">
          <table className="w-full text-sm">
            <thead className="bg-paper-sunk/60 text-left text-xs uppercase tracking-wide text-ink-faint dark:bg-white/5 dark:text-white/50">
              <tr>
                {["Name", "State", "Created", "Expires", "Last used", ""].map((h) => (
                  <th key={h} scope="col" className="px-3 py-2 font-medium whitespace-nowrap">
                    {h || <span className="sr-only">Actions</span>}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {tokens.map((t) => (
                <tr key={t.id} className={`border-t border-ink/5 align-top dark:border-white/5 ${t.status === "usable" ? "" : "text-ink-faint dark:text-white/45"}`} data-token={t.name}>
                  <td className="px-3 py-2 font-medium">{t.name}</td>
                  <td className="px-3 py-2 whitespace-nowrap">
                    <span className={`mr-1 ${STATE[t.status].tone}`} aria-hidden>
                      {STATE[t.status].mark}
                    </span>
                    {t.status}
                    {t.revokedAt && <span className="block text-xs">{formatUtc(t.revokedAt)}</span>}
                  </td>
                  <td className="px-3 py-2">
                    {formatUtc(t.createdAt)}
                    <span className="block text-xs text-ink-faint">{t.createdBy ? `by ${t.createdBy}` : "by the demo seed"}</span>
                  </td>
                  <td className="px-3 py-2 whitespace-nowrap">{t.expiresAt ? formatUtc(t.expiresAt) : "never"}</td>
                  <td className="px-3 py-2 whitespace-nowrap">{t.lastUsedAt ? formatUtc(t.lastUsedAt) : "not yet"}</td>
                  <td className="px-3 py-2 text-right">{t.status !== "revoked" && <ConfirmButton label="Revoke" confirmLabel="Revoke now" onConfirm={() => onRevoke(t)} />}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <div className="mt-4 border-t border-ink/10 pt-3 dark:border-white/10">
        <NewTokenForm onCreated={(name, secret) => setFresh({ name, secret })} />
      </div>
    </Panel>
  );
}
