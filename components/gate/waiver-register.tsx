"use client";

import { useQuery } from "@apollo/client/react";
import { useState } from "react";
import { useQueryParams } from "@/components/data-table/use-query-params";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { WAIVER_REGISTER, type WaiverItem } from "@/graphql/operations/gate";
import { formatDayTime, formatUntil, waiverScope } from "./gate-format";
import { RevokeForm } from "./revoke-form";

/** Every waiver, newest grant first: in force by default, ended ones too with ?ended=1. */
export function WaiverRegister({ mayDecide }: { mayDecide: boolean }) {
  const { params, update } = useQueryParams();
  const includeEnded = params.get("ended") === "1";
  const { data, loading, error } = useQuery(WAIVER_REGISTER, { variables: { includeEnded }, fetchPolicy: "cache-and-network" });
  const [open, setOpen] = useState<string | null>(null);
  return (
    <Panel
      title="Waivers"
      subtitle="What is let through the gate, for which scope, until when and why."
      actions={
        <label className="flex items-center gap-1.5 text-sm">
          <input type="checkbox" checked={includeEnded} onChange={(e) => update({ ended: e.target.checked ? "1" : null })} />
          show expired and withdrawn
        </label>
      }
    >
      {loading && !data ? (
        <LoadingBlock label="Loading waivers" rows={3} />
      ) : error && !data ? (
        <ErrorNotice title="Could not load the waivers" error={error} />
      ) : !data || data.waivers.length === 0 ? (
        <EmptyState title={includeEnded ? "No waiver was ever granted" : "No waiver in force"}>Every quantity has to pass its band on its own.</EmptyState>
      ) : (
        <ul className="divide-y divide-ink/5 dark:divide-white/10" data-testid="waiver-register">
          {data.waivers.map((w) => (
            <li key={w.id} className="py-2 text-sm">
              <div className="flex flex-wrap items-baseline gap-x-3">
                <span className="font-medium">#{w.id}</span>
                <span>{waiverScope(w)}</span>
                <WaiverState w={w} />
              </div>
              <p className="text-xs text-ink-faint dark:text-white/50">
                granted by {w.grantedBy}, {formatDayTime(w.grantedAt)} · counts through {formatUntil(w.expiresAt)}
              </p>
              <p className="mt-0.5">“{w.reason}”</p>
              {w.revokedAt && (
                <p className="text-xs text-ink-soft dark:text-white/70">
                  withdrawn by {w.revokedBy ?? "a former user"}, {formatDayTime(w.revokedAt)}: “{w.revokeReason}”
                </p>
              )}
              {mayDecide && w.inForce && (open === w.id ? <RevokeForm waiver={w} onDone={() => setOpen(null)} /> : (
                <button type="button" onClick={() => setOpen(w.id)} className="text-xs text-verdict-outside hover:underline">
                  Withdraw…
                </button>
              ))}
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}

function WaiverState({ w }: { w: WaiverItem }) {
  if (w.inForce) return <span className="text-xs font-medium text-verdict-marginal">in force</span>;
  return <span className="text-xs text-ink-faint dark:text-white/50">{w.revokedAt ? "withdrawn" : "expired"}</span>;
}
