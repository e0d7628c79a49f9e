"use client";

import { useQuery } from "@apollo/client/react";
import { getCoreRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { useRouter } from "next/navigation";
import { useCallback, useMemo } from "react";
import { DataTable } from "@/components/data-table/data-table";
import { DataTablePager } from "@/components/data-table/data-table-pager";
import { useQueryParams } from "@/components/data-table/use-query-params";
import { EmptyState, ErrorNotice } from "@/components/ui/states";
import { BUILD_TABLE } from "@/graphql/operations/builds";
import { buildColumns } from "./build-columns";
import { BuildTableFilters } from "./build-table-filters";
import { PAGE_SIZES, readBuildTableView, toExportQuery, toFilterAndSort, type SortColumn } from "./build-table-url";

/** Every build CI posted, paged, sorted and filtered by the server; the view lives in the URL. */
export function BuildTable() {
  const router = useRouter();
  const { params, update } = useQueryParams();
  const view = useMemo(() => readBuildTableView(params), [params]);
  const { filter, sort } = toFilterAndSort(view);
  const { data, previousData, loading, error } = useQuery(BUILD_TABLE, {
    variables: { filter, sort, first: view.size, offset: (view.page - 1) * view.size },
  });
  const page = (data ?? previousData)?.buildTable;

  // Any filter change starts again at page 1, or the view could land past its end.
  const changeFilter = useCallback((patch: Record<string, string | null>) => update({ ...patch, page: null }), [update]);
  const sorting: SortingState = [{ id: view.sort.column, desc: view.sort.direction === "desc" }];
  const table = useReactTable({
    data: page?.items ?? [],
    columns: buildColumns,
    getCoreRowModel: getCoreRowModel(),
    manualPagination: true,
    manualSorting: true,
    manualFiltering: true,
    rowCount: page?.totalCount ?? 0,
    state: { sorting, pagination: { pageIndex: view.page - 1, pageSize: view.size } },
    enableSortingRemoval: false,
    sortDescFirst: true,
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const s = next[0];
      update({ sort: s ? `${s.id as SortColumn}.${s.desc ? "desc" : "asc"}` : null, page: null });
    },
    getRowId: (row) => row.id,
  });

  return (
    <div>
      <BuildTableFilters view={view} onChange={changeFilter} />
      <div className="mb-2 flex items-center gap-3 text-sm">
        <a
          href={`/builds/export?${toExportQuery(view)}`}
          className="rounded border border-ink/15 px-2.5 py-1 hover:bg-ink/5 dark:border-white/20 dark:hover:bg-white/10"
          download
        >
          Download this view as CSV
        </a>
        <span className="text-xs text-ink-faint">all pages, same filters and order, up to 10 000 rows</span>
      </div>
      {error ? (
        <ErrorNotice title="Could not load the builds" error={error} action="Check the filters (dates as YYYY-MM-DD, commit as hex digits) or reload the page." />
      ) : !loading && page && page.totalCount === 0 ? (
        <EmptyState title="No build matches these filters">Widen the date range or clear a filter.</EmptyState>
      ) : (
        <>
          <DataTable
            table={table}
            loading={loading}
            skeletonRows={Math.min(view.size, 12)}
            onRowClick={(b) => router.push(`/builds/${b.id}`)}
            rowLabel={(b) => `${b.solver} ${b.version} on ${b.branch}, ${b.verdict}`}
          />
          <DataTablePager
            pageIndex={view.page - 1}
            pageSize={view.size}
            total={page?.totalCount ?? 0}
            pageSizes={PAGE_SIZES}
            onPageChange={(i) => update({ page: i === 0 ? null : i + 1 })}
            onPageSizeChange={(s) => update({ size: s === PAGE_SIZES[0] ? null : s, page: null })}
          />
        </>
      )}
    </div>
  );
}
