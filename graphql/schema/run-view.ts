// The run page's view of a run: its series thinned on the server for drawing,
// so a million-sample profile does not travel to the browser.
export const runViewTypeDefs = /* GraphQL */ `
  type PlotSeries {
    key: String!
    x: [Float!]!
    y: [Float!]!
    "Samples the run posted; x and y hold at most maxPoints of them (each stretch keeps its lowest and highest y)."
    totalPoints: Int!
  }

  extend type QuantityValue {
    "Kind of the band this value was judged against (null when unbanded)."
    bandKind: BandKind
    "The model the band is specific to; null for a band of every model of the case."
    bandModel: String
  }

  extend type Run {
    "The run's series for plotting, at most maxPoints samples each (100 to 20000)."
    plotSeries(maxPoints: Int = 4000): [PlotSeries!]!
  }
`;
