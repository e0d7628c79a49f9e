import type { ReactNode } from "react";
import { formatUtc } from "./format-time";

/** One labelled value of a build's header (a <dt>/<dd> pair inside the header's <dl>). */
export function HeaderField({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs text-ink-faint dark:text-white/50">{label}</dt>
      <dd className="mt-0.5 text-sm">{children}</dd>
    </div>
  );
}

/** Where a build came from: branch, commit, when it arrived and its CI pipeline (build page and gate review). */
export function BuildOriginFields({
  branch,
  branchNote,
  commit,
  receivedAt,
  pipelineUrl,
}: {
  branch: string;
  branchNote?: string;
  commit: string;
  receivedAt: string | Date;
  pipelineUrl: string | null;
}) {
  return (
    <>
      <HeaderField label="Branch">
        <span className="font-mono text-xs">{branch}</span>
        {branchNote && <span className="block text-xs text-ink-faint dark:text-white/50">{branchNote}</span>}
      </HeaderField>
      <HeaderField label="Commit">
        <span className="font-mono text-xs break-all select-all">{commit}</span>
      </HeaderField>
      <HeaderField label="Received">{formatUtc(receivedAt)}</HeaderField>
      <HeaderField label="CI pipeline">
        {pipelineUrl ? (
          <a href={pipelineUrl} target="_blank" rel="noreferrer" className="text-tide-700 hover:underline dark:text-tide-300">
            open pipeline ↗
          </a>
        ) : (
          <span className="text-ink-faint">not given (manual upload)</span>
        )}
      </HeaderField>
    </>
  );
}
