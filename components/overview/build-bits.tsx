import Link from "next/link";
import type { Verdict } from "@/lib/analysis";
import type { BuildBrief, GateState } from "@/graphql/operations/overview";

// Small pieces the morning-view widgets share: a build named by version and short
// commit, its gate word, and its runs counted by verdict.

const dateTime = new Intl.DateTimeFormat("en-GB", { day: "2-digit", month: "short", hour: "2-digit", minute: "2-digit", timeZone: "UTC" });

export function formatReceived(iso: string): string {
  return `${dateTime.format(new Date(iso))} UTC`;
}

export function shortCommit(commit: string): string {
  return commit.slice(0, 10);
}

export function BuildName({ build }: { build: Pick<BuildBrief, "id" | "version" | "commit"> }) {
  return (
    <Link href={`/builds/${build.id}`} className="group inline-flex items-baseline gap-1.5 hover:underline">
      <span className="font-medium">{build.version}</span>
      <span className="font-mono text-xs text-ink-faint dark:text-white/50">{shortCommit(build.commit)}</span>
    </Link>
  );
}

const GATE_STYLE: Record<GateState, string> = {
  pending: "text-ink-soft ring-ink/20 dark:text-white/70 dark:ring-white/25",
  approved: "text-tide-700 ring-tide-500/50 dark:text-tide-300",
  held: "text-verdict-marginal ring-verdict-marginal/50",
  rejected: "text-verdict-outside ring-verdict-outside/50",
};
const GATE_WORD: Record<GateState, string> = { pending: "no decision", approved: "approved", held: "held", rejected: "rejected" };

export function GateWord({ gate }: { gate: GateState }) {
  return <span className={`inline-block rounded px-1.5 py-0.5 text-xs ring-1 ring-inset ${GATE_STYLE[gate]}`}>{GATE_WORD[gate]}</span>;
}

const ORDER: Verdict[] = ["within", "marginal", "outside", "unbanded", "missing"];
const BAR: Record<Verdict, string> = {
  within: "bg-verdict-within",
  marginal: "bg-verdict-marginal",
  outside: "bg-verdict-outside",
  unbanded: "bg-verdict-unbanded",
  missing: "bg-verdict-missing",
};

/** Runs counted by verdict: a proportional strip and the non-zero counts in words. */
export function RunCounts({ counts }: { counts: Record<Verdict, number> }) {
  const total = ORDER.reduce((s, v) => s + counts[v], 0);
  if (total === 0) return <span className="text-xs text-ink-faint">no runs</span>;
  return (
    <div className="min-w-40">
      <div className="flex h-1.5 overflow-hidden rounded-full bg-ink/10" aria-hidden>
        {ORDER.filter((v) => counts[v] > 0).map((v) => (
          <div key={v} className={BAR[v]} style={{ width: `${(100 * counts[v]) / total}%` }} />
        ))}
      </div>
      <p className="mt-1 text-xs tabular-nums text-ink-soft dark:text-white/70">
        {counts.within === total ? (
          total === 1 ? "the only run within" : `all ${total} runs within`
        ) : (
          <>
            {total} run{total === 1 ? "" : "s"}:{" "}
            {ORDER.filter((v) => counts[v] > 0)
              .map((v) => `${counts[v]} ${v}`)
              .join(" · ")}
          </>
        )}
      </p>
    </div>
  );
}

/** Which run and quantity a row is about, on two lines: case · model (· grid), then the quantity. */
export function RunQuantity({ caseKey, model, grid, quantity, label }: { caseKey: string; model: string; grid: string; quantity: string; label: string | null }) {
  return (
    <>
      <span className="whitespace-nowrap">
        {caseKey} · <span className="font-medium">{model}</span>
        {grid !== "default" && <span className="text-ink-faint"> · {grid}</span>}
      </span>
      <span className="block text-xs text-ink-soft dark:text-white/70">
        {label ?? quantity} <span className="font-mono text-ink-faint">{quantity}</span>
      </span>
    </>
  );
}

/**
 * The table both morning-view lists use: one row per run · quantity, a right-aligned
 * number column wherever `numeric` says so, and a last column for the links.
 */
export function FindingTable({ columns, children }: { columns: { label: string; numeric?: boolean }[]; children: React.ReactNode }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <thead className="text-left text-xs text-ink-faint">
          <tr>
            {columns.map((c) => (
              <th key={c.label} className={`py-1 pr-3 font-medium${c.numeric ? " text-right" : ""}`}>
                {c.label}
              </th>
            ))}
            <th className="py-1 font-medium" />
          </tr>
        </thead>
        <tbody>{children}</tbody>
      </table>
    </div>
  );
}
