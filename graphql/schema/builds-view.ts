// The builds table (server-side paging, sorting, filtering) and the comparison of
// two builds run by run.
export const buildsViewTypeDefs = /* GraphQL */ `
  enum BuildTableColumn {
    received
    version
    branch
    verdict
  }

  enum BuildTableDirection {
    asc
    desc
  }

  input BuildTableFilter {
    branch: String
    verdict: Verdict
    "Case-insensitive substring of the version."
    version: String
    "Leading hexadecimal digits of the commit hash."
    commitPrefix: String
    "First UTC day (YYYY-MM-DD) of the received range, inclusive."
    fromDate: String
    "Last UTC day (YYYY-MM-DD) of the received range, inclusive."
    toDate: String
  }

  input BuildTableSort {
    column: BuildTableColumn!
    direction: BuildTableDirection!
  }

  type ComparedQuantity {
    key: String!
    label: String
    unit: String
    value: Float
    otherValue: Float
    "value - otherValue."
    difference: Float
    "difference in percent of |otherValue|."
    differencePct: Float
    verdict: Verdict
    otherVerdict: Verdict
    verdictChanged: Boolean!
  }

  type ComparedCoefficient {
    name: String!
    value: Float
    otherValue: Float
    changed: Boolean!
  }

  "One case x model x grid in both builds; a side is null when that build has no such run."
  type ComparedRun {
    case: String!
    model: String!
    grid: String!
    runId: ID
    otherRunId: ID
    status: RunStatus
    otherStatus: RunStatus
    verdict: Verdict
    otherVerdict: Verdict
    verdictChanged: Boolean!
    quantities: [ComparedQuantity!]!
    coefficients: [ComparedCoefficient!]!
    changedCoefficientCount: Int!
  }

  type BuildComparison {
    build: Build!
    "The build compared with; null when none was chosen and the branch has no baseline yet."
    against: Build
    "The last approved build on the branch received before this build."
    baseline: Build
    againstIsBaseline: Boolean!
    runs: [ComparedRun!]!
  }

  extend type Query {
    buildTable(filter: BuildTableFilter, sort: BuildTableSort, first: Int = 25, offset: Int = 0): BuildPage!
    "Compares a build with againstId, or with its branch baseline when againstId is null."
    buildComparison(buildId: ID!, againstId: ID): BuildComparison!
  }
`;
