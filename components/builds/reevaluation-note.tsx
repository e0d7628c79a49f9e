"use client";

import { useQuery } from "@apollo/client/react";
import { ReevaluationOutcome } from "@/components/band-editor/reevaluation-outcome";
import { BUILD_REEVALUATIONS } from "@/graphql/operations/library-edit";

/**
 * Shown in the build header once the build has been re-judged after a band
 * change: the newest re-judgement beside the verdict the build was judged with
 * (which stays as it was), and how many earlier ones there are.
 */
export function ReevaluationNote({ buildId }: { buildId: string }) {
  const { data } = useQuery(BUILD_REEVALUATIONS, { variables: { id: buildId } });
  const list = data?.build?.reevaluations ?? [];
  if (list.length === 0) return null;
  const [latest, ...older] = list;
  return (
    <div className="mt-3 border-t border-ink/10 pt-2 dark:border-white/10" data-testid="reevaluation-note">
      <ReevaluationOutcome r={latest} limit={6} title={<span className="text-xs font-semibold uppercase tracking-wide text-ink-faint">Re-judged against newer bands</span>} />
      {older.length > 0 && (
        <p className="mt-1 text-xs text-ink-faint">
          {older.length} earlier re-judgement{older.length === 1 ? "" : "s"}: {older.map((r) => r.verdict).join(", ")}.
        </p>
      )}
    </div>
  );
}
