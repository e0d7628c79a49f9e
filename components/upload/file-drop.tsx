"use client";

import { useRef, useState, type DragEvent } from "react";
import type { UploadKind } from "@/lib/validation/upload";

const ACCEPT: Record<UploadKind, string> = { json: ".json,application/json", csv: ".csv,.tsv,.txt,.dat,text/csv,text/plain" };

/** A file input that also takes a dropped file; shows the chosen file's name and size. */
export function FileDrop({ kind, file, onFile }: { kind: UploadKind; file: File | null; onFile: (file: File | null) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    const dropped = e.dataTransfer.files?.[0];
    if (dropped) onFile(dropped);
  };
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={onDrop}
      className={`mt-3 flex flex-wrap items-center gap-3 rounded-md border border-dashed p-4 text-sm ${
        over ? "border-tide-500 bg-tide-50 dark:bg-tide-900/30" : "border-ink/25 dark:border-white/25"
      }`}
    >
      <button
        type="button"
        onClick={() => input.current?.click()}
        className="rounded border border-ink/20 bg-paper-raised px-3 py-1.5 font-medium hover:bg-paper-sunk dark:border-white/20 dark:bg-white/10 dark:hover:bg-white/15"
      >
        Choose {kind === "json" ? "a JSON file" : "a CSV file"}
      </button>
      <span className="text-ink-soft dark:text-white/60">or drop it here</span>
      {file && (
        <span className="ml-auto flex items-center gap-2 font-mono text-xs" data-testid="chosen-file">
          {file.name} · {formatBytes(file.size)}
          <button type="button" onClick={() => onFile(null)} className="rounded px-1 text-ink-faint hover:text-ink dark:hover:text-white" aria-label="Remove the file">
            ✕
          </button>
        </span>
      )}
      <input
        ref={input}
        type="file"
        accept={ACCEPT[kind]}
        className="sr-only"
        aria-label={kind === "json" ? "JSON results file" : "CSV series file"}
        onChange={(e) => {
          onFile(e.target.files?.[0] ?? null);
          e.target.value = "";
        }}
      />
    </div>
  );
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
