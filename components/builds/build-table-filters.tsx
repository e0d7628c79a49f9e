"use client";

import { useQuery } from "@apollo/client/react";
import { useEffect, useState } from "react";
import { BRANCH_LIST } from "@/graphql/operations/builds";
import type { BuildTableView } from "./build-table-url";

const inputClass =
  "rounded border border-ink/15 bg-paper-raised px-2 py-1 text-sm dark:border-white/20 dark:bg-[#0f171e] aria-[invalid=true]:border-verdict-outside";
const labelClass = "flex flex-col gap-0.5 text-xs text-ink-soft dark:text-white/60";

/** A text filter that reaches the URL 400 ms after typing stops (one request, not one per key). */
function useDebounced(value: string, commit: (v: string) => void, current: string) {
  useEffect(() => {
    if (value === current) return;
    const t = setTimeout(() => commit(value), 400);
    return () => clearTimeout(t);
  }, [value, current, commit]);
}

export function BuildTableFilters({ view, onChange }: { view: BuildTableView; onChange: (patch: Record<string, string | null>) => void }) {
  const branches = useQuery(BRANCH_LIST);
  const [version, setVersion] = useState(view.version);
  const [commit, setCommit] = useState(view.commit);
  // Follow the URL when it changes from outside (back button, "clear filters").
  useEffect(() => setVersion(view.version), [view.version]);
  useEffect(() => setCommit(view.commit), [view.commit]);
  const commitValid = /^[0-9a-fA-F]*$/.test(commit.trim());
  useDebounced(version, (v) => onChange({ version: v }), view.version);
  useDebounced(commitValid ? commit : view.commit, (v) => onChange({ commit: v }), view.commit);
  const active = Boolean(view.branch || view.verdict || view.version || view.commit || view.from || view.to);

  return (
    <form role="search" aria-label="Filter builds" className="mb-3 flex flex-wrap items-end gap-3" onSubmit={(e) => e.preventDefault()}>
      <label className={labelClass}>
        Branch
        <select className={inputClass} value={view.branch} onChange={(e) => onChange({ branch: e.target.value })}>
          <option value="">all branches</option>
          {(branches.data?.branches ?? (view.branch ? [view.branch] : [])).map((b) => (
            <option key={b} value={b}>
              {b}
            </option>
          ))}
        </select>
      </label>
      <label className={labelClass}>
        Verdict
        <select className={inputClass} value={view.verdict} onChange={(e) => onChange({ verdict: e.target.value })}>
          <option value="">any verdict</option>
          {["within", "marginal", "outside", "unbanded", "missing"].map((v) => (
            <option key={v} value={v}>
              {v}
            </option>
          ))}
        </select>
      </label>
      <label className={labelClass}>
        Version contains
        <input className={`${inputClass} w-36`} value={version} onChange={(e) => setVersion(e.target.value)} placeholder="e.g. rc" maxLength={100} />
      </label>
      <label className={labelClass}>
        Commit starts with
        <input
          className={`${inputClass} w-36 font-mono`}
          value={commit}
          onChange={(e) => setCommit(e.target.value)}
          placeholder="e.g. c5ee1f7"
          maxLength={40}
          spellCheck={false}
          aria-invalid={!commitValid}
          aria-describedby={commitValid ? undefined : "commit-hint"}
        />
        {!commitValid && (
          <span id="commit-hint" className="text-verdict-outside">
            hexadecimal digits only
          </span>
        )}
      </label>
      <label className={labelClass}>
        Received from (UTC)
        <input type="date" className={inputClass} value={view.from} max={view.to || undefined} onChange={(e) => onChange({ from: e.target.value })} />
      </label>
      <label className={labelClass}>
        to (UTC, inclusive)
        <input type="date" className={inputClass} value={view.to} min={view.from || undefined} onChange={(e) => onChange({ to: e.target.value })} />
      </label>
      {active && (
        <button
          type="button"
          className="mb-0.5 text-sm text-tide-700 underline dark:text-tide-300"
          onClick={() => onChange({ branch: null, verdict: null, version: null, commit: null, from: null, to: null })}
        >
          Clear filters
        </button>
      )}
    </form>
  );
}
