"use client";

import { useQuery } from "@apollo/client/react";
import { COMPARE_CANDIDATES, type BuildBrief } from "@/graphql/operations/build-comparison";

/**
 * Chooses the build to compare with: the branch baseline (default, empty value) or
 * any of the newest builds, grouped by branch with this build's branch first.
 */
export function ComparePicker({
  build,
  baseline,
  againstId,
  onChange,
}: {
  build: BuildBrief;
  baseline: BuildBrief | null;
  againstId: string | null;
  onChange: (id: string | null) => void;
}) {
  const { data } = useQuery(COMPARE_CANDIDATES, { variables: { first: 200 } });
  const candidates = (data?.buildTable.items ?? []).filter((b) => b.id !== build.id);
  const branches = [...new Set([build.branch, ...candidates.map((b) => b.branch)])];
  // A chosen build older than the newest 200 is still offered, so the URL stays honest.
  const chosenMissing = againstId && !candidates.some((b) => b.id === againstId);
  return (
    <label className="flex items-center gap-2 text-sm">
      <span className="text-ink-soft dark:text-white/70">Compare with</span>
      <select
        value={againstId ?? ""}
        onChange={(e) => onChange(e.target.value || null)}
        className="max-w-[26rem] rounded border border-ink/15 bg-paper-raised px-2 py-1 text-sm dark:border-white/20 dark:bg-[#0f171e]"
      >
        <option value="">{baseline ? `branch baseline: ${label(baseline)}` : "branch baseline (none yet)"}</option>
        {chosenMissing && <option value={againstId}>build {againstId}</option>}
        {branches.map((branch) => (
          <optgroup key={branch} label={branch}>
            {candidates
              .filter((b) => b.branch === branch)
              .map((b) => (
                <option key={b.id} value={b.id}>
                  {label(b)} · {b.verdict}
                  {b.gate !== "pending" ? ` · ${b.gate}` : ""}
                </option>
              ))}
          </optgroup>
        ))}
      </select>
    </label>
  );
}

function label(b: BuildBrief): string {
  return `${b.version} (${b.commit.slice(0, 8)}, ${b.receivedAt.slice(0, 10)})`;
}
