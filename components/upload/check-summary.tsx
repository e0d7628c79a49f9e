import { formatSig } from "@/lib/format/numbers";
import type { UploadSeriesKey } from "@/lib/validation/upload";
import type { UploadCheck } from "./check-upload";
import { IssueList } from "./issue-list";
import { SeriesPreview } from "./series-preview";

/** What the browser found in the file before sending: the problems, or what will be submitted. */
export function CheckSummary({ check, seriesKey }: { check: UploadCheck; seriesKey: UploadSeriesKey | null }) {
  const preview = check.csv && seriesKey ? <SeriesPreview csv={check.csv} seriesKey={seriesKey} /> : null;
  if (check.issues.length > 0) {
    const n = check.issues.length;
    return (
      <div className="space-y-3">
        <IssueList issues={check.issues} title={`${n === 50 ? "50 or more" : n} problem${n === 1 ? "" : "s"} to fix before sending; nothing has been sent`} />
        {preview}
      </div>
    );
  }
  return (
    <div className="space-y-3 text-sm" data-testid="upload-ready">
      <p className="flex items-center gap-2 font-medium text-verdict-within">
        <span aria-hidden>●</span> Passes the CI-contract checks; ready to send.
      </p>
      {check.build && (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-xs">
          <dt className="text-ink-faint">Build</dt>
          <dd>
            {check.build.solver} {check.build.version} · <span className="font-mono">{check.build.commit.slice(0, 12)}</span> on <span className="font-mono">{check.build.branch}</span>
          </dd>
          {check.csv && (
            <>
              <dt className="text-ink-faint">Series</dt>
              <dd>
                {check.csv.x.length.toLocaleString("en-GB")} points; {check.csv.columns[0]} from {formatSig(check.csv.x[0])} to {formatSig(check.csv.x[check.csv.x.length - 1])}, {check.csv.columns[1]} from{" "}
                {formatSig(range(check.csv.y)[0])} to {formatSig(range(check.csv.y)[1])}
              </dd>
            </>
          )}
        </dl>
      )}
      <table className="w-full text-xs">
        <thead className="text-left uppercase tracking-wide text-ink-faint">
          <tr>
            <th className="py-1 pr-2">Case</th>
            <th className="py-1 pr-2">Model</th>
            <th className="py-1 pr-2">Grid</th>
            <th className="py-1 pr-2">Status</th>
            <th className="py-1">Series</th>
          </tr>
        </thead>
        <tbody>
          {check.runs.slice(0, 20).map((r) => (
            <tr key={`${r.case}|${r.model}|${r.grid}`} className="border-t border-ink/5 dark:border-white/5">
              <td className="py-1 pr-2 font-mono">{r.case}</td>
              <td className="py-1 pr-2 font-mono">{r.model}</td>
              <td className="py-1 pr-2 font-mono">{r.grid}</td>
              <td className="py-1 pr-2">{r.status.toLowerCase()}</td>
              <td className="py-1 font-mono">{r.seriesKeys.join(", ") || "—"}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {preview}
      {check.runs.length > 20 && <p className="text-xs text-ink-faint">and {check.runs.length - 20} more runs.</p>}
      <p className="text-xs text-ink-faint">The server also checks that each case and model exists in the library, then derives and judges every quantity.</p>
    </div>
  );
}

// Math.min(...a) overflows the call stack past ~10⁵ arguments; a loop does not.
function range(values: number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}
