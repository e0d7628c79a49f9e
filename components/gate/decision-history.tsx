import { GateStateTag } from "@/components/builds/gate-state-tag";
import { Panel } from "@/components/ui/panel";
import type { GateDecisionItem } from "@/graphql/operations/gate";
import { formatDayTime } from "./gate-format";

/** Every decision on the build, newest first; the first one is the gate state. */
export function DecisionHistory({ history }: { history: GateDecisionItem[] }) {
  return (
    <Panel title="Decision history">
      {history.length === 0 ? (
        <p className="text-sm text-ink-faint dark:text-white/50">No decision yet: the build is pending.</p>
      ) : (
        <ol className="space-y-3" data-testid="decision-history">
          {history.map((d, i) => (
            <li key={d.id} className={`border-l-2 pl-3 ${i === 0 ? "border-tide-500" : "border-ink/10 dark:border-white/15"}`}>
              <p className="text-sm">
                <GateStateTag state={d.state} /> <span className="text-ink-soft dark:text-white/70">by {d.decidedBy}</span>
              </p>
              <p className="text-xs text-ink-faint dark:text-white/50">{formatDayTime(d.decidedAt)}</p>
              <p className="mt-0.5 text-sm whitespace-pre-line">{d.comment}</p>
            </li>
          ))}
        </ol>
      )}
    </Panel>
  );
}
