import type { FieldIssue } from "@/lib/errors";

const SHOWN = 30;

/** Field-path issues as the schema (or the server) states them: path, then what is wrong. */
export function IssueList({ issues, title }: { issues: FieldIssue[]; title: string }) {
  if (issues.length === 0) return null;
  return (
    <div role="alert" className="rounded border border-verdict-outside/40 bg-verdict-outside/5 p-3 text-sm">
      <p className="font-medium text-verdict-outside">{title}</p>
      <ul className="mt-2 space-y-1" data-testid="upload-issues">
        {issues.slice(0, SHOWN).map((issue, i) => (
          <li key={`${issue.path}-${i}`} className="leading-snug">
            <code className="rounded bg-ink/5 px-1 font-mono text-xs dark:bg-white/10">{issue.path}</code> <span>{issue.message}</span>
          </li>
        ))}
      </ul>
      {issues.length > SHOWN && <p className="mt-2 text-xs text-ink-soft dark:text-white/60">and {issues.length - SHOWN} more.</p>}
    </div>
  );
}
