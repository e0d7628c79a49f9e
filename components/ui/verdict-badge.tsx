import type { Verdict } from "@/lib/analysis";

const STYLES: Record<Verdict, string> = {
  within: "bg-verdict-within/15 text-verdict-within ring-verdict-within/40",
  marginal: "bg-verdict-marginal/15 text-verdict-marginal ring-verdict-marginal/40",
  outside: "bg-verdict-outside/15 text-verdict-outside ring-verdict-outside/50",
  unbanded: "bg-verdict-unbanded/15 text-verdict-unbanded ring-verdict-unbanded/40",
  missing: "bg-verdict-missing/15 text-verdict-missing ring-verdict-missing/40",
};

// Shape as well as colour carries the verdict, so it reads without colour vision.
const MARKS: Record<Verdict, string> = { within: "●", marginal: "◐", outside: "✕", unbanded: "○", missing: "?" };

export function VerdictBadge({ verdict }: { verdict: Verdict }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded px-1.5 py-0.5 font-mono text-xs ring-1 ring-inset ${STYLES[verdict]}`}>
      <span aria-hidden>{MARKS[verdict]}</span>
      {verdict}
    </span>
  );
}
