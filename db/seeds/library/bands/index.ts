import type { BandDefinition } from "../types";
import { CONVERGENCE_BANDS } from "./convergence";
import { DECAY_BANDS } from "./decay";
import { HOMOGENEOUS_SHEAR_BANDS } from "./homogeneous-shear";
import { SKIN_FRICTION_BANDS } from "./skin-friction";
import { WALL_LAW_BANDS } from "./wall-law";

export const BANDS: BandDefinition[] = [
  ...WALL_LAW_BANDS,
  ...DECAY_BANDS,
  ...HOMOGENEOUS_SHEAR_BANDS,
  ...SKIN_FRICTION_BANDS,
  ...CONVERGENCE_BANDS,
];
