import { gql, type TypedDocumentNode } from "@apollo/client";
import type { QuantityRow } from "@/components/quantities/types";
import type { Verdict } from "@/lib/analysis";

// Client documents of the builds table and the build page, with their result types.

export type GateState = "pending" | "approved" | "held" | "rejected";
export type RunStatus = "COMPLETED" | "DIVERGED" | "CRASHED" | "TIMEOUT";
export type VerdictCounts = Record<Verdict, number>;

export interface BuildTableRow {
  id: string;
  solver: string;
  version: string;
  commit: string;
  branch: string;
  pipelineUrl: string | null;
  receivedAt: string;
  verdict: Verdict;
  gate: GateState;
  runCounts: VerdictCounts;
}

export interface BuildTableVars {
  filter: { branch?: string; verdict?: Verdict; version?: string; commitPrefix?: string; fromDate?: string; toDate?: string };
  sort: { column: "received" | "version" | "branch" | "verdict"; direction: "asc" | "desc" };
  first: number;
  offset: number;
}

export const BUILD_TABLE: TypedDocumentNode<{ buildTable: { totalCount: number; items: BuildTableRow[] } }, BuildTableVars> = gql`
  query BuildTable($filter: BuildTableFilter, $sort: BuildTableSort, $first: Int, $offset: Int) {
    buildTable(filter: $filter, sort: $sort, first: $first, offset: $offset) {
      totalCount
      items {
        id
        solver
        version
        commit
        branch
        pipelineUrl
        receivedAt
        verdict
        gate
        runCounts { within marginal outside unbanded missing }
      }
    }
  }
`;

export const BRANCH_LIST: TypedDocumentNode<{ branches: string[] }, Record<string, never>> = gql`
  query BranchList {
    branches
  }
`;

export interface MatrixRun {
  id: string;
  case: string;
  model: string;
  grid: string;
  status: RunStatus;
  verdict: Verdict;
}

export const BUILD_MATRIX: TypedDocumentNode<
  {
    build: { id: string; runs: MatrixRun[] } | null;
    cases: { key: string; title: string; models: string[] }[];
    models: { key: string; name: string; family: string }[];
  },
  { id: string }
> = gql`
  query BuildMatrix($id: ID!) {
    build(id: $id) {
      id
      runs { id case model grid status verdict }
    }
    cases { key title models }
    models { key name family }
  }
`;

export interface RunQuantities {
  id: string;
  buildId: string;
  case: string;
  model: string;
  grid: string;
  status: RunStatus;
  iterations: number | null;
  verdict: Verdict;
  quantities: QuantityRow[];
}

export const RUN_QUANTITIES: TypedDocumentNode<{ run: RunQuantities | null }, { id: string }> = gql`
  query RunQuantities($id: ID!) {
    run(id: $id) {
      id
      buildId
      case
      model
      grid
      status
      iterations
      verdict
      quantities {
        key label unit value origin verdict reference source lower upper
        deviation deviationPct baselineValue baselineDelta drift driftReason
      }
    }
  }
`;
