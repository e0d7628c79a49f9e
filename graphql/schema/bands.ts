export const bandsTypeDefs = /* GraphQL */ `
  input BandRevisionInput {
    caseKey: String!
    quantityKey: String!
    "Null for a band that applies to every model of the case."
    model: String
    kind: BandKind!
    reference: Float
    source: String!
    lower: Float
    upper: Float
    marginalMargin: Float!
    noiseFloor: Float!
    fitSettings: JSON
    "Why the band changes; kept in the band's history."
    reason: String!
  }

  extend type Mutation {
    "QA lead: write a new version of a band (the old version stays for the builds judged against it)."
    reviseBand(input: BandRevisionInput!): Band!
  }
`;
