import { gql, type TypedDocumentNode } from "@apollo/client";
import type { Verdict } from "@/lib/analysis";

// Client documents of the morning view: one query per widget, so each widget
// shows its own skeleton and fails on its own.

export type GateState = "pending" | "approved" | "held" | "rejected";

export interface BuildBrief {
  id: string;
  solver: string;
  version: string;
  commit: string;
  branch: string;
  receivedAt: string;
  verdict: Verdict;
  gate: GateState;
}

export interface BuildWithCounts extends BuildBrief {
  runCounts: Record<Verdict, number>;
}

const BUILD_BRIEF = gql`
  fragment MorningBuildBrief on Build {
    id
    solver
    version
    commit
    branch
    receivedAt
    verdict
    gate
  }
`;

export const MORNING_BRANCHES: TypedDocumentNode<{ morningView: { id: string; branches: { branch: string; baseline: BuildBrief | null; builds: BuildWithCounts[] }[] } }, { perBranch: number }> = gql`
  ${BUILD_BRIEF}
  query MorningBranches($perBranch: Int) {
    morningView {
      id
      branches(perBranch: $perBranch) {
        branch
        baseline { ...MorningBuildBrief }
        builds { ...MorningBuildBrief runCounts { within marginal outside unbanded missing } }
      }
    }
  }
`;

export interface BandExitRow {
  branch: string;
  build: BuildBrief;
  baseline: BuildBrief;
  runId: string | null;
  runStatus: string | null;
  case: string;
  model: string;
  grid: string;
  quantity: string;
  label: string | null;
  unit: string | null;
  value: number | null;
  verdict: Verdict;
  baselineValue: number | null;
  baselineVerdict: Verdict;
  reference: number | null;
  lower: number | null;
  upper: number | null;
  bandVersion: number | null;
}

export const MORNING_BAND_EXITS: TypedDocumentNode<{ morningView: { id: string; bandExits: BandExitRow[] } }> = gql`
  ${BUILD_BRIEF}
  query MorningBandExits {
    morningView {
      id
      bandExits {
        branch
        build { ...MorningBuildBrief }
        baseline { ...MorningBuildBrief }
        runId runStatus case model grid quantity label unit value verdict
        baselineValue baselineVerdict reference lower upper bandVersion
      }
    }
  }
`;

export interface OpenDriftRow {
  branch: string;
  build: BuildBrief;
  runId: string;
  case: string;
  model: string;
  grid: string;
  quantity: string;
  label: string | null;
  unit: string | null;
  value: number | null;
  verdict: Verdict;
  reason: "baseline" | "trend" | null;
  pValue: number | null;
  slopePerBuild: number | null;
  baselineValue: number | null;
  baselineDelta: number | null;
  noiseFloor: number | null;
}

export const MORNING_OPEN_DRIFTS: TypedDocumentNode<{ morningView: { id: string; openDrifts: OpenDriftRow[] } }> = gql`
  ${BUILD_BRIEF}
  query MorningOpenDrifts {
    morningView {
      id
      openDrifts {
        branch
        build { ...MorningBuildBrief }
        runId case model grid quantity label unit value verdict
        reason pValue slopePerBuild baselineValue baselineDelta noiseFloor
      }
    }
  }
`;

export const MORNING_CANDIDATES: TypedDocumentNode<{ morningView: { id: string; releaseCandidates: { awaiting: BuildWithCounts[]; settledUndecided: number } } }> = gql`
  ${BUILD_BRIEF}
  query MorningCandidates {
    morningView {
      id
      releaseCandidates {
        awaiting { ...MorningBuildBrief runCounts { within marginal outside unbanded missing } }
        settledUndecided
      }
    }
  }
`;
