"use client";

import { useQuery } from "@apollo/client/react";
import { useMemo } from "react";
import { useQueryParams } from "@/components/data-table/use-query-params";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { BUILD_MATRIX } from "@/graphql/operations/builds";
import { layoutMatrix, type MatrixLayout } from "./matrix-layout";
import { VERDICT_MARKS, VERDICT_TEXT } from "./run-counts";
import { VerdictCell } from "./verdict-cell";

const LEGEND = ["within", "marginal", "outside", "unbanded", "missing"] as const;

function MatrixLegend({ counts }: { counts: MatrixLayout["counts"] }) {
  return (
    <ul className="flex flex-wrap items-center gap-x-4 gap-y-1 text-xs" aria-label="Runs per verdict">
      {LEGEND.map((v) => (
        <li key={v} className={`${VERDICT_TEXT[v]} ${counts[v] === 0 ? "opacity-50" : ""}`}>
          <span aria-hidden>{VERDICT_MARKS[v]}</span> {v} <strong className="tabular-nums">{counts[v]}</strong>
        </li>
      ))}
      <li className={`text-ink-soft dark:text-white/60 ${counts.noRun === 0 ? "opacity-50" : ""}`}>
        <span aria-hidden className="inline-block h-2.5 w-3.5 rounded-sm border border-dashed border-current align-middle" /> no run{" "}
        <strong className="tabular-nums">{counts.noRun}</strong>
      </li>
    </ul>
  );
}

/** The build's runs as cases × turbulence models; a selected cell is ?run=ID in the URL. */
export function VerdictMatrix({ buildId }: { buildId: string }) {
  const { params, update } = useQueryParams();
  const selected = params.get("run");
  const { data, loading, error } = useQuery(BUILD_MATRIX, { variables: { id: buildId } });
  const layout = useMemo(() => (data?.build ? layoutMatrix({ runs: data.build.runs, cases: data.cases, models: data.models }) : null), [data]);

  let body;
  if (error) body = <ErrorNotice title="Could not load the runs of this build" error={error} />;
  else if (loading && !layout) body = <LoadingBlock label="Loading the runs" rows={6} />;
  else if (!layout || layout.cases.length === 0) body = <EmptyState title="This build has no runs">CI posted the build without any case results.</EmptyState>;
  else
    body = (
      <div className="overflow-x-auto">
        <table className="w-full border-separate border-spacing-1 text-sm" data-testid="verdict-matrix">
          <thead>
            <tr>
              <th scope="col" className="px-2 text-left text-xs font-medium text-ink-faint">
                Case \ model
              </th>
              {layout.models.map((m) => (
                <th key={m.key} scope="col" className="px-1 text-center text-xs font-medium whitespace-nowrap text-ink-soft dark:text-white/70">
                  {m.name}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {layout.cases.map((c) => (
              <tr key={c.key}>
                <th scope="row" className="max-w-72 px-2 text-left align-middle font-normal">
                  <div className="font-mono text-xs font-semibold">{c.key}</div>
                  <div className="truncate text-[11px] text-ink-faint" title={c.title}>
                    {c.title}
                  </div>
                </th>
                {c.cells.map((cell, i) => (
                  <td key={layout.models[i].key} className="min-w-24 align-middle">
                    {cell.kind === "runs" ? (
                      <div className="flex gap-1">
                        {cell.runs.map((r) => (
                          <VerdictCell key={r.id} run={r} selected={selected === r.id} showGrid={cell.runs.length > 1 || r.grid !== "default"} onSelect={() => update({ run: selected === r.id ? null : r.id })} />
                        ))}
                      </div>
                    ) : cell.kind === "no-run" ? (
                      <div title={`The case lists ${layout.models[i].name}, but this build has no run for it`} className="flex min-h-10 items-center justify-center rounded border border-dashed border-ink/30 text-xs text-ink-faint dark:border-white/30">
                        no run
                      </div>
                    ) : (
                      <div title={`${layout.models[i].name} is not part of this case`} className="min-h-10 rounded bg-ink/[0.03] dark:bg-white/[0.03]" />
                    )}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    );
  return (
    <Panel title="Cases × models" subtitle="Each cell is one run, marked by its worst quantity. Select a cell to see its quantities." actions={layout && <MatrixLegend counts={layout.counts} />}>
      {body}
    </Panel>
  );
}
