import type { GateState } from "@/graphql/operations/builds";

// Release decision of a build. Each state has its own glyph so the column reads
// without colour; pending is deliberately quiet (most builds never get a decision).
const GATE: Record<GateState, { mark: string; className: string; title: string }> = {
  pending: { mark: "◷", className: "text-ink-faint dark:text-white/50", title: "No release decision yet" },
  approved: { mark: "✓", className: "text-verdict-within", title: "Approved for release" },
  held: { mark: "‖", className: "text-verdict-marginal", title: "Held: waiting for more evidence or a fix" },
  rejected: { mark: "✕", className: "text-verdict-outside", title: "Rejected for release" },
};

export function GateStateTag({ state }: { state: GateState }) {
  const g = GATE[state];
  return (
    <span title={g.title} className={`inline-flex items-center gap-1 text-xs font-medium ${g.className}`}>
      <span aria-hidden>{g.mark}</span>
      {state}
    </span>
  );
}
