export const buildsTypeDefs = /* GraphQL */ `
  type VerdictCounts {
    within: Int!
    marginal: Int!
    outside: Int!
    unbanded: Int!
    missing: Int!
  }

  type GateDecision {
    state: GateState!
    comment: String!
    decidedBy: String!
    decidedByEmail: String!
    decidedAt: DateTime!
  }

  type Build {
    id: ID!
    solver: String!
    version: String!
    commit: String!
    branch: String!
    pipelineUrl: String
    receivedAt: DateTime!
    verdict: Verdict!
    "Runs counted by verdict."
    runCounts: VerdictCounts!
    gate: GateState!
    decision: GateDecision
    runs: [Run!]!
  }

  type Band {
    id: ID!
    case: String!
    quantity: String!
    "Null when the band applies to every model of the case."
    model: String
    version: Int!
    kind: BandKind!
    reference: Float
    source: String!
    lower: Float
    upper: Float
    marginalMargin: Float!
    noiseFloor: Float!
    fitSettings: JSON!
  }

  type QuantityValue {
    key: String!
    label: String
    unit: String
    value: Float
    origin: Origin!
    verdict: Verdict!
    reference: Float
    source: String
    lower: Float
    upper: Float
    marginalMargin: Float
    band: Band
    "value - reference, and the same in percent of |reference|."
    deviation: Float
    deviationPct: Float
    baselineValue: Float
    baselineDelta: Float
    baselineBuildId: ID
    drift: Boolean!
    driftReason: String
    driftPValue: Float
    driftSlope: Float
    details: JSON!
  }

  type Series {
    key: String!
    x: [Float!]!
    y: [Float!]!
  }

  type StressSample {
    at: Float!
    uu: Float!
    vv: Float!
    ww: Float!
    uv: Float!
    uw: Float!
    vw: Float!
    k: Float
    ii: Float
    iii: Float
    eta: Float
    xi: Float
    lumleyF: Float
    barycentricX: Float
    barycentricY: Float
    realizable: Boolean!
    violations: [String!]!
  }

  type GridStudy {
    quantity: String!
    cells: [Float!]!
    values: [Float!]!
    dimension: Int!
    convergence: String!
    observedOrder: Float
    extrapolatedValue: Float
    gciFinePct: Float
    eaPct: Float
    eextPct: Float
  }

  type Coefficient {
    name: String!
    value: Float!
  }

  type Run {
    id: ID!
    buildId: ID!
    case: String!
    model: String!
    grid: String!
    status: RunStatus!
    iterations: Int
    wallSeconds: Float
    verdict: Verdict!
    quantities: [QuantityValue!]!
    series: [Series!]!
    stresses: [StressSample!]!
    gridStudy: GridStudy
    coefficients: [Coefficient!]!
  }

  type BuildPage {
    items: [Build!]!
    totalCount: Int!
  }

  extend type Query {
    builds(branch: String, verdict: Verdict, first: Int = 25, offset: Int = 0): BuildPage!
    build(id: ID!): Build
    run(id: ID!): Run
    branches: [String!]!
  }
`;
