import { gql, type TypedDocumentNode } from "@apollo/client";
import type { Verdict } from "@/lib/analysis";

// Client documents of the trend screen: the pickers' choices and the chart itself.

export interface PickerCase {
  key: string;
  title: string;
  models: string[];
  grids: string[];
  quantities: { key: string; label: string; unit: string }[];
  bands: { quantity: string }[];
}

export const TREND_PICKERS: TypedDocumentNode<{ cases: PickerCase[]; branches: string[] }> = gql`
  query TrendPickers {
    cases {
      key
      title
      models
      grids
      quantities { key label unit }
      bands { quantity }
    }
    branches
  }
`;

export interface TrendPointData {
  buildId: string;
  runId: string;
  value: number | null;
  verdict: Verdict;
  drift: boolean;
  driftReason: "baseline" | "trend" | null;
  driftPValue: number | null;
  driftSlope: number | null;
  baselineValue: number | null;
  baselineDelta: number | null;
  bandId: string | null;
  bandVersion: number | null;
  bandKind: "verification" | "validation" | null;
  bandModel: string | null;
  reference: number | null;
  lower: number | null;
  upper: number | null;
  marginalMargin: number | null;
  noiseFloor: number | null;
}

export interface TrendBuild {
  id: string;
  version: string;
  commit: string;
  receivedAt: string;
  gate: "pending" | "approved" | "held" | "rejected";
}

export interface TrendChartData {
  case: string;
  quantity: string;
  branch: string;
  grid: string;
  last: number;
  definition: { key: string; label: string; unit: string; meaning: string } | null;
  builds: TrendBuild[];
  baseline: TrendBuild | null;
  series: { model: string; points: TrendPointData[] }[];
}

export interface TrendChartVars {
  case: string;
  quantity: string;
  models: string[];
  branch: string;
  grid: string;
  last: number;
}

export const TREND_CHART: TypedDocumentNode<{ trendChart: TrendChartData }, TrendChartVars> = gql`
  query TrendChart($case: String!, $quantity: String!, $models: [String!]!, $branch: String!, $grid: String, $last: Int) {
    trendChart(case: $case, quantity: $quantity, models: $models, branch: $branch, grid: $grid, last: $last) {
      case
      quantity
      branch
      grid
      last
      definition { key label unit meaning }
      builds { id version commit receivedAt gate }
      baseline { id version commit receivedAt gate }
      series {
        model
        points {
          buildId runId value verdict drift driftReason driftPValue driftSlope baselineValue baselineDelta
          bandId bandVersion bandKind bandModel reference lower upper marginalMargin noiseFloor
        }
      }
    }
  }
`;
