import type { Verdict } from "@/lib/analysis";
import { VERDICT_MARKS, VERDICT_TEXT } from "./run-counts";
import { verdictDirection } from "./compare-summary";

function Mark({ verdict }: { verdict: Verdict | null }) {
  if (!verdict) return <span className="text-ink-faint">none</span>;
  return (
    <span className={VERDICT_TEXT[verdict]}>
      <span aria-hidden>{VERDICT_MARKS[verdict]}</span> {verdict}
    </span>
  );
}

/** "within → outside", with a word saying whether it got worse or better. */
export function VerdictChange({ from, to }: { from: Verdict | null; to: Verdict | null }) {
  if (from === to) return <Mark verdict={to} />;
  const dir = verdictDirection(from, to);
  return (
    <span className="inline-flex flex-wrap items-center gap-1 whitespace-nowrap text-xs">
      <Mark verdict={from} />
      <span aria-hidden>→</span>
      <Mark verdict={to} />
      {dir !== 0 && (
        <span className={`rounded px-1 font-semibold ${dir > 0 ? "bg-verdict-outside/15 text-verdict-outside" : "bg-verdict-within/15 text-verdict-within"}`}>
          {dir > 0 ? "worse" : "better"}
        </span>
      )}
    </span>
  );
}
