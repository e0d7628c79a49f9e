import type { Verdict } from "@/lib/analysis";

// The builds table's view in the query string, e.g.
//   /builds?branch=main&verdict=outside&version=dev&commit=c5e&from=2026-11-01&to=2026-11-30&sort=version.asc&page=2&size=50
// Pure, so the page (browser) and the CSV route (server) read a URL the same way.
// Values are passed on as typed; the server validates them and says what is wrong.

export const SORT_COLUMNS = ["received", "version", "branch", "verdict"] as const;
export type SortColumn = (typeof SORT_COLUMNS)[number];
export const PAGE_SIZES = [25, 50, 100, 200] as const;
const VERDICTS: readonly Verdict[] = ["within", "marginal", "outside", "unbanded", "missing"];
export const DEFAULT_SORT = { column: "received", direction: "desc" } as const satisfies BuildTableView["sort"];

export interface BuildTableView {
  branch: string;
  verdict: Verdict | "";
  version: string;
  commit: string;
  from: string;
  to: string;
  sort: { column: SortColumn; direction: "asc" | "desc" };
  page: number;
  size: number;
}

export const FILTER_KEYS = ["branch", "verdict", "version", "commit", "from", "to"] as const;

export function readBuildTableView(params: URLSearchParams): BuildTableView {
  const [column, direction] = (params.get("sort") ?? "").split(".");
  const sort =
    (SORT_COLUMNS as readonly string[]).includes(column) && (direction === "asc" || direction === "desc")
      ? { column: column as SortColumn, direction: direction as "asc" | "desc" }
      : DEFAULT_SORT;
  const verdict = params.get("verdict") ?? "";
  const size = Number(params.get("size"));
  const page = Number(params.get("page"));
  return {
    branch: params.get("branch") ?? "",
    verdict: (VERDICTS as readonly string[]).includes(verdict) ? (verdict as Verdict) : "",
    version: params.get("version") ?? "",
    commit: params.get("commit") ?? "",
    from: params.get("from") ?? "",
    to: params.get("to") ?? "",
    sort,
    page: Number.isInteger(page) && page >= 1 ? page : 1,
    size: (PAGE_SIZES as readonly number[]).includes(size) ? size : PAGE_SIZES[0],
  };
}

/** The filter and sort as GraphQL / service input (empty fields left out). */
export function toFilterAndSort(view: BuildTableView) {
  const filter: Record<string, string> = {};
  if (view.branch) filter.branch = view.branch;
  if (view.verdict) filter.verdict = view.verdict;
  if (view.version.trim()) filter.version = view.version.trim();
  if (view.commit.trim()) filter.commitPrefix = view.commit.trim();
  if (view.from) filter.fromDate = view.from;
  if (view.to) filter.toDate = view.to;
  return { filter, sort: view.sort };
}

/** Query string of the CSV export of a view: its filters and sort, no paging. */
export function toExportQuery(view: BuildTableView): string {
  const q = new URLSearchParams();
  for (const key of FILTER_KEYS) if (view[key]) q.set(key, view[key]);
  q.set("sort", `${view.sort.column}.${view.sort.direction}`);
  return q.toString();
}
