import { randomBytes } from "node:crypto";
import { FLAT_PLATE_DELTA_PLUS, FLAT_PLATE_STATION_RE_X } from "@/db/seeds/library/index";
import { STANDARD_COEFFICIENTS, listCoefficients } from "@/fixtures/generate/closures";
import { createNoise, type NoiseSource } from "@/fixtures/generate/random";
import {
  generateConvergedResidual,
  generateDecayRun,
  generateFlatPlateCf,
  generateHomogeneousShearRun,
  generateWallProfile,
} from "@/fixtures/generate/runs";
import type { ResultSubmission, RunSubmission } from "@/fixtures/generate/submission";
import { FLAT_PLATE_CF, WAKE_PI, decayLawFor, shearStateFor, wallLawFor } from "@/fixtures/scenarios/cormorant-models";

// What one load-test CI client posts: a small nightly build of the invented
// Cormorant suite, four runs (channel, flat plate, decay, homogeneous shear)
// with profiles of a few hundred points, about 40 kB of JSON. Bodies are built
// once into a pool; per request only the commit changes, so the client spends
// its time on HTTP, not on generating physics.

export const SUBMIT_MUTATION = /* GraphQL */ `mutation LoadSubmit($input: ResultSubmission!) {
  submitResults(input: $input) { created build { id commit } runs { id case model grid } }
}`;

const PROFILE_POINTS = 300;
const RESIDUAL_SAMPLES = 200;
const CHANNEL_MODELS = ["sa", "k-epsilon", "k-omega", "sst", "ssg"];
const PLATE_MODELS = ["sa", "k-omega", "sst"];
const HOMOGENEOUS_MODELS = ["k-epsilon", "k-omega", "sst", "lrr", "ssg"];
const COMMIT_MARK = "__load_commit__";

/** A serialised request body with a hole where the commit goes. */
export interface BodyTemplate {
  branch: string;
  runCount: number;
  bytes: number;
  /** The body with `commit` filled in. */
  fill(commit: string): Buffer;
}

export function generateLoadRuns(seed: string, index: number): RunSubmission[] {
  const pick = (models: string[], shift: number) => models[(index + shift) % models.length];
  const noise = (what: string): NoiseSource => createNoise(`${seed}|${index}|${what}`);
  const channelModel = pick(CHANNEL_MODELS, 0);
  const plateModel = pick(PLATE_MODELS, 1);
  const decayModel = pick(HOMOGENEOUS_MODELS, 2);
  const shearModel = pick(HOMOGENEOUS_MODELS, 3);
  const c = STANDARD_COEFFICIENTS;

  const channelNoise = noise("channel");
  const plateNoise = noise("plate");
  return [
    {
      case: "channel-re180",
      model: channelModel,
      status: "COMPLETED",
      iterations: 6000,
      wallSeconds: 70,
      series: [
        generateWallProfile({ ...wallLawFor(channelModel, c[channelModel]), wakePi: WAKE_PI.channel, edgePlus: 180 }, channelNoise, PROFILE_POINTS),
        generateConvergedResidual({ iterations: 6000, orders: 5.5, samples: RESIDUAL_SAMPLES }, channelNoise),
      ],
      coefficients: listCoefficients(c[channelModel]),
    },
    {
      case: "flat-plate-zpg",
      model: plateModel,
      status: "COMPLETED",
      iterations: 12000,
      wallSeconds: 310,
      series: [
        generateWallProfile({ ...wallLawFor(plateModel, c[plateModel]), wakePi: WAKE_PI.flatPlate, edgePlus: FLAT_PLATE_DELTA_PLUS }, plateNoise, PROFILE_POINTS),
        generateFlatPlateCf({ cfAtStation: FLAT_PLATE_CF[plateModel], stationReX: FLAT_PLATE_STATION_RE_X }, plateNoise, PROFILE_POINTS),
        generateConvergedResidual({ iterations: 12000, orders: 6.4, samples: RESIDUAL_SAMPLES }, plateNoise),
      ],
      coefficients: listCoefficients(c[plateModel]),
    },
    generateDecayRun(
      { model: decayModel, coefficients: c[decayModel], law: decayLawFor(decayModel, c[decayModel]), k0: 1, eps0: 1, turnoverTimes: 100, points: PROFILE_POINTS, timeSteps: 4000, wallSeconds: 12 },
      noise("decay"),
    ),
    generateHomogeneousShearRun({ model: shearModel, coefficients: c[shearModel], state: shearStateFor(shearModel, c[shearModel]), timeSteps: 5000, wallSeconds: 15 }, noise("shear")),
  ];
}

/**
 * `size` distinct bodies spread over `branches` branches under `branchPrefix`.
 * The JSON is serialised once with a marker for the commit and split there, so
 * filling in a commit is one Buffer.concat.
 */
export function generateBodyPool({ size, branchPrefix, branches }: { size: number; branchPrefix: string; branches: number }): BodyTemplate[] {
  const pool: BodyTemplate[] = [];
  for (let i = 0; i < size; i++) {
    const branch = `${branchPrefix}/b${(i % branches) + 1}`;
    const runs = generateLoadRuns(branchPrefix, i);
    const input: ResultSubmission = {
      build: { solver: "Cormorant", version: `9.9.${i}-load`, commit: COMMIT_MARK, branch, pipelineUrl: `https://ci.fenwick-hydro.test/cormorant/load/${i}` },
      runs,
    };
    const text = JSON.stringify({ query: SUBMIT_MUTATION, variables: { input } });
    const [head, tail] = text.split(COMMIT_MARK);
    const headBuf = Buffer.from(head);
    const tailBuf = Buffer.from(tail);
    pool.push({
      branch,
      runCount: runs.length,
      bytes: headBuf.length + 40 + tailBuf.length,
      fill: (commit) => Buffer.concat([headBuf, Buffer.from(commit), tailBuf]),
    });
  }
  return pool;
}

/** A fresh 40-hex-digit commit: random, so no two requests of any run share one. */
export function createRandomCommit(): string {
  return randomBytes(20).toString("hex");
}
