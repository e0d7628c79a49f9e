"use client";

import { useState } from "react";
import { Panel } from "@/components/ui/panel";
import type { WaiverItem } from "@/graphql/operations/gate";
import { formatDayTime, formatUntil, waiverScope } from "./gate-format";
import { RevokeForm } from "./revoke-form";

/** Waivers in force that name a quantity of any run of this build on its branch, whether needed now or not. */
export function WaiversInForce({ waivers, mayDecide }: { waivers: WaiverItem[]; mayDecide: boolean }) {
  const [open, setOpen] = useState<string | null>(null);
  return (
    <Panel title="Waivers in force for this build" subtitle="Expired or withdrawn waivers no longer count.">
      {waivers.length === 0 ? (
        <p className="text-sm text-ink-faint dark:text-white/50">None.</p>
      ) : (
        <ul className="space-y-3" data-testid="waivers-in-force">
          {waivers.map((w) => (
            <li key={w.id} className="text-sm">
              <p>
                <span className="font-medium">#{w.id}</span> {waiverScope(w)}
              </p>
              <p className="text-xs text-ink-faint dark:text-white/50">
                by {w.grantedBy}, {formatDayTime(w.grantedAt)} · counts through {formatUntil(w.expiresAt)}
              </p>
              <p className="mt-0.5">“{w.reason}”</p>
              {mayDecide &&
                (open === w.id ? (
                  <RevokeForm waiver={w} onDone={() => setOpen(null)} />
                ) : (
                  <button type="button" onClick={() => setOpen(w.id)} className="mt-0.5 text-xs text-verdict-outside hover:underline">
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
