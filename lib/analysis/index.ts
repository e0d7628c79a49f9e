// Public surface of the pure computation core: arrays in, numbers out, no I/O.
export { AnalysisError } from "./errors";
export * from "./wall-laws";
export * from "./decay-models";
export * from "./skin-friction";
export * from "./log-law";
export * from "./diagnostic-function";
export * from "./decay";
export * from "./verdict";
export * from "./skin-friction-analysis";
export * from "./residuals";
export * from "./realizability";
export * from "./grid-convergence";
export * from "./drift";
export { erfc, normalCdf } from "./normal-distribution";
