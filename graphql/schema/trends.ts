// The trend chart: one quantity of one case across a branch's builds, several models at once.
export const trendsTypeDefs = /* GraphQL */ `
  type TrendChartPoint {
    buildId: ID!
    runId: ID!
    value: Float
    verdict: Verdict!
    drift: Boolean!
    "baseline or trend"
    driftReason: String
    "Two-sided Mann–Kendall p-value over the drift window ending at this build."
    driftPValue: Float
    "Theil–Sen slope over the same window, in the quantity's unit per build."
    driftSlope: Float
    baselineValue: Float
    baselineDelta: Float
    "The band version this value was judged against (bands are versioned)."
    bandId: ID
    bandVersion: Int
    bandKind: BandKind
    "Null when the band applies to every model of the case."
    bandModel: String
    reference: Float
    lower: Float
    upper: Float
    marginalMargin: Float
    noiseFloor: Float
  }

  type TrendModelSeries {
    model: String!
    "Oldest first."
    points: [TrendChartPoint!]!
  }

  type TrendChart {
    case: String!
    quantity: String!
    definition: QuantityDefinition
    branch: String!
    grid: String!
    last: Int!
    "The builds on the x axis (any of the models has a value there), oldest first."
    builds: [Build!]!
    "The last approved build on the branch, whether or not it lies inside the shown range."
    baseline: Build
    series: [TrendModelSeries!]!
  }

  extend type Query {
    trendChart(case: String!, quantity: String!, models: [String!]!, branch: String!, grid: String = "default", last: Int = 50): TrendChart!
  }
`;
