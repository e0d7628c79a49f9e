// The release gate: candidates, one build's review, decisions and waivers.
export const gateTypeDefs = /* GraphQL */ `
  enum GateDecisionState {
    approved
    held
    rejected
  }

  "Lets a named quantity of a case through the gate until a date, for a stated reason."
  type Waiver {
    id: ID!
    case: String!
    quantity: String!
    "Null: every model of the case."
    model: String
    "Null: every branch."
    branch: String
    reason: String!
    grantedBy: String!
    grantedAt: DateTime!
    "The waiver stops counting at this instant."
    expiresAt: DateTime!
    revokedAt: DateTime
    revokedBy: String
    revokeReason: String
    "Neither expired nor withdrawn."
    inForce: Boolean!
  }

  """
  A quantity of a build the release manager should look at: outside, marginal,
  missing or drifting, or from a run that did not complete (quantity null: such a
  run without any quantity).
  """
  type GateFinding {
    id: ID!
    runId: ID!
    case: String!
    model: String!
    grid: String!
    runStatus: RunStatus!
    quantity: String
    label: String
    unit: String
    value: Float
    origin: Origin
    verdict: Verdict
    reference: Float
    lower: Float
    upper: Float
    marginalMargin: Float
    noiseFloor: Float
    bandVersion: Int
    bandKind: BandKind
    source: String
    "The baseline at evaluation: the last approved build on the branch before this one."
    baselineBuildId: ID
    baselineValue: Float
    baselineDelta: Float
    drift: Boolean!
    driftReason: String
    driftPValue: Float
    driftSlope: Float
    "Why it would block approval; null when it does not."
    blockReason: String
    "The waiver in force that lets it through; null while it blocks."
    waiver: Waiver
  }

  extend type GateDecision {
    id: ID!
  }

  type GateReview {
    "The build id."
    id: ID!
    build: Build!
    state: GateState!
    decision: GateDecision
    "Every decision on the build, newest first."
    history: [GateDecision!]!
    baseline: Build
    "On a release/* branch."
    isCandidate: Boolean!
    findings: [GateFinding!]!
    "What blocks approval now: no waiver in force lets it through."
    blockers: [GateFinding!]!
    "What would block, let through by a waiver in force."
    waived: [GateFinding!]!
    "Waivers in force that name a quantity of any run of this build on its branch."
    waivers: [Waiver!]!
  }

  type GateCandidate {
    build: Build!
    state: GateState!
    "Undecided, and no later build of its branch has a decision."
    awaiting: Boolean!
    outsideCount: Int!
    marginalCount: Int!
    missingCount: Int!
    driftCount: Int!
    incompleteRuns: Int!
    runCount: Int!
    blockerCount: Int!
    waivedCount: Int!
  }

  type GateCandidatePage {
    items: [GateCandidate!]!
    totalCount: Int!
    "Release branches with builds, newest name first."
    branches: [String!]!
  }

  extend type ReleaseGate {
    "Structured form of blocking: each quantity or run that stands in the way, with its values and limits."
    blockers: [GateFinding!]!
    "Quantities that would block, let through by a waiver in force."
    waived: [GateFinding!]!
  }

  input GateDecisionInput {
    buildId: ID!
    state: GateDecisionState!
    "Why; kept with the decision."
    comment: String!
  }

  input WaiverInput {
    case: String!
    quantity: String!
    "Omit for every model of the case."
    model: String
    "Omit for every branch."
    branch: String
    reason: String!
    expiresAt: DateTime!
  }

  extend type Query {
    gateCandidates(branch: String, first: Int = 20, offset: Int = 0): GateCandidatePage!
    gateReview(buildId: ID!): GateReview
    waivers(case: String, branch: String, includeEnded: Boolean = false): [Waiver!]!
  }

  extend type Mutation {
    "Release manager: approve, hold or reject a build. Approval is refused while anything blocks without a waiver."
    decideGate(input: GateDecisionInput!): GateReview!
    "Release manager: let a quantity through until a date."
    grantWaiver(input: WaiverInput!): Waiver!
    "Release manager: withdraw a waiver before it expires."
    revokeWaiver(id: ID!, reason: String!): Waiver!
  }
`;
