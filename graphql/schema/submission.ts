// The public CI contract (DESIGN.md). Arrays of numbers are plain JSON arrays so
// that any CI system can post JSON with curl; profiles use the FloatSeries scalar
// (same wire format as [Float!]!, checked in one pass instead of per element).
export const submissionTypeDefs = /* GraphQL */ `
  input BuildInput {
    solver: String!
    version: String!
    commit: String!
    branch: String!
    pipelineUrl: String
  }

  input QuantityInput {
    key: String!
    value: Float!
  }

  input SeriesInput {
    key: String!
    x: FloatSeries!
    y: FloatSeries!
  }

  input StressSampleInput {
    at: Float!
    uu: Float!
    vv: Float!
    ww: Float!
    uv: Float!
    uw: Float!
    vw: Float!
  }

  input GridStudyInput {
    quantity: String!
    "Cell counts, fine to coarse."
    cells: [Float!]!
    "The studied quantity on each grid, fine to coarse."
    values: [Float!]!
    dimension: Int!
  }

  input CoefficientInput {
    name: String!
    value: Float!
  }

  input RunInput {
    case: String!
    model: String!
    "Defaults to \\"default\\"."
    grid: String
    status: RunStatus!
    iterations: Int
    wallSeconds: Float
    quantities: [QuantityInput!]
    series: [SeriesInput!]
    stresses: [StressSampleInput!]
    gridStudy: GridStudyInput
    coefficients: [CoefficientInput!]
  }

  input ResultSubmission {
    build: BuildInput!
    runs: [RunInput!]!
  }

  type SubmissionReceipt {
    build: Build!
    "The runs this submission stored (replacing earlier posts of the same case, model and grid)."
    runs: [Run!]!
    "True when this post created the build, false when it updated an existing one."
    created: Boolean!
  }

  "A file of a GraphQL multipart request (https://github.com/jaydenseric/graphql-multipart-request-spec)."
  scalar File

  extend type Mutation {
    """
    Stores a build's runs, derives and judges their quantities. Three ways to call it:
    input alone (the CI contract); file alone, a JSON results file (a ResultSubmission or a
    whole request body {query, variables: {input}}); or file as a two-column CSV with a header
    row, plus input (build and exactly one run) and seriesKey (u_plus, k_decay, cf, residual):
    the CSV becomes that run's series. A multipart request needs the header x-tauline-request.
    """
    submitResults(input: ResultSubmission, file: File, seriesKey: String): SubmissionReceipt!
  }
`;
