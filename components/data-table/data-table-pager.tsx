"use client";

const buttonClass =
  "rounded border border-ink/15 px-2.5 py-1 text-sm disabled:cursor-not-allowed disabled:opacity-40 hover:enabled:bg-ink/5 dark:border-white/20 dark:hover:enabled:bg-white/10";

/** Page controls for server-side paging: "rows a–b of N", page size, previous/next. */
export function DataTablePager({
  pageIndex,
  pageSize,
  total,
  pageSizes,
  onPageChange,
  onPageSizeChange,
}: {
  pageIndex: number;
  pageSize: number;
  total: number;
  pageSizes: readonly number[];
  onPageChange: (pageIndex: number) => void;
  onPageSizeChange: (size: number) => void;
}) {
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : pageIndex * pageSize + 1;
  const last = Math.min(total, (pageIndex + 1) * pageSize);
  return (
    <div className="mt-3 flex flex-wrap items-center gap-3 text-sm text-ink-soft dark:text-white/70">
      <span className="tabular-nums" aria-live="polite">
        Rows {first}–{last} of {total}
      </span>
      <label className="flex items-center gap-1.5">
        Rows per page
        <select
          value={pageSize}
          onChange={(e) => onPageSizeChange(Number(e.target.value))}
          className="rounded border border-ink/15 bg-paper-raised px-1.5 py-0.5 dark:border-white/20 dark:bg-[#0f171e]"
        >
          {pageSizes.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
        </select>
      </label>
      <div className="ml-auto flex items-center gap-2">
        <button type="button" className={buttonClass} disabled={pageIndex === 0} onClick={() => onPageChange(0)} aria-label="First page">
          «
        </button>
        <button type="button" className={buttonClass} disabled={pageIndex === 0} onClick={() => onPageChange(pageIndex - 1)}>
          Previous
        </button>
        <span className="tabular-nums">
          Page {Math.min(pageIndex + 1, pageCount)} of {pageCount}
        </span>
        <button type="button" className={buttonClass} disabled={pageIndex + 1 >= pageCount} onClick={() => onPageChange(pageIndex + 1)}>
          Next
        </button>
        <button type="button" className={buttonClass} disabled={pageIndex + 1 >= pageCount} onClick={() => onPageChange(pageCount - 1)} aria-label="Last page">
          »
        </button>
      </div>
    </div>
  );
}
