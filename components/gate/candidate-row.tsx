import Link from "next/link";
import { GateStateTag } from "@/components/builds/gate-state-tag";
import { RunCounts } from "@/components/builds/run-counts";
import type { GateCandidateItem } from "@/graphql/operations/gate";
import { formatDayTime } from "./gate-format";

/** One candidate: what it is, how it fared, what blocks approval, and its gate state. */
export function CandidateRow({ candidate: c, mayDecide }: { candidate: GateCandidateItem; mayDecide: boolean }) {
  const href = `/gate/${c.build.id}`;
  return (
    <tr data-candidate={c.build.id} className={`border-b border-ink/5 align-top dark:border-white/10 ${c.awaiting ? "" : "text-ink-soft dark:text-white/70"}`}>
      <td className="py-2 pr-3">
        <Link href={href} className="font-medium hover:underline">
          {c.build.solver} {c.build.version}
        </Link>
        <div className="font-mono text-xs text-ink-faint dark:text-white/50">
          {c.build.branch} · {c.build.commit.slice(0, 10)}
        </div>
      </td>
      <td className="py-2 pr-3 text-xs whitespace-nowrap">{formatDayTime(c.build.receivedAt)}</td>
      <td className="py-2 pr-3">
        <RunCounts counts={c.build.runCounts} />
      </td>
      <td className="py-2 pr-3 text-xs">
        <AttentionCounts c={c} />
      </td>
      <td className="py-2 pr-3 text-xs">
        <ApprovalCell c={c} />
      </td>
      <td className="py-2 pr-3">
        <GateStateTag state={c.state} />
        {c.state === "pending" && !c.awaiting && <div className="text-xs text-ink-faint dark:text-white/50">settled by a later decision</div>}
      </td>
      <td className="py-2 text-right">
        <Link href={href} className="text-sm whitespace-nowrap text-tide-700 hover:underline dark:text-tide-300">
          {c.awaiting && mayDecide ? "Review and decide →" : "Review →"}
        </Link>
      </td>
    </tr>
  );
}

function AttentionCounts({ c }: { c: GateCandidateItem }) {
  const parts = [
    c.incompleteRuns > 0 && { text: `${c.incompleteRuns} run${c.incompleteRuns === 1 ? "" : "s"} unfinished`, cls: "text-verdict-outside" },
    c.outsideCount > 0 && { text: `${c.outsideCount} outside`, cls: "text-verdict-outside" },
    c.missingCount > 0 && { text: `${c.missingCount} missing`, cls: "text-verdict-missing" },
    c.marginalCount > 0 && { text: `${c.marginalCount} marginal`, cls: "text-verdict-marginal" },
    c.driftCount > 0 && { text: `${c.driftCount} drifting`, cls: "text-tide-700 dark:text-tide-300" },
  ].filter((p): p is { text: string; cls: string } => Boolean(p));
  if (parts.length === 0) return <span className="text-ink-faint dark:text-white/50">nothing</span>;
  return (
    <span className="flex flex-wrap gap-x-2">
      {parts.map((p) => (
        <span key={p.text} className={p.cls}>
          {p.text}
        </span>
      ))}
    </span>
  );
}

function ApprovalCell({ c }: { c: GateCandidateItem }) {
  return (
    <span className="flex flex-col">
      {c.blockerCount > 0 ? (
        <span className="font-medium text-verdict-outside">✕ {c.blockerCount} block{c.blockerCount === 1 ? "s" : ""} approval</span>
      ) : (
        <span className="text-verdict-within">✓ nothing blocks</span>
      )}
      {c.waivedCount > 0 && <span className="text-ink-faint dark:text-white/50">{c.waivedCount} let through by waiver</span>}
    </span>
  );
}
