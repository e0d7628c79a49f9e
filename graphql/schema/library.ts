export const libraryTypeDefs = /* GraphQL */ `
  type QuantityDefinition {
    key: String!
    label: String!
    unit: String!
    meaning: String!
    derivedFrom: String
  }

  type TurbulenceModel {
    key: String!
    name: String!
    family: String!
    reference: String!
  }

  type Case {
    key: String!
    title: String!
    description: String!
    models: [String!]!
    parameters: JSON!
    "Bands in force now."
    bands: [Band!]!
  }

  type TrendPoint {
    buildId: ID!
    commit: String!
    version: String!
    receivedAt: DateTime!
    value: Float
    verdict: Verdict!
    drift: Boolean!
    driftReason: String
    "The band version this point was judged against."
    bandVersion: Int
    reference: Float
    lower: Float
    upper: Float
    marginalMargin: Float
  }

  type Trend {
    case: String!
    quantity: String!
    model: String!
    branch: String!
    grid: String!
    points: [TrendPoint!]!
  }

  type ReleaseGate {
    commit: String!
    build: Build
    state: GateState!
    decision: GateDecision
    "Quantities that are outside their band, or did not complete, in this build."
    blocking: [String!]!
  }

  extend type Query {
    cases: [Case!]!
    case(key: String!): Case
    models: [TurbulenceModel!]!
    quantities: [QuantityDefinition!]!
    trend(case: String!, quantity: String!, model: String!, branch: String!, grid: String = "default", last: Int = 50): Trend!
    releaseGate(commit: String!): ReleaseGate!
  }
`;
