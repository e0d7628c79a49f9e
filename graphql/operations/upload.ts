import { gql } from "@apollo/client";

// The manual-upload page: the case picker reads the library through Apollo; the
// upload itself goes out as a GraphQL multipart request over XMLHttpRequest (for
// upload progress), so its document is a plain string.

export const UPLOAD_CASES_QUERY = gql`
  query UploadCases {
    cases {
      key
      title
      models
    }
  }
`;

export interface UploadCasesData {
  cases: { key: string; title: string; models: string[] }[];
}

export const UPLOAD_MUTATION = /* GraphQL */ `
  mutation ManualUpload($input: ResultSubmission, $file: File!, $seriesKey: String) {
    submitResults(input: $input, file: $file, seriesKey: $seriesKey) {
      created
      build {
        id
        solver
        version
        commit
        branch
        verdict
        runCounts { within marginal outside unbanded missing }
      }
      runs {
        id
        case
        model
        grid
        status
        verdict
        quantities {
          key label unit value origin verdict reference source lower upper
          deviation deviationPct baselineValue baselineDelta drift driftReason details
        }
      }
    }
  }
`;
