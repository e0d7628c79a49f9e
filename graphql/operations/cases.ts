import { gql, type TypedDocumentNode } from "@apollo/client";

// Client documents of the case library.

export interface ModelInfo {
  key: string;
  name: string;
  family: string;
  reference: string;
}

export interface CaseListItem {
  key: string;
  title: string;
  description: string;
  models: string[];
  bands: { id: string; quantity: string; model: string | null; kind: "verification" | "validation" }[];
  quantities: { key: string }[];
}

export const CASE_LIST: TypedDocumentNode<{ cases: CaseListItem[]; models: ModelInfo[] }> = gql`
  query CaseList {
    cases {
      key
      title
      description
      models
      bands { id quantity model kind }
      quantities { key }
    }
    models { key name family reference }
  }
`;

export interface BandRecord {
  id: string;
  quantity: string;
  model: string | null;
  version: number;
  kind: "verification" | "validation";
  reference: number | null;
  source: string;
  lower: number | null;
  upper: number | null;
  marginalMargin: number;
  noiseFloor: number;
  fitSettings: Record<string, unknown>;
  author: string;
  reason: string;
  validFrom: string;
  supersededAt: string | null;
}

export interface CaseDetailData {
  key: string;
  title: string;
  description: string;
  models: string[];
  parameters: Record<string, unknown>;
  quantities: { key: string; label: string; unit: string; meaning: string; derivedFrom: string | null }[];
  bandRecords: BandRecord[];
}

export const CASE_DETAIL: TypedDocumentNode<{ case: CaseDetailData | null; models: ModelInfo[] }, { key: string }> = gql`
  query CaseDetail($key: String!) {
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
  }
`;
