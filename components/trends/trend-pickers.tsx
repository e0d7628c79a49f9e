"use client";

import type { PickerCase } from "@/graphql/operations/trends";
import { LAST_CHOICES, type TrendSelection } from "./trend-selection";

// Case → quantity (only those the case has) → models (several) → branch, grid, range, x axis.

const selectClass = "rounded border border-ink/20 bg-paper-raised px-2 py-1 text-sm dark:border-white/20 dark:bg-white/5";

export function TrendPickers({
  cases,
  branches,
  selection,
  colourOf,
  onChange,
}: {
  cases: readonly PickerCase[];
  branches: readonly string[];
  selection: TrendSelection;
  colourOf: (model: string) => string;
  onChange: (next: Partial<TrendSelection>) => void;
}) {
  const current = cases.find((c) => c.key === selection.caseKey)!;
  const toggleModel = (m: string) => {
    const on = selection.models.includes(m);
    if (on && selection.models.length === 1) return; // a chart needs at least one model
    onChange({ models: on ? selection.models.filter((x) => x !== m) : current.models.filter((x) => x === m || selection.models.includes(x)) });
  };
  return (
    <div className="flex flex-wrap items-end gap-x-4 gap-y-3">
      <label className="flex flex-col gap-1 text-xs text-ink-faint">
        Case
        <select className={selectClass} value={selection.caseKey} onChange={(e) => onChange({ caseKey: e.target.value, quantity: "", models: [] })}>
          {cases.map((c) => (
            <option key={c.key} value={c.key}>
              {c.title}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-xs text-ink-faint">
        Quantity
        <select className={selectClass} value={selection.quantity} onChange={(e) => onChange({ quantity: e.target.value })}>
          {current.quantities.map((q) => (
            <option key={q.key} value={q.key}>
              {q.label} ({q.key})
            </option>
          ))}
        </select>
      </label>
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 text-xs text-ink-faint">Models</legend>
        <div className="flex flex-wrap gap-1.5">
          {current.models.map((m) => {
            const on = selection.models.includes(m);
            return (
              <button
                key={m}
                type="button"
                aria-pressed={on}
                onClick={() => toggleModel(m)}
                className={`inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm ${on ? "border-ink/40 bg-ink/5 dark:border-white/40 dark:bg-white/10" : "border-ink/15 text-ink-faint dark:border-white/15"}`}
              >
                <span className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: on ? colourOf(m) : "transparent", border: `2px solid ${colourOf(m)}` }} />
                {m}
              </button>
            );
          })}
        </div>
      </fieldset>
      <label className="flex flex-col gap-1 text-xs text-ink-faint">
        Branch
        <select className={selectClass} value={selection.branch} onChange={(e) => onChange({ branch: e.target.value })}>
          {branches.map((b) => (
            <option key={b}>{b}</option>
          ))}
        </select>
      </label>
      {current.grids.length > 1 && (
        <label className="flex flex-col gap-1 text-xs text-ink-faint">
          Grid
          <select className={selectClass} value={selection.grid} onChange={(e) => onChange({ grid: e.target.value })}>
            {current.grids.map((g) => (
              <option key={g}>{g}</option>
            ))}
          </select>
        </label>
      )}
      <label className="flex flex-col gap-1 text-xs text-ink-faint">
        Builds shown
        <select className={selectClass} value={selection.last} onChange={(e) => onChange({ last: Number(e.target.value) })}>
          {LAST_CHOICES.map((n) => (
            <option key={n} value={n}>
              last {n}
            </option>
          ))}
        </select>
      </label>
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 text-xs text-ink-faint">x axis</legend>
        <div className="inline-flex overflow-hidden rounded border border-ink/20 text-sm dark:border-white/20">
          {(["order", "time"] as const).map((x) => (
            <button key={x} type="button" aria-pressed={selection.x === x} onClick={() => onChange({ x })} className={`px-2.5 py-1 ${selection.x === x ? "bg-tide-700 text-white" : ""}`}>
              {x === "order" ? "build order" : "received time"}
            </button>
          ))}
        </div>
      </fieldset>
    </div>
  );
}
