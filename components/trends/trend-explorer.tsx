"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useCallback, useEffect, useMemo } from "react";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock, Skeleton } from "@/components/ui/states";
import { TREND_CHART, TREND_PICKERS } from "@/graphql/operations/trends";
import { TrendChart } from "./trend-chart";
import { TrendLegend } from "./trend-legend";
import { TrendPickers } from "./trend-pickers";
import { resolveSelection, selectionQuery, type TrendSelection } from "./trend-selection";
import { TrendSummary } from "./trend-summary";
import { MODEL_COLOURS, TREND_COLOUR_VARS } from "./trend-theme";

export function TrendExplorer() {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const pickers = useQuery(TREND_PICKERS);
  const cases = pickers.data?.cases;
  const branches = pickers.data?.branches;
  const selection = useMemo(() => (cases && branches ? resolveSelection(new URLSearchParams(params.toString()), cases, branches) : null), [params, cases, branches]);

  // Write the resolved defaults into the address, so what is shown can be shared as it is.
  useEffect(() => {
    if (!selection) return;
    const wanted = selectionQuery(selection);
    if (wanted !== params.toString()) router.replace(`${pathname}?${wanted}`, { scroll: false });
  }, [selection, params, pathname, router]);

  const change = useCallback(
    (next: Partial<TrendSelection>) => {
      if (!selection) return;
      const merged = { ...selection, ...next };
      // Resolving the merged choice fills what a case change left empty (quantity, models).
      const resolved = cases && branches ? resolveSelection(new URLSearchParams(selectionQuery(merged)), cases, branches) : merged;
      router.replace(`${pathname}?${selectionQuery(resolved ?? merged)}`, { scroll: false });
    },
    [selection, cases, branches, pathname, router],
  );

  const caseModels = cases?.find((c) => c.key === selection?.caseKey)?.models ?? [];
  const colourOf = useCallback((m: string) => MODEL_COLOURS[Math.max(0, caseModels.indexOf(m)) % MODEL_COLOURS.length], [caseModels]);

  if (pickers.error) return <ErrorNotice title="Could not load the cases and branches" error={pickers.error} />;
  if (!pickers.data) return <TrendSkeleton />;
  if (!selection) return <EmptyState title="Nothing to plot yet">No cases or no builds are stored. Post results with the curl line in the README.</EmptyState>;

  return (
    <div className={`space-y-5 ${TREND_COLOUR_VARS}`}>
      <Panel>
        <TrendPickers cases={cases!} branches={branches!} selection={selection} colourOf={colourOf} onChange={change} />
      </Panel>
      <TrendView selection={selection} colourOf={colourOf} />
    </div>
  );
}

function TrendView({ selection, colourOf }: { selection: TrendSelection; colourOf: (m: string) => string }) {
  const { data, loading, error } = useQuery(TREND_CHART, {
    variables: { case: selection.caseKey, quantity: selection.quantity, models: selection.models, branch: selection.branch, grid: selection.grid, last: selection.last },
  });
  const chart = data?.trendChart;
  const title = chart ? `${chart.definition?.label ?? chart.quantity} — ${selection.caseKey}, ${selection.branch}` : "Trend";
  const empty = chart && chart.builds.length === 0;
  const baselineShown = chart?.baseline && chart.builds.some((b) => b.id === chart.baseline!.id);
  return (
    <Panel
      title={title}
      subtitle={chart?.definition ? chart.definition.meaning : undefined}
      actions={
        <Link className="text-xs text-tide-700 underline dark:text-tide-300" href={`/cases/${selection.caseKey}#q-${selection.quantity}`}>
          bands and their sources
        </Link>
      }
    >
      {error ? (
        <ErrorNotice title="Could not load the trend" error={error} />
      ) : loading && !chart ? (
        <Skeleton className="h-[440px] w-full" />
      ) : !chart || empty ? (
        <EmptyState title="No values for this choice">
          No build on {selection.branch} has a value of {selection.quantity} for {selection.models.join(", ")} on grid {selection.grid}.
        </EmptyState>
      ) : (
        <div className="space-y-4">
          <TrendChart chart={chart} mode={selection.x} colourOf={colourOf} />
          <TrendLegend models={selection.models} colourOf={colourOf} />
          <p className="text-xs text-ink-faint">
            {chart.builds.length} builds of {chart.branch}, oldest left; each point is judged against the band version in force when its build was evaluated.{" "}
            {chart.baseline
              ? baselineShown
                ? `Baseline: ${chart.baseline.version}.`
                : `The baseline ${chart.baseline.version} is older than the builds shown.`
              : "No build of this branch is approved yet, so there is no baseline."}{" "}
            Click a point to open its build.
          </p>
          <TrendSummary chart={chart} colourOf={colourOf} />
        </div>
      )}
    </Panel>
  );
}

export function TrendSkeleton() {
  return (
    <div className="space-y-5" role="status" aria-label="Loading the trend">
      <Panel>
        <LoadingBlock rows={2} />
      </Panel>
      <Panel>
        <Skeleton className="h-[440px] w-full" />
      </Panel>
    </div>
  );
}
