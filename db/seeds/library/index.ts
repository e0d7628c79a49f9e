// The canonical case library: models, quantities, cases and tolerance bands
// with their published sources. Pure data; db/seeds inserts it.
export type {
  BandDefinition,
  BandKind,
  CaseDefinition,
  CaseParameters,
  ModelDefinition,
  ModelFamily,
  QuantityDefinition,
  QuantitySource,
} from "./types";
export { MODELS } from "./models";
export { QUANTITIES } from "./quantities";
export { CASES, FLAT_PLATE_DELTA_PLUS, FLAT_PLATE_STATION_RE_X } from "./cases";
export { BANDS } from "./bands";
export { CHANNEL_RE180_REFERENCE_FIT } from "./bands/wall-law";
export { TMR_CF_EXTRAPOLATED } from "./bands/skin-friction";
