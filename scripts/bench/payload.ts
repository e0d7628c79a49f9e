import { FLAT_PLATE_DELTA_PLUS, FLAT_PLATE_STATION_RE_X } from "@/db/seeds/library/index";
import { listCoefficients, STANDARD_COEFFICIENTS } from "@/fixtures/generate/closures";
import { createCommitSha, createNoise } from "@/fixtures/generate/random";
import { generateConvergedResidual, generateFlatPlateCf, generateWallProfile } from "@/fixtures/generate/runs";
import type { NoiseSource } from "@/fixtures/generate/random";
import type { ResultSubmission, RunSubmission, SeriesSubmission } from "@/fixtures/generate/submission";
import { FLAT_PLATE_CF, WAKE_PI, wallLawFor } from "@/fixtures/scenarios/cormorant-models";

// The production-scale submission of issue 5: flat-plate runs of the invented
// Cormorant suite, each with three 1,000-point profiles (u+, c_f, residual) and
// 30 reported scalars, numbers written in full double precision. Runs differ by model and grid so that every
// case × model × grid is unique within the build, as the contract requires.

const MODELS = ["sa", "sst", "k-omega", "k-epsilon", "ssg"] as const;
export const REPORTED_SCALARS = 30;
export const PROFILE_POINTS = 1000;

export function generateBenchRuns(runCount: number, seed: string): RunSubmission[] {
  const runs: RunSubmission[] = [];
  for (let i = 0; i < runCount; i++) {
    const model = MODELS[i % MODELS.length];
    const grid = `g${String(Math.floor(i / MODELS.length) + 1).padStart(3, "0")}`;
    const noise = createNoise(`${seed}|${model}|${grid}`);
    const coefficients = STANDARD_COEFFICIENTS[model];
    runs.push({
      case: "flat-plate-zpg",
      model,
      grid,
      status: "COMPLETED",
      iterations: 12000,
      wallSeconds: 310,
      quantities: Array.from({ length: REPORTED_SCALARS }, (_, q) => ({
        key: `probe_${String(q + 1).padStart(2, "0")}`,
        value: Number((1 + 0.01 * noise.gaussian()).toPrecision(10)),
      })),
      series: [
        fullPrecision(generateWallProfile({ ...wallLawFor(model, coefficients), wakePi: WAKE_PI.flatPlate, edgePlus: FLAT_PLATE_DELTA_PLUS }, noise, PROFILE_POINTS), noise, true),
        fullPrecision(generateFlatPlateCf({ cfAtStation: FLAT_PLATE_CF[model] ?? 2.7e-3, stationReX: FLAT_PLATE_STATION_RE_X }, noise, PROFILE_POINTS), noise, false),
        fullPrecision(generateConvergedResidual({ iterations: 12000, orders: 6.5, samples: PROFILE_POINTS }, noise), noise, false),
      ],
      coefficients: listCoefficients(coefficients),
    });
  }
  return runs;
}

/**
 * The generators round to 10 significant digits; a production solver writing
 * doubles in full ("%.17g") posts about 18 characters per number, which is what
 * makes 200 runs about 20 MB. A relative 1e-12 perturbation restores full-length
 * doubles without moving any derived quantity visibly. x is perturbed only where
 * no sample is meant to sit exactly on a station (u+), and iteration counts stay
 * integers.
 */
function fullPrecision(s: SeriesSubmission, noise: NoiseSource, perturbX: boolean): SeriesSubmission {
  const spread = (v: number) => v * (1 + 1e-12 * noise.gaussian());
  return { key: s.key, x: perturbX ? s.x.map(spread) : s.x, y: s.y.map(spread) };
}

/** The same runs under a new commit: every post creates a build. */
export function withFreshBuild(runs: RunSubmission[], label: string): ResultSubmission {
  return {
    build: { solver: "Cormorant", version: "9.9.0-bench", commit: createCommitSha(label), branch: "bench/ingest" },
    runs,
  };
}
