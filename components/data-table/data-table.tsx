"use client";

import { flexRender, type Header, type Table } from "@tanstack/react-table";
import type { MouseEvent } from "react";
import { Skeleton } from "@/components/ui/states";

function SortMark({ state }: { state: false | "asc" | "desc" }) {
  // Arrow shape tells the direction; the faint pair says "sortable, not sorted".
  if (state === "asc") return <span aria-hidden>▲</span>;
  if (state === "desc") return <span aria-hidden>▼</span>;
  return (
    <span aria-hidden className="opacity-30">
      ⇅
    </span>
  );
}

function HeaderCell<T>({ header }: { header: Header<T, unknown> }) {
  const column = header.column;
  const meta = column.columnDef.meta as { align?: "right" } | undefined;
  const sorted = column.getIsSorted();
  const content = header.isPlaceholder ? null : flexRender(column.columnDef.header, header.getContext());
  return (
    <th
      scope="col"
      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
      className={`px-3 py-2 font-medium whitespace-nowrap ${meta?.align === "right" ? "text-right" : "text-left"}`}
    >
      {column.getCanSort() ? (
        <button type="button" onClick={column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase tracking-wide hover:text-ink dark:hover:text-white">
          {content}
          <SortMark state={sorted} />
        </button>
      ) : (
        content
      )}
    </th>
  );
}

/**
 * A TanStack table rendered as a plain HTML table. Paging, sorting and filtering
 * belong to the caller (server-side); this only draws. A row click calls
 * `onRowClick` unless the click landed on a link or button inside the row.
 */
export function DataTable<T>({
  table,
  loading = false,
  skeletonRows = 10,
  onRowClick,
  rowLabel,
}: {
  table: Table<T>;
  loading?: boolean;
  skeletonRows?: number;
  onRowClick?: (row: T) => void;
  rowLabel?: (row: T) => string;
}) {
  const rows = table.getRowModel().rows;
  const columnCount = table.getVisibleLeafColumns().length;
  const clickRow = (row: T) => (e: MouseEvent) => {
    if ((e.target as HTMLElement).closest("a,button,input,select")) return;
    onRowClick?.(row);
  };
  return (
    <div className="overflow-x-auto rounded-lg border border-ink/10 bg-paper-raised dark:border-white/10 dark:bg-white/5">
      <table className="w-full text-sm" aria-busy={loading}>
        <thead className="bg-paper-sunk/60 text-xs uppercase tracking-wide text-ink-faint dark:bg-white/5 dark:text-white/50">
          {table.getHeaderGroups().map((g) => (
            <tr key={g.id}>
              {g.headers.map((h) => (
                <HeaderCell key={h.id} header={h} />
              ))}
            </tr>
          ))}
        </thead>
        <tbody className={loading && rows.length > 0 ? "opacity-60" : undefined}>
          {loading && rows.length === 0
            ? Array.from({ length: skeletonRows }, (_, i) => (
                <tr key={i} className="border-t border-ink/5 dark:border-white/5">
                  <td colSpan={columnCount} className="px-3 py-2.5">
                    <Skeleton className="h-4 w-full" />
                  </td>
                </tr>
              ))
            : rows.map((row) => (
                <tr
                  key={row.id}
                  onClick={onRowClick ? clickRow(row.original) : undefined}
                  aria-label={rowLabel?.(row.original)}
                  className={`border-t border-ink/5 dark:border-white/5 ${onRowClick ? "cursor-pointer hover:bg-tide-50 dark:hover:bg-white/10" : ""}`}
                >
                  {row.getVisibleCells().map((cell) => {
                    const meta = cell.column.columnDef.meta as { align?: "right" } | undefined;
                    return (
                      <td key={cell.id} className={`px-3 py-2 ${meta?.align === "right" ? "text-right" : ""}`}>
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    );
                  })}
                </tr>
              ))}
        </tbody>
      </table>
    </div>
  );
}
