// Size limits of one CI submission, shared by the GraphQL scalar that guards
// the wire format and the zod schema that checks the content.
export const SUBMISSION_LIMITS = {
  runs: 5000,
  quantitiesPerRun: 1000,
  seriesPerRun: 50,
  pointsPerSeries: 1_000_000,
  stressSamplesPerRun: 100_000,
  coefficientsPerRun: 500,
} as const;
