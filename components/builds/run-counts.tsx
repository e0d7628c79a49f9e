import type { Verdict } from "@/lib/analysis";
import type { VerdictCounts } from "@/graphql/operations/builds";

export const VERDICT_MARKS: Record<Verdict, string> = { within: "●", marginal: "◐", outside: "✕", unbanded: "○", missing: "?" };
export const VERDICT_TEXT: Record<Verdict, string> = {
  within: "text-verdict-within",
  marginal: "text-verdict-marginal",
  outside: "text-verdict-outside",
  unbanded: "text-verdict-unbanded",
  missing: "text-verdict-missing",
};
const ORDER: Verdict[] = ["within", "marginal", "outside", "unbanded", "missing"];

/** Runs per verdict, zero counts left out, e.g. "22 ● 1 ◐ 1 ✕". */
export function RunCounts({ counts }: { counts: VerdictCounts }) {
  const total = ORDER.reduce((s, v) => s + counts[v], 0);
  const title = ORDER.map((v) => `${counts[v]} ${v}`).join(", ");
  if (total === 0) return <span className="text-xs text-ink-faint">no runs</span>;
  return (
    <span title={title} className="inline-flex gap-2 font-mono text-xs tabular-nums whitespace-nowrap">
      {ORDER.filter((v) => counts[v] > 0).map((v) => (
        <span key={v} className={VERDICT_TEXT[v]}>
          {counts[v]}
          <span aria-hidden> {VERDICT_MARKS[v]}</span>
          <span className="sr-only"> {v}</span>
        </span>
      ))}
    </span>
  );
}
