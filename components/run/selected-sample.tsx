import { formatSig } from "@/lib/format/numbers";
import type { StressView } from "./run-data";

/** Picker for one stress sample and the numbers behind its two map positions. */
export function SelectedSample({ samples, selected, onSelect }: { samples: StressView[]; selected: number | null; onSelect: (n: number | null) => void }) {
  const s = selected !== null ? samples[selected - 1] : null;
  return (
    <div className="mt-3 flex flex-wrap items-start gap-x-6 gap-y-2 text-xs" data-testid="selected-sample">
      <label className="flex items-center gap-2">
        <span className="uppercase tracking-wide text-ink-faint">Sample</span>
        <select
          className="rounded border border-ink/20 bg-paper-raised px-1.5 py-0.5 font-mono dark:border-white/20 dark:bg-white/10"
          value={selected ?? ""}
          onChange={(e) => onSelect(e.target.value === "" ? null : Number(e.target.value))}
        >
          <option value="">— click a marker or pick —</option>
          {samples.map((x, i) => (
            <option key={i} value={i + 1}>
              {i + 1}: at = {formatSig(x.at, 4)}
              {x.realizable ? "" : " (not realizable)"}
            </option>
          ))}
        </select>
      </label>
      {s && (
        <dl className="flex flex-wrap gap-x-4 gap-y-1 font-mono tabular-nums">
          {(
            [
              ["⟨uu⟩, ⟨vv⟩, ⟨ww⟩", `${formatSig(s.uu, 4)}, ${formatSig(s.vv, 4)}, ${formatSig(s.ww, 4)}`],
              ["⟨uv⟩, ⟨uw⟩, ⟨vw⟩", `${formatSig(s.uv, 4)}, ${formatSig(s.uw, 4)}, ${formatSig(s.vw, 4)}`],
              ["k", formatSig(s.k, 4)],
              ["ξ, η", `${formatSig(s.xi, 4)}, ${formatSig(s.eta, 4)}`],
              ["F", formatSig(s.lumleyF, 4)],
              ["x_B, y_B", `${formatSig(s.barycentricX, 4)}, ${formatSig(s.barycentricY, 4)}`],
            ] as const
          ).map(([term, value]) => (
            <div key={term} className="flex gap-1">
              <dt className="font-sans text-ink-faint">{term}</dt>
              <dd>{value}</dd>
            </div>
          ))}
          <div className={s.realizable ? "text-verdict-within" : "font-semibold text-verdict-outside"}>{s.realizable ? "realizable" : `not realizable: ${s.violations.join("; ")}`}</div>
        </dl>
      )}
    </div>
  );
}
