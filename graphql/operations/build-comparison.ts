import { gql, type TypedDocumentNode } from "@apollo/client";
import type { Verdict } from "@/lib/analysis";
import type { BuildTableVars, GateState, RunStatus } from "./builds";

// Client documents of the build comparison (build page, "Against another build").

export interface BuildBrief {
  id: string;
  version: string;
  commit: string;
  branch: string;
  receivedAt: string;
  verdict: Verdict;
  gate: GateState;
}

export interface ComparedQuantityRow {
  key: string;
  label: string | null;
  unit: string | null;
  value: number | null;
  otherValue: number | null;
  difference: number | null;
  differencePct: number | null;
  verdict: Verdict | null;
  otherVerdict: Verdict | null;
  verdictChanged: boolean;
}

export interface ComparedRunRow {
  case: string;
  model: string;
  grid: string;
  runId: string | null;
  otherRunId: string | null;
  status: RunStatus | null;
  otherStatus: RunStatus | null;
  verdict: Verdict | null;
  otherVerdict: Verdict | null;
  verdictChanged: boolean;
  changedCoefficientCount: number;
  quantities: ComparedQuantityRow[];
  coefficients: { name: string; value: number | null; otherValue: number | null; changed: boolean }[];
}

export interface BuildComparisonResult {
  build: BuildBrief;
  against: BuildBrief | null;
  baseline: BuildBrief | null;
  againstIsBaseline: boolean;
  runs: ComparedRunRow[];
}

const BRIEF = /* GraphQL */ `id version commit branch receivedAt verdict gate`;

export const BUILD_COMPARISON: TypedDocumentNode<{ buildComparison: BuildComparisonResult }, { buildId: string; againstId: string | null }> = gql`
  query BuildComparison($buildId: ID!, $againstId: ID) {
    buildComparison(buildId: $buildId, againstId: $againstId) {
      build { ${BRIEF} }
      against { ${BRIEF} }
      baseline { ${BRIEF} }
      againstIsBaseline
      runs {
        case model grid runId otherRunId status otherStatus verdict otherVerdict verdictChanged changedCoefficientCount
        quantities { key label unit value otherValue difference differencePct verdict otherVerdict verdictChanged }
        coefficients { name value otherValue changed }
      }
    }
  }
`;

/** Candidates for "compare with": the newest builds, all branches. */
export const COMPARE_CANDIDATES: TypedDocumentNode<{ buildTable: { items: BuildBrief[] } }, { first: number; filter?: BuildTableVars["filter"] }> = gql`
  query CompareCandidates($first: Int, $filter: BuildTableFilter) {
    buildTable(first: $first, filter: $filter, sort: { column: received, direction: desc }) {
      items { ${BRIEF} }
    }
  }
`;
