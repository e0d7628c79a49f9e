"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import type { BuildTableRow } from "@/graphql/operations/builds";
import { formatUtc } from "./format-time";
import { GateStateTag } from "./gate-state-tag";
import { RunCounts } from "./run-counts";

// Column ids equal the server's sort column names; only those four have an accessor
// (TanStack sorts only accessor columns), and the sorting itself happens on the server.
export const buildColumns: ColumnDef<BuildTableRow>[] = [
  {
    id: "received",
    accessorFn: (b) => b.receivedAt,
    header: "Received",
    cell: ({ row }) => <span className="whitespace-nowrap tabular-nums">{formatUtc(row.original.receivedAt)}</span>,
  },
  {
    id: "version",
    accessorFn: (b) => b.version,
    header: "Build",
    cell: ({ row }) => (
      <Link href={`/builds/${row.original.id}`} className="whitespace-nowrap font-medium text-tide-700 hover:underline dark:text-tide-300">
        {row.original.solver} {row.original.version}
      </Link>
    ),
  },
  { id: "branch", accessorFn: (b) => b.branch, header: "Branch", cell: ({ row }) => <span className="font-mono text-xs whitespace-nowrap">{row.original.branch}</span> },
  {
    id: "commit",
    header: "Commit",
    enableSorting: false,
    cell: ({ row }) => (
      <span className="font-mono text-xs" title={row.original.commit}>
        {row.original.commit.slice(0, 10)}
      </span>
    ),
  },
  { id: "verdict", accessorFn: (b) => b.verdict, header: "Verdict", cell: ({ row }) => <VerdictBadge verdict={row.original.verdict} /> },
  { id: "runs", header: "Runs by verdict", enableSorting: false, cell: ({ row }) => <RunCounts counts={row.original.runCounts} /> },
  { id: "gate", header: "Gate", enableSorting: false, cell: ({ row }) => <GateStateTag state={row.original.gate} /> },
  {
    id: "pipeline",
    header: "CI",
    enableSorting: false,
    cell: ({ row }) =>
      row.original.pipelineUrl ? (
        <a href={row.original.pipelineUrl} target="_blank" rel="noreferrer" className="text-xs text-tide-700 hover:underline dark:text-tide-300">
          pipeline ↗
        </a>
      ) : (
        <span className="text-xs text-ink-faint">—</span>
      ),
  },
];
