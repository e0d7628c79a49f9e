import { ChangeLines } from "@/components/band-editor/change-lines";
import type { BandRecord } from "@/graphql/operations/cases";
import { BAND_FIELDS, diffFields } from "@/lib/format/field-changes";
import { formatDate } from "./band-entry";
import { formatLimit } from "./case-text";
import { formatSig } from "@/lib/format/numbers";

/** Every version of the bands of one quantity whose scope (model or all models) has more than one, with what each changed. */
export function BandHistory({ records, unit }: { records: readonly BandRecord[]; unit?: string }) {
  const scopes = new Map<string, BandRecord[]>();
  for (const r of records) {
    const key = r.model ?? "";
    scopes.set(key, [...(scopes.get(key) ?? []), r]);
  }
  const revised = [...scopes.entries()].filter(([, list]) => list.length > 1);
  if (revised.length === 0) return null;
  return (
    <div className="mt-3">
      <h4 className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Band history</h4>
      {revised.map(([scope, list]) => (
        <table key={scope} className="mt-1 w-full text-sm">
          <caption className="text-left text-xs text-ink-faint">{scope === "" ? "all models" : scope}</caption>
          <thead className="text-left text-xs text-ink-faint">
            <tr>
              <th className="py-1 pr-3 font-medium">Version</th>
              <th className="py-1 pr-3 font-medium">In force</th>
              <th className="py-1 pr-3 font-medium">Reference</th>
              <th className="py-1 pr-3 font-medium">Limits</th>
              <th className="py-1 pr-3 font-medium">Changed from the version before</th>
              <th className="py-1 pr-3 font-medium">By</th>
              <th className="py-1 font-medium">Reason</th>
            </tr>
          </thead>
          <tbody>
            {[...list].reverse().map((r, i, newestFirst) => (
              <tr key={r.id} className="border-t border-ink/5 align-top dark:border-white/10">
                <td className="py-1 pr-3">v{r.version}</td>
                <td className="py-1 pr-3 whitespace-nowrap">
                  {formatDate(r.validFrom)} – {r.supersededAt ? formatDate(r.supersededAt) : "now"}
                </td>
                <td className="py-1 pr-3 font-mono tabular-nums">{formatSig(r.reference, 4)}</td>
                <td className="py-1 pr-3 font-mono tabular-nums whitespace-nowrap">
                  {formatLimit(r.lower, "lower")} … {formatLimit(r.upper, "upper")}
                </td>
                <td className="py-1 pr-3">
                  {i === newestFirst.length - 1 ? <span className="text-xs text-ink-faint">first version</span> : <ChangeLines changes={diffFields(newestFirst[i + 1], r, BAND_FIELDS)} unit={unit} />}
                </td>
                <td className="py-1 pr-3">{r.author}</td>
                <td className="py-1 text-ink-soft dark:text-white/70">{r.reason}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ))}
    </div>
  );
}
