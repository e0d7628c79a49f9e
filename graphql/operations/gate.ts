import { gql, type TypedDocumentNode } from "@apollo/client";
import type { Verdict } from "@/lib/analysis";
import type { DecisionState } from "@/lib/validation/gate";
import type { BuildTableRow, RunStatus } from "./builds";

// Client documents of the release gate, with their result types.

export type GateState = "pending" | DecisionState;
export type { RunStatus } from "./builds";

/** A build as the gate screens read it: the build table's row without its gate state. */
export type GateBuild = Omit<BuildTableRow, "gate">;

export interface GateCandidateItem {
  build: GateBuild;
  state: GateState;
  awaiting: boolean;
  outsideCount: number;
  marginalCount: number;
  missingCount: number;
  driftCount: number;
  incompleteRuns: number;
  runCount: number;
  blockerCount: number;
  waivedCount: number;
}

const BUILD_FIELDS = gql`
  fragment GateBuildFields on Build {
    id solver version commit branch pipelineUrl receivedAt verdict
    runCounts { within marginal outside unbanded missing }
  }
`;

export const GATE_CANDIDATES: TypedDocumentNode<{ gateCandidates: { totalCount: number; branches: string[]; items: GateCandidateItem[] } }, { branch?: string | null; first: number; offset: number }> = gql`
  ${BUILD_FIELDS}
  query GateCandidates($branch: String, $first: Int, $offset: Int) {
    gateCandidates(branch: $branch, first: $first, offset: $offset) {
      totalCount
      branches
      items {
        build { ...GateBuildFields }
        state awaiting outsideCount marginalCount missingCount driftCount incompleteRuns runCount blockerCount waivedCount
      }
    }
  }
`;

export interface WaiverItem {
  id: string;
  case: string;
  quantity: string;
  model: string | null;
  branch: string | null;
  reason: string;
  grantedBy: string;
  grantedAt: string;
  expiresAt: string;
  revokedAt: string | null;
  revokedBy: string | null;
  revokeReason: string | null;
  inForce: boolean;
}

export interface GateFindingItem {
  id: string;
  runId: string;
  case: string;
  model: string;
  grid: string;
  runStatus: RunStatus;
  quantity: string | null;
  label: string | null;
  unit: string | null;
  value: number | null;
  origin: "reported" | "derived" | "expected" | null;
  verdict: Verdict | null;
  reference: number | null;
  lower: number | null;
  upper: number | null;
  marginalMargin: number | null;
  noiseFloor: number | null;
  bandVersion: number | null;
  bandKind: "verification" | "validation" | null;
  source: string | null;
  baselineBuildId: string | null;
  baselineValue: number | null;
  baselineDelta: number | null;
  drift: boolean;
  driftReason: "baseline" | "trend" | null;
  driftPValue: number | null;
  driftSlope: number | null;
  blockReason: string | null;
  waiver: WaiverItem | null;
}

export interface GateDecisionItem {
  id: string;
  state: DecisionState;
  comment: string;
  decidedBy: string;
  decidedAt: string;
}

export interface GateReviewData {
  id: string;
  build: GateBuild;
  state: GateState;
  history: GateDecisionItem[];
  baseline: Pick<GateBuild, "id" | "version" | "commit"> | null;
  isCandidate: boolean;
  findings: GateFindingItem[];
  blockers: GateFindingItem[];
  waived: GateFindingItem[];
  waivers: WaiverItem[];
}

const WAIVER_FIELDS = gql`
  fragment GateWaiverFields on Waiver {
    id case quantity model branch reason grantedBy grantedAt expiresAt revokedAt revokedBy revokeReason inForce
  }
`;

const REVIEW_FIELDS = gql`
  ${BUILD_FIELDS}
  ${WAIVER_FIELDS}
  fragment GateReviewFields on GateReview {
    id
    build { ...GateBuildFields }
    state
    history { id state comment decidedBy decidedAt }
    baseline { id version commit }
    isCandidate
    findings {
      id runId case model grid runStatus quantity label unit value origin verdict reference lower upper marginalMargin noiseFloor
      bandVersion bandKind source baselineBuildId baselineValue baselineDelta drift driftReason driftPValue driftSlope blockReason
      waiver { ...GateWaiverFields }
    }
    blockers { id }
    waived { id }
    waivers { ...GateWaiverFields }
  }
`;

export const GATE_REVIEW: TypedDocumentNode<{ gateReview: GateReviewData | null }, { buildId: string }> = gql`
  ${REVIEW_FIELDS}
  query GateReview($buildId: ID!) {
    gateReview(buildId: $buildId) { ...GateReviewFields }
  }
`;

export const DECIDE_GATE: TypedDocumentNode<{ decideGate: GateReviewData }, { input: { buildId: string; state: DecisionState; comment: string } }> = gql`
  ${REVIEW_FIELDS}
  mutation DecideGate($input: GateDecisionInput!) {
    decideGate(input: $input) { ...GateReviewFields }
  }
`;

export interface WaiverInput {
  case: string;
  quantity: string;
  model: string | null;
  branch: string | null;
  reason: string;
  expiresAt: string;
}

export const GRANT_WAIVER: TypedDocumentNode<{ grantWaiver: WaiverItem }, { input: WaiverInput }> = gql`
  ${WAIVER_FIELDS}
  mutation GrantWaiver($input: WaiverInput!) {
    grantWaiver(input: $input) { ...GateWaiverFields }
  }
`;

export const REVOKE_WAIVER: TypedDocumentNode<{ revokeWaiver: WaiverItem }, { id: string; reason: string }> = gql`
  ${WAIVER_FIELDS}
  mutation RevokeWaiver($id: ID!, $reason: String!) {
    revokeWaiver(id: $id, reason: $reason) { ...GateWaiverFields }
  }
`;

export const WAIVER_REGISTER: TypedDocumentNode<{ waivers: WaiverItem[] }, { includeEnded: boolean }> = gql`
  ${WAIVER_FIELDS}
  query WaiverRegister($includeEnded: Boolean) {
    waivers(includeEnded: $includeEnded) { ...GateWaiverFields }
  }
`;
