import Link from "next/link";
import { formatUtc } from "@/components/builds/format-time";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { CandidateInfo } from "@/graphql/operations/library-edit";
import { formatSig, withUnit } from "@/lib/format/numbers";

const judgedText = (j: CandidateInfo["judgedAgainst"][number]) => (j.version === null ? "no band" : `v${j.version} ${j.model ?? "all models"}`);

/** Recent builds of the case with the band version each was judged against; the checkboxes choose what to re-judge. */
/** One stored value with its unit, or how many there are (a case-wide band covers several models and grids). */
function describeValues(values: (number | null)[], unit: string): string {
  if (values.length === 0) return "—";
  if (values.length > 1) return `${values.length} values`;
  return values[0] === null ? "none" : withUnit(formatSig(values[0], 5), unit);
}

export function CandidateTable({ candidates, selected, onToggle, unit }: { candidates: CandidateInfo[]; selected: ReadonlySet<string>; onToggle: (id: string) => void; unit: string }) {
  return (
    <div className="max-h-[26rem] overflow-auto rounded border border-ink/10 dark:border-white/10">
      <table className="w-full text-sm">
        <thead className="sticky top-0 bg-paper-raised text-left text-xs text-ink-faint dark:bg-[#17222b]">
          <tr>
            <th className="w-8 py-1.5 pl-2">
              <span className="sr-only">Re-judge</span>
            </th>
            <th className="py-1.5 pr-3 font-medium">Build</th>
            <th className="py-1.5 pr-3 font-medium">Branch</th>
            <th className="py-1.5 pr-3 font-medium">Received</th>
            <th className="py-1.5 pr-3 font-medium">Judged against</th>
            <th className="py-1.5 pr-3 text-right font-medium">Stored value</th>
            <th className="py-1.5 pr-3 font-medium" title="Worst verdict of this quantity's values in the build: as judged, and against the band in force now">This quantity: judged → now</th>
            <th className="py-1.5 pr-3 font-medium">Build as judged</th>
            <th className="py-1.5 pr-2 font-medium">Last re-judged</th>
          </tr>
        </thead>
        <tbody>
          {candidates.map((c) => {
            const id = c.build.id;
            return (
              <tr key={id} className={`border-t border-ink/5 dark:border-white/10 ${c.stale ? "bg-verdict-marginal/5" : ""}`} data-candidate={id}>
                <td className="py-1.5 pl-2">
                  <input type="checkbox" aria-label={`Re-judge build ${c.build.version}`} checked={selected.has(id)} onChange={() => onToggle(id)} />
                </td>
                <td className="py-1.5 pr-3">
                  <Link href={`/builds/${id}`} className="text-tide-700 hover:underline dark:text-tide-300">
                    {c.build.version}
                  </Link>{" "}
                  <span className="font-mono text-xs text-ink-faint">{c.build.commit.slice(0, 8)}</span>
                </td>
                <td className="py-1.5 pr-3 font-mono text-xs">{c.build.branch}</td>
                <td className="py-1.5 pr-3 text-xs whitespace-nowrap">{formatUtc(c.build.receivedAt)}</td>
                <td className="py-1.5 pr-3 text-xs">
                  {c.judgedAgainst.length === 0 ? (
                    <span className="text-ink-faint">no run in this scope</span>
                  ) : (
                    <>
                      {c.judgedAgainst.map(judgedText).join(", ")}
                      {c.superseded && <span className="ml-1 text-verdict-marginal">(not the version in force)</span>}
                    </>
                  )}
                </td>
                <td className="py-1.5 pr-3 text-right font-mono text-xs tabular-nums">{describeValues(c.values, unit)}</td>
                <td className="py-1.5 pr-3 whitespace-nowrap">
                  {c.verdictAsJudged && c.verdictNow ? (
                    <span className={`inline-flex items-center gap-1 ${c.verdictAsJudged !== c.verdictNow ? "rounded ring-1 ring-verdict-marginal/60" : ""}`}>
                      <VerdictBadge verdict={c.verdictAsJudged} />
                      <span aria-label={c.verdictAsJudged === c.verdictNow ? "unchanged" : "would become"}>→</span>
                      <VerdictBadge verdict={c.verdictNow} />
                    </span>
                  ) : (
                    <span className="text-xs text-ink-faint">—</span>
                  )}
                </td>
                <td className="py-1.5 pr-3">
                  <VerdictBadge verdict={c.build.verdict} />
                </td>
                <td className="py-1.5 pr-2 text-xs">
                  {c.latestReevaluation ? (
                    <span className="inline-flex items-center gap-1">
                      <VerdictBadge verdict={c.latestReevaluation.verdict} />
                      <span className="text-ink-faint">{formatUtc(c.latestReevaluation.evaluatedAt)}</span>
                    </span>
                  ) : (
                    <span className="text-ink-faint">never</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
