import { describeChange, type FieldChange } from "@/lib/format/field-changes";

// Changed fields as "upper limit 1.0978 → 1.095". Long texts (a source, a
// description) get a line each, old struck through, so both stay readable.

const LONG = 60;

export function ChangeLines({ changes, unit }: { changes: readonly FieldChange[]; unit?: string }) {
  if (changes.length === 0) return null;
  return (
    <ul className="space-y-0.5 text-sm" data-testid="change-lines">
      {changes.map((c) => {
        const d = describeChange(c);
        const numeric = typeof c.before === "number" || typeof c.after === "number";
        const suffix = numeric && unit && unit !== "1" && !c.field.startsWith("fitSettings") && !c.field.startsWith("parameters") ? ` ${unit}` : "";
        if (d.before.length + d.after.length > LONG) {
          return (
            <li key={c.field}>
              <span className="text-ink-faint">{d.label}</span>
              <del className="block text-ink-faint decoration-verdict-outside/60">{d.before}</del>
              <ins className="block no-underline">{d.after}</ins>
            </li>
          );
        }
        return (
          <li key={c.field}>
            <span className="text-ink-faint">{d.label}</span>{" "}
            <span className={numeric ? "font-mono tabular-nums" : ""}>
              {d.before}
              {suffix} → <strong className="font-semibold">{d.after}</strong>
              {suffix}
            </span>
          </li>
        );
      })}
    </ul>
  );
}
