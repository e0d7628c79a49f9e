import { formatSig } from "@/lib/format/numbers";
import type { StressView } from "./run-data";

/** The non-realizable samples with their stresses and every condition each one breaks. */
export function StressViolations({ samples }: { samples: StressView[] }) {
  const bad = samples.map((s, i) => ({ s, n: i + 1 })).filter(({ s }) => !s.realizable);
  if (bad.length === 0) {
    return (
      <p className="mt-3 text-xs text-ink-soft dark:text-white/60">
        Every sample is realizable: normal stresses ≥ 0, Schwarz inequalities hold and R_ij has no negative eigenvalue (Schumann 1977; Lumley 1978).
      </p>
    );
  }
  return (
    <div className="mt-4 overflow-x-auto" data-testid="realizability-violations">
      <h3 className="mb-1 text-xs font-semibold text-verdict-outside">Non-realizable samples ({bad.length})</h3>
      <table className="w-full text-xs">
        <thead className="text-left uppercase tracking-wide text-ink-faint">
          <tr className="border-b border-ink/10 dark:border-white/10">
            <th className="py-1 pr-3">#</th>
            <th className="py-1 pr-3 text-right">at</th>
            {["uu", "vv", "ww", "uv", "uw", "vw"].map((c) => (
              <th key={c} className="py-1 pr-3 text-right normal-case">⟨{c}⟩</th>
            ))}
            <th className="py-1 pr-3 text-right normal-case">k</th>
            <th className="py-1 pr-3 text-right normal-case" title="F = 1 + 9 II + 27 III = 27 det(R/2k); negative means not realizable">F</th>
            <th className="py-1">violated</th>
          </tr>
        </thead>
        <tbody>
          {bad.map(({ s, n }) => (
            <tr key={n} className="border-b border-ink/5 align-top dark:border-white/5">
              <td className="py-1 pr-3 font-mono">{n}</td>
              <td className="py-1 pr-3 text-right font-mono tabular-nums">{formatSig(s.at, 4)}</td>
              {[s.uu, s.vv, s.ww, s.uv, s.uw, s.vw].map((v, i) => (
                <td key={i} className={`py-1 pr-3 text-right font-mono tabular-nums ${i < 3 && v < 0 ? "text-verdict-outside" : ""}`}>
                  {formatSig(v, 4)}
                </td>
              ))}
              <td className="py-1 pr-3 text-right font-mono tabular-nums">{formatSig(s.k, 4)}</td>
              <td className={`py-1 pr-3 text-right font-mono tabular-nums ${s.lumleyF !== null && s.lumleyF < 0 ? "text-verdict-outside" : ""}`}>{formatSig(s.lumleyF, 3)}</td>
              <td className="py-1">
                <ul className="list-disc pl-4">
                  {s.violations.map((v) => (
                    <li key={v}>{v}</li>
                  ))}
                </ul>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
