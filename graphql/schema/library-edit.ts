// The case-library editor (QA lead): cases, quantity definitions, band history
// with field-by-field changes, and re-judgement of stored builds after a band change.
export const libraryEditTypeDefs = /* GraphQL */ `
  input CaseInput {
    "Lower-case letters, digits and dashes; fixed once created (builds refer to it)."
    key: String!
    title: String!
    description: String!
    models: [String!]!
    "Default fit settings (reTau, logLawWindow, cfStation, cfStationLabel, stepHeight, residualTargetOrders)."
    parameters: JSON
    "Why the case is added; kept in its change record."
    reason: String!
  }

  input CaseRevisionInput {
    title: String!
    description: String!
    models: [String!]!
    parameters: JSON
    reason: String!
  }

  input QuantityDefinitionInput {
    "lower-case snake_case key CI reports the value under."
    key: String!
    label: String!
    "As written on plots; 1 for a dimensionless quantity."
    unit: String!
    meaning: String!
    reason: String!
  }

  input QuantityRevisionInput {
    label: String!
    unit: String!
    meaning: String!
    reason: String!
  }

  input ReevaluationInput {
    buildIds: [ID!]!
    "The case whose band change prompted the re-judgement (listed in its change record)."
    caseKey: String
    reason: String!
  }

  "One field that differs from the previous version; numbers stay numbers, an open limit is null."
  type FieldChange {
    field: String!
    before: JSON
    after: JSON
  }

  "One version of a band scope with what changed from the version before it."
  type BandVersion {
    id: ID!
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
    supersededAt: DateTime
    "Empty for the first version."
    changes: [FieldChange!]!
    "Builds with a value of this quantity judged against this version."
    judgedBuilds: Int!
  }

  "An entry of a case's change record (case, its quantity definitions, its bands, re-judgements)."
  type LibraryChange {
    id: ID!
    at: DateTime!
    by: String!
    action: String!
    subject: String!
    reason: String
    changes: [FieldChange!]!
  }

  type ReevaluatedQuantity {
    runId: ID!
    case: String!
    model: String!
    grid: String!
    quantity: String!
    value: Float
    "Null when the run never produced the quantity and a band now expects it."
    originalVerdict: Verdict
    verdict: Verdict!
    originalBandVersion: Int
    originalBandModel: String
    bandVersion: Int
    bandModel: String
  }

  "A re-judgement of a build's stored values against the bands in force at evaluatedAt."
  type Reevaluation {
    id: ID!
    buildId: ID!
    evaluatedAt: DateTime!
    verdict: Verdict!
    "The build's verdict as originally judged, when the re-judgement ran."
    originalVerdict: Verdict
    reason: String!
    by: String
    "Only the values whose verdict or band differs from the original judgement."
    changes: [ReevaluatedQuantity!]!
  }

  type BandRef {
    version: Int
    "Null for the case-wide band."
    model: String
  }

  type ReevaluationCandidate {
    build: Build!
    "Band versions the build's values in this scope were judged against; a null version means no band."
    judgedAgainst: [BandRef!]!
    "Some value in the scope was judged against a band that is no longer the one in force for it."
    superseded: Boolean!
    "Superseded and not re-judged since the scope's version in force began: the picker's default."
    stale: Boolean!
    "The build's stored values in this scope (one per model and grid)."
    values: [Float]!
    "Worst verdict of those values as originally judged; null when the build has none in the scope."
    verdictAsJudged: Verdict
    "Worst verdict of the same stored values against the bands in force now."
    verdictNow: Verdict
    latestReevaluation: Reevaluation
  }

  extend type Build {
    "Re-judgements of this build after band changes, newest first; the original verdicts stay as judged."
    reevaluations: [Reevaluation!]!
  }

  extend type Query {
    "Every version of one band scope, newest first (model null = the case-wide band)."
    bandVersions(caseKey: String!, quantityKey: String!, model: String): [BandVersion!]!
    "Changes of a case, its quantity definitions and its bands, newest first."
    caseChangeRecord(caseKey: String!, last: Int = 100): [LibraryChange!]!
    "The newest builds of a case with the band versions one scope judged them against."
    reevaluationCandidates(caseKey: String!, quantityKey: String!, model: String, branch: String, last: Int = 30): [ReevaluationCandidate!]!
  }

  extend type Mutation {
    "QA lead: add a canonical case."
    createCase(input: CaseInput!): Case!
    "QA lead: edit a case's title, description, models or fit settings."
    reviseCase(key: String!, input: CaseRevisionInput!): Case!
    "QA lead: define a new reported quantity."
    defineQuantity(input: QuantityDefinitionInput!): QuantityDefinition!
    "QA lead: edit a quantity definition's label, unit or meaning."
    reviseQuantity(key: String!, input: QuantityRevisionInput!): QuantityDefinition!
    "QA lead: judge the stored values of builds against the bands in force now."
    reevaluateBuilds(input: ReevaluationInput!): [Reevaluation!]!
  }
`;
