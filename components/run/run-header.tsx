import Link from "next/link";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import { formatSig } from "@/lib/format/numbers";
import type { RunHeader } from "@/lib/services/run-view";
import { CoefficientName } from "./coefficient-name";

const received = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

/** Seconds as an engineer logs a job: 42.1 s, 12 min 5 s, 3 h 12 min. */
export function formatWallTime(seconds: number | null): string {
  if (seconds === null || !Number.isFinite(seconds)) return "—";
  if (seconds < 60) return `${formatSig(seconds, 3)} s`;
  const s = Math.round(seconds);
  if (s < 3600) return `${Math.floor(s / 60)} min ${s % 60} s`;
  return `${Math.floor(s / 3600)} h ${Math.floor((s % 3600) / 60)} min`;
}

/** What ran, on which build, how it ended, and with which closure coefficients. */
export function RunHeaderBlock({ header }: { header: RunHeader }) {
  const { run, build } = header;
  const failed = run.status !== "COMPLETED";
  const facts: [string, React.ReactNode][] = [
    ["Case", <span key="c" className="font-mono">{run.caseKey}</span>],
    ["Model", <span key="m">{header.modelName ?? run.modelKey} <span className="font-mono text-xs text-ink-faint">({run.modelKey})</span></span>],
    ["Grid", <span key="g" className="font-mono">{run.grid}</span>],
    ["Status", <span key="s" className={failed ? "font-semibold text-verdict-outside" : ""}>{run.status.toLowerCase()}</span>],
    ["Iterations", <span key="i" className="font-mono tabular-nums">{run.iterations === null ? "—" : run.iterations.toLocaleString("en-GB")}</span>],
    ["Wall time", <span key="w" className="font-mono tabular-nums">{formatWallTime(run.wallSeconds)}</span>],
    ["Run verdict", <VerdictBadge key="v" verdict={run.verdict} />],
  ];
  return (
    <header className="mb-5">
      <Link href={`/builds/${build.id}`} className="text-sm text-tide-700 hover:underline dark:text-tide-300">
        ← Build {build.solver} {build.version} · <span className="font-mono">{build.branch}</span> · <span className="font-mono">{build.commit.slice(0, 10)}</span>
        <span className="text-ink-faint"> · received {received.format(build.receivedAt)} UTC</span>
      </Link>
      <h1 className="mt-1 text-xl font-semibold tracking-tight">{header.caseTitle ?? run.caseKey}</h1>
      <dl className="mt-3 flex flex-wrap gap-x-10 gap-y-3 text-sm">
        {facts.map(([term, value]) => (
          <div key={term}>
            <dt className="text-xs uppercase tracking-wide text-ink-faint">{term}</dt>
            <dd className="mt-0.5">{value}</dd>
          </div>
        ))}
      </dl>
      <div className="mt-3 text-sm">
        <span className="mr-2 text-xs uppercase tracking-wide text-ink-faint">Closure coefficients</span>
        {header.coefficients.length === 0 ? (
          <span className="text-ink-soft dark:text-white/60">none reported by this run</span>
        ) : (
          <ul className="inline-flex flex-wrap gap-1.5 align-middle" data-testid="run-coefficients">
            {header.coefficients.map((c) => (
              <li key={c.name} className="rounded bg-paper-sunk px-1.5 py-0.5 font-mono text-xs dark:bg-white/10">
                <CoefficientName name={c.name} /> = {formatSig(c.value, 6)}
              </li>
            ))}
          </ul>
        )}
      </div>
    </header>
  );
}
