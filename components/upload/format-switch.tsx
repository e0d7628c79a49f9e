"use client";

import type { UploadKind } from "@/lib/validation/upload";

const OPTIONS: { kind: UploadKind; title: string; text: string }[] = [
  { kind: "json", title: "Results file (JSON)", text: "A whole submission, build and runs, exactly as CI posts it; the request body with query and variables works too." },
  { kind: "csv", title: "One series (CSV)", text: "Two columns with a header row, e.g. y+,u+. You name the build and the run it belongs to below." },
];

/** Chooses what kind of file the page expects; the choice lives in the URL. */
export function FormatSwitch({ value, onChange }: { value: UploadKind; onChange: (kind: UploadKind) => void }) {
  return (
    <fieldset className="grid gap-2 sm:grid-cols-2">
      <legend className="sr-only">File format</legend>
      {OPTIONS.map((o) => {
        const active = o.kind === value;
        return (
          <label
            key={o.kind}
            className={`flex cursor-pointer gap-2 rounded-md border p-3 text-sm transition-colors ${
              active ? "border-tide-500 bg-tide-50 ring-1 ring-tide-500 dark:bg-tide-900/40" : "border-ink/15 hover:border-ink/30 dark:border-white/15 dark:hover:border-white/30"
            }`}
          >
            <input type="radio" name="upload-format" value={o.kind} checked={active} onChange={() => onChange(o.kind)} className="mt-0.5 accent-tide-700" />
            <span>
              <span className="block font-medium">{o.title}</span>
              <span className="mt-0.5 block text-xs text-ink-soft dark:text-white/60">{o.text}</span>
            </span>
          </label>
        );
      })}
    </fieldset>
  );
}
