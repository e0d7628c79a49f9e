// The morning view (home page): one field per widget so each loads on its own.
export const overviewTypeDefs = /* GraphQL */ `
  type BranchActivity {
    branch: String!
    "The newest builds of the branch, newest first."
    builds: [Build!]!
    "The last approved build received before the newest one: what the newest is compared against."
    baseline: Build
  }

  "A quantity of a branch's newest build that was within or marginal in the baseline and is now outside or missing."
  type BandExit {
    branch: String!
    build: Build!
    baseline: Build!
    "Null when the newest build has no run of this case, model and grid at all."
    runId: ID
    runStatus: RunStatus
    case: String!
    model: String!
    grid: String!
    quantity: String!
    label: String
    unit: String
    value: Float
    verdict: Verdict!
    baselineValue: Float
    baselineVerdict: Verdict!
    reference: Float
    lower: Float
    upper: Float
    bandVersion: Int
  }

  "A quantity of a branch's newest build flagged as drifting."
  type OpenDrift {
    branch: String!
    build: Build!
    runId: ID!
    case: String!
    model: String!
    grid: String!
    quantity: String!
    label: String
    unit: String
    value: Float
    verdict: Verdict!
    "baseline (step beyond the noise floor) or trend (Mann–Kendall over the last builds)."
    reason: String
    "Two-sided Mann–Kendall p-value over the trend window."
    pValue: Float
    "Theil–Sen slope over the trend window, in the quantity's unit per build."
    slopePerBuild: Float
    baselineValue: Float
    baselineDelta: Float
    noiseFloor: Float
  }

  type ReleaseCandidates {
    "Undecided builds on release/* branches newer than their branch's last decided build, newest first."
    awaiting: [Build!]!
    "Older undecided release-branch builds that a later decision on their branch has settled (not listed)."
    settledUndecided: Int!
  }

  type MorningView {
    "Stable per argument set, so that the browser cache merges the widgets' separate queries."
    id: ID!
    branches(perBranch: Int = 5): [BranchActivity!]!
    bandExits: [BandExit!]!
    openDrifts: [OpenDrift!]!
    releaseCandidates(first: Int = 20): ReleaseCandidates!
  }

  extend type Query {
    "What changed overnight, over the most recently active branches."
    morningView(branches: Int = 8): MorningView!
  }
`;
