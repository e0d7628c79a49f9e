// The case library screens: what a case measures and the history of its bands.
export const caseLibraryTypeDefs = /* GraphQL */ `
  "One version of a band, in force or superseded."
  type BandRecord {
    id: ID!
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
    author: String!
    reason: String!
    validFrom: DateTime!
    "Null while the version is in force."
    supersededAt: DateTime
  }

  extend type Case {
    "Quantities some build reported or derived for this case, or that a band exists for."
    quantities: [QuantityDefinition!]!
    "Grids the case was run on in recent builds."
    grids: [String!]!
    "Every band version of the case, by quantity and model, oldest version first."
    bandRecords: [BandRecord!]!
  }
`;
