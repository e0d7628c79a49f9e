"use client";

import { useQuery } from "@apollo/client/react";
import { QuantityTable } from "@/components/quantities/quantity-table";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, Skeleton } from "@/components/ui/states";
import { RUN_PLOTS_QUERY } from "@/graphql/operations/run";
import { AnisotropyPanel } from "./anisotropy-panel";
import { DecayPanel } from "./decay-panel";
import { GridStudyPanel } from "./grid-study-panel";
import { MissingDataPanel } from "./missing-data-panel";
import { ResidualPanel } from "./residual-panel";
import { findSeries, type RunPlotsData } from "./run-data";
import { SkinFrictionPanel } from "./skin-friction-panel";
import { WallLawPanel } from "./wall-law-panel";

// A plot is drawn from at most this many samples per series (thinned on the server).
const MAX_PLOT_POINTS = 4000;

/** Every plot the run's data allow, then its quantity table. */
export function RunPlots({ runId, caseKey }: { runId: string; caseKey: string }) {
  const { data, loading, error } = useQuery<RunPlotsData>(RUN_PLOTS_QUERY, { variables: { runId, caseKey, maxPoints: MAX_PLOT_POINTS } });
  if (error) return <ErrorNotice title="Could not load this run's data" error={error} />;
  if (loading || !data) return <PlotsSkeleton />;
  const run = data.run;
  if (!run) return <EmptyState title="This run no longer exists">It may have been replaced by a later post of the same case, model and grid.</EmptyState>;
  const params = data.case?.parameters ?? {};
  const uPlus = findSeries(run, "u_plus");
  const decay = findSeries(run, "k_decay");
  const cf = findSeries(run, "cf");
  const residual = findSeries(run, "residual");
  const halfWidth = [
    decay && <DecayPanel run={run} series={decay} />,
    cf && <SkinFrictionPanel run={run} series={cf} caseParameters={params} />,
    residual && <ResidualPanel run={run} series={residual} caseParameters={params} />,
  ].filter(Boolean);
  const nothing = !uPlus && !decay && !cf && !residual && run.stresses.length === 0 && !run.gridStudy;

  return (
    <div className="space-y-4">
      <div className="grid gap-4 lg:grid-cols-2">
        {uPlus && <WallLawPanel run={run} series={uPlus} caseParameters={params} />}
        {halfWidth.map((panel, i) => (
          // An odd one out takes the whole row rather than leaving half of it empty.
          <div key={i} className={`min-w-0 ${i === halfWidth.length - 1 && halfWidth.length % 2 === 1 ? "lg:col-span-2" : ""}`}>
            {panel}
          </div>
        ))}
        {run.stresses.length > 0 && <AnisotropyPanel run={run} />}
        {run.gridStudy && <GridStudyPanel run={run} study={run.gridStudy} definitions={data.quantities} />}
        <MissingDataPanel run={run} />
      </div>
      {nothing && (
        <EmptyState title="Nothing to plot">
          This run posted no series, stress samples or grid study{run.status !== "COMPLETED" ? ` (it ended ${run.status.toLowerCase()})` : ""}; its quantities are listed below.
        </EmptyState>
      )}
      <Panel title="Quantities of this run" subtitle="each judged against the band in force when the build was evaluated">
        <QuantityTable quantities={run.quantities} sortByVerdict />
      </Panel>
    </div>
  );
}

function PlotsSkeleton() {
  return (
    <div role="status" aria-label="Loading the run's plots" className="grid gap-4 lg:grid-cols-2">
      <Skeleton className="h-96 w-full lg:col-span-2" />
      <Skeleton className="h-80 w-full" />
      <Skeleton className="h-80 w-full" />
    </div>
  );
}
