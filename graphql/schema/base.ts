// Shared scalars and enums. Verdict, origin and gate words are the product's own
// (DESIGN.md), kept lower-case as the product writes them.
export const baseTypeDefs = /* GraphQL */ `
  scalar DateTime
  scalar JSON
  "A list of numbers (a profile's x or y), sent as a JSON array of numbers; checked in one pass by the server."
  scalar FloatSeries

  enum Verdict {
    within
    marginal
    outside
    unbanded
    missing
  }

  enum Origin {
    reported
    derived
    expected
  }

  enum BandKind {
    verification
    validation
  }

  enum GateState {
    pending
    approved
    held
    rejected
  }

  enum RunStatus {
    COMPLETED
    DIVERGED
    CRASHED
    TIMEOUT
  }

  type Query {
    _version: String!
  }

  type Mutation {
    _noop: Boolean
  }
`;
