import { readBuildTableView, toFilterAndSort } from "@/components/builds/build-table-url";
import { getSessionActor } from "@/lib/auth/session";
import { AppError, HTTP_STATUS } from "@/lib/errors";
import { exportBuildTable } from "@/lib/services/builds-view";
import { toCsv } from "@/lib/services/builds-view-csv";

export const dynamic = "force-dynamic";

const HEADER = [
  "build_id", "received_utc", "solver", "version", "branch", "commit", "verdict", "gate",
  "runs_within", "runs_marginal", "runs_outside", "runs_unbanded", "runs_missing", "pipeline_url",
];

/**
 * The builds table's current view (same query string: filters and sort) as CSV,
 * every page up to EXPORT_ROW_CAP rows. The session is checked here, not only by
 * the proxy's redirect.
 */
export async function GET(request: Request) {
  const actor = await getSessionActor();
  if (!actor) return plain(401, "Sign in to export builds.");
  const view = readBuildTableView(new URL(request.url).searchParams);
  try {
    const { builds, total, truncated } = await exportBuildTable({ actor, unsafeInput: toFilterAndSort(view) });
    const rows = builds.map(({ build: b, gate, runCounts: c }) => [
      b.id, b.received_at.toISOString(), b.solver, b.version, b.branch, b.commit, b.verdict, gate,
      c.within, c.marginal, c.outside, c.unbanded, c.missing, b.pipeline_url,
    ]);
    const stamp = new Date().toISOString().slice(0, 16).replace(/[-:]/g, "").replace("T", "-");
    const scope = (view.branch || "all-branches").replace(/[^A-Za-z0-9._-]+/g, "-");
    return new Response(toCsv(HEADER, rows), {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="tauline-builds-${scope}-${stamp}.csv"`,
        "cache-control": "no-store",
        "x-total-rows": String(total),
        "x-truncated": String(truncated),
      },
    });
  } catch (error) {
    if (error instanceof AppError) return plain(HTTP_STATUS[error.code], error.message);
    throw error;
  }
}

function plain(status: number, text: string) {
  return new Response(`${text}\n`, { status, headers: { "content-type": "text/plain; charset=utf-8", "cache-control": "no-store" } });
}
