import { gql, type TypedDocumentNode } from "@apollo/client";
import type { Verdict } from "@/lib/analysis";
import type { FieldChange } from "@/lib/format/field-changes";
import type { BandRecord, ModelInfo } from "./cases";

// Client documents of the case-library editor (QA lead).

export interface QuantityDefinitionInfo {
  key: string;
  label: string;
  unit: string;
  meaning: string;
  derivedFrom: string | null;
}

export interface CaseEditorData {
  case: {
    key: string;
    title: string;
    description: string;
    models: string[];
    parameters: Record<string, unknown>;
    quantities: QuantityDefinitionInfo[];
    bandRecords: BandRecord[];
  } | null;
  models: ModelInfo[];
  quantities: QuantityDefinitionInfo[];
}

export const CASE_EDITOR: TypedDocumentNode<CaseEditorData, { key: string }> = gql`
  query CaseEditor($key: String!) {
    case(key: $key) {
      key
      title
      description
      models
      parameters
      quantities { key label unit meaning derivedFrom }
      bandRecords {
        id quantity model version kind reference source lower upper marginalMargin noiseFloor fitSettings
        author reason validFrom supersededAt
      }
    }
    models { key name family reference }
    quantities { key label unit meaning derivedFrom }
  }
`;

export const LIBRARY_CHOICES: TypedDocumentNode<{ models: ModelInfo[]; quantities: QuantityDefinitionInfo[] }, Record<string, never>> = gql`
  query LibraryChoices {
    models { key name family reference }
    quantities { key label unit meaning derivedFrom }
  }
`;

export interface BandVersionInfo extends Omit<BandRecord, "quantity" | "model"> {
  changes: FieldChange[];
  judgedBuilds: number;
}

export type BandScopeVars = { caseKey: string; quantityKey: string; model: string | null };

export const BAND_VERSIONS: TypedDocumentNode<{ bandVersions: BandVersionInfo[] }, BandScopeVars> = gql`
  query BandVersions($caseKey: String!, $quantityKey: String!, $model: String) {
    bandVersions(caseKey: $caseKey, quantityKey: $quantityKey, model: $model) {
      id version kind reference source lower upper marginalMargin noiseFloor fitSettings
      author reason validFrom supersededAt judgedBuilds
      changes { field before after }
    }
  }
`;

export interface LibraryChangeInfo {
  id: string;
  at: string;
  by: string;
  action: string;
  subject: string;
  reason: string | null;
  changes: FieldChange[];
}

export const CASE_CHANGE_RECORD: TypedDocumentNode<{ caseChangeRecord: LibraryChangeInfo[] }, { caseKey: string; last?: number }> = gql`
  query CaseChangeRecord($caseKey: String!, $last: Int) {
    caseChangeRecord(caseKey: $caseKey, last: $last) { id at by action subject reason changes { field before after } }
  }
`;

export interface ReevaluatedQuantityInfo {
  runId: string;
  case: string;
  model: string;
  grid: string;
  quantity: string;
  value: number | null;
  originalVerdict: Verdict | null;
  verdict: Verdict;
  originalBandVersion: number | null;
  originalBandModel: string | null;
  bandVersion: number | null;
  bandModel: string | null;
}

export interface ReevaluationInfo {
  id: string;
  buildId: string;
  evaluatedAt: string;
  verdict: Verdict;
  originalVerdict: Verdict | null;
  reason: string;
  by: string | null;
  changes: ReevaluatedQuantityInfo[];
}

const REEVALUATION_FIELDS = /* GraphQL */ `
  id buildId evaluatedAt verdict originalVerdict reason by
  changes { runId case model grid quantity value originalVerdict verdict originalBandVersion originalBandModel bandVersion bandModel }
`;

export interface CandidateInfo {
  build: { id: string; version: string; commit: string; branch: string; receivedAt: string; verdict: Verdict };
  judgedAgainst: { version: number | null; model: string | null }[];
  superseded: boolean;
  stale: boolean;
  values: (number | null)[];
  verdictAsJudged: Verdict | null;
  verdictNow: Verdict | null;
  latestReevaluation: Pick<ReevaluationInfo, "id" | "evaluatedAt" | "verdict"> | null;
}

export const REEVALUATION_CANDIDATES: TypedDocumentNode<{ reevaluationCandidates: CandidateInfo[]; branches: string[] }, BandScopeVars & { branch: string | null; last?: number }> = gql`
  query ReevaluationCandidates($caseKey: String!, $quantityKey: String!, $model: String, $branch: String, $last: Int) {
    reevaluationCandidates(caseKey: $caseKey, quantityKey: $quantityKey, model: $model, branch: $branch, last: $last) {
      build { id version commit branch receivedAt verdict }
      judgedAgainst { version model }
      superseded
      stale
      values
      verdictAsJudged
      verdictNow
      latestReevaluation { id evaluatedAt verdict }
    }
    branches
  }
`;

export const BUILD_REEVALUATIONS: TypedDocumentNode<{ build: { id: string; reevaluations: ReevaluationInfo[] } | null }, { id: string }> = gql`
  query BuildReevaluations($id: ID!) {
    build(id: $id) { id reevaluations { ${REEVALUATION_FIELDS} } }
  }
`;

export const REEVALUATE_BUILDS: TypedDocumentNode<{ reevaluateBuilds: ReevaluationInfo[] }, { input: { buildIds: string[]; caseKey: string | null; reason: string } }> = gql`
  mutation ReevaluateBuilds($input: ReevaluationInput!) {
    reevaluateBuilds(input: $input) { ${REEVALUATION_FIELDS} }
  }
`;

export const REVISE_BAND: TypedDocumentNode<{ reviseBand: { id: string; version: number } }, { input: Record<string, unknown> }> = gql`
  mutation ReviseBandFromEditor($input: BandRevisionInput!) {
    reviseBand(input: $input) { id version }
  }
`;

export const CREATE_CASE: TypedDocumentNode<{ createCase: { key: string } }, { input: Record<string, unknown> }> = gql`
  mutation CreateCase($input: CaseInput!) {
    createCase(input: $input) { key title }
  }
`;

export const REVISE_CASE: TypedDocumentNode<{ reviseCase: { key: string } }, { key: string; input: Record<string, unknown> }> = gql`
  mutation ReviseCase($key: String!, $input: CaseRevisionInput!) {
    reviseCase(key: $key, input: $input) { key title description models parameters }
  }
`;

export const DEFINE_QUANTITY: TypedDocumentNode<{ defineQuantity: QuantityDefinitionInfo }, { input: Record<string, unknown> }> = gql`
  mutation DefineQuantity($input: QuantityDefinitionInput!) {
    defineQuantity(input: $input) { key label unit meaning derivedFrom }
  }
`;

export const REVISE_QUANTITY: TypedDocumentNode<{ reviseQuantity: QuantityDefinitionInfo }, { key: string; input: Record<string, unknown> }> = gql`
  mutation ReviseQuantity($key: String!, $input: QuantityRevisionInput!) {
    reviseQuantity(key: $key, input: $input) { key label unit meaning derivedFrom }
  }
`;

export const QUANTITY_USES: TypedDocumentNode<{ quantities: QuantityDefinitionInfo[]; cases: { key: string; title: string; quantities: { key: string }[] }[] }, Record<string, never>> = gql`
  query QuantityUses {
    quantities { key label unit meaning derivedFrom }
    cases { key title quantities { key } }
  }
`;
