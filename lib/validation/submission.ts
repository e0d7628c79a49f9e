import { z } from "zod";
import { SUBMISSION_LIMITS } from "./limits";
import { branchName, label } from "./names";
import { findNumberArrayIssue, finiteNumber } from "./numbers";

// The CI contract (DESIGN.md, "Public CI contract"), checked at the boundary.
// GraphQL has already checked the types of scalars; series arrive unchecked from
// the FloatSeries scalar and are checked here in one pass per array. This adds
// the physics and sanity rules. Every string has a maximum length, checked first.

export { SUBMISSION_LIMITS };

const slug = z
  .string()
  .max(64, "must be at most 64 characters")
  .trim()
  .min(1, "must not be empty")
  .regex(/^[a-z0-9][a-z0-9-]*$/, "must be lower-case letters, digits and dashes");

const quantityKey = z
  .string()
  .max(64, "must be at most 64 characters")
  .trim()
  .min(1, "must not be empty")
  .regex(/^[A-Za-z][A-Za-z0-9_]*$/, "must start with a letter and hold only letters, digits and underscores");

export const buildInputSchema = z.object({
  solver: label(100),
  version: label(100),
  commit: z
    .string()
    .max(64, "must be a commit hash of 7 to 64 hexadecimal digits")
    .trim()
    .regex(/^[0-9a-fA-F]{7,64}$/, "must be a commit hash of 7 to 64 hexadecimal digits")
    .transform((s) => s.toLowerCase()),
  branch: branchName,
  pipelineUrl: z
    .url({ protocol: /^https?$/, error: "must be an http(s) URL" })
    .max(2000, "must be at most 2000 characters")
    .nullish(),
});

// What each series key the server knows requires of its data for the derivation.
const SERIES_RULES: Record<string, { x: { positive?: boolean; strictlyIncreasing?: boolean }; y: { positive?: boolean } }> = {
  u_plus: { x: { positive: true, strictlyIncreasing: true }, y: {} },
  k_decay: { x: { strictlyIncreasing: true }, y: { positive: true } },
  cf: { x: { strictlyIncreasing: true }, y: {} },
  residual: { x: { strictlyIncreasing: true }, y: { positive: true } },
};

const seriesSchema = z
  .object({ key: quantityKey, x: z.unknown(), y: z.unknown() })
  .superRefine((s, ctx) => {
    const rules = SERIES_RULES[s.key] ?? { x: {}, y: {} };
    for (const axis of ["x", "y"] as const) {
      const values = s[axis];
      if (!Array.isArray(values)) {
        ctx.addIssue({ code: "custom", path: [axis], message: "must be a list of numbers" });
        return;
      }
      const issue = findNumberArrayIssue(values, { maxLength: SUBMISSION_LIMITS.pointsPerSeries, ...rules[axis] });
      if (issue) {
        ctx.addIssue({ code: "custom", path: issue.index === null ? [axis] : [axis, issue.index], message: issue.message });
        return;
      }
    }
    if (!Array.isArray(s.x) || !Array.isArray(s.y)) return;
    if (s.x.length !== s.y.length) {
      ctx.addIssue({ code: "custom", path: ["y"], message: `has ${s.y.length} values but x has ${s.x.length}; they must match` });
    }
  }) as unknown as z.ZodType<{ key: string; x: number[]; y: number[] }>;

const stressSampleSchema = z.object({
  at: finiteNumber,
  uu: finiteNumber,
  vv: finiteNumber,
  ww: finiteNumber,
  uv: finiteNumber,
  uw: finiteNumber,
  vw: finiteNumber,
});

const gridStudySchema = z
  .object({
    quantity: quantityKey,
    cells: z.array(finiteNumber).length(3, "must hold exactly 3 cell counts (fine, medium, coarse)"),
    values: z.array(finiteNumber).length(3, "must hold exactly 3 values (fine, medium, coarse)"),
    dimension: z.number().int().min(1).max(3, "must be 1, 2 or 3"),
  })
  .superRefine((g, ctx) => {
    g.cells.forEach((n, i) => {
      if (!(n > 0)) ctx.addIssue({ code: "custom", path: ["cells", i], message: `must be a positive cell count, got ${n}` });
    });
    if (g.cells.every((n) => n > 0) && !(g.cells[0] > g.cells[1] && g.cells[1] > g.cells[2])) {
      ctx.addIssue({ code: "custom", path: ["cells"], message: "must be strictly decreasing, ordered fine to coarse" });
    }
  });

const reportedQuantity = z.object({ key: quantityKey, value: finiteNumber });
const coefficient = z.object({ name: label(64), value: finiteNumber });

export const runInputSchema = z
  .object({
    case: slug,
    model: slug,
    grid: slug.nullish().transform((g) => g ?? "default"),
    status: z.enum(["COMPLETED", "DIVERGED", "CRASHED", "TIMEOUT"]),
    iterations: z.number().int().min(0, "must not be negative").nullish(),
    wallSeconds: finiteNumber.pipe(z.number().min(0, "must not be negative")).nullish(),
    quantities: z.array(reportedQuantity).max(SUBMISSION_LIMITS.quantitiesPerRun).nullish(),
    series: z.array(seriesSchema).max(SUBMISSION_LIMITS.seriesPerRun).nullish(),
    stresses: z.array(stressSampleSchema).max(SUBMISSION_LIMITS.stressSamplesPerRun).nullish(),
    gridStudy: gridStudySchema.nullish(),
    coefficients: z
      .array(coefficient)
      .max(SUBMISSION_LIMITS.coefficientsPerRun)
      .nullish(),
  })
  .superRefine((run, ctx) => {
    flagDuplicates(run.quantities?.map((q) => q.key), "quantities", "key", ctx);
    flagDuplicates(run.series?.map((s) => s.key), "series", "key", ctx);
    flagDuplicates(run.coefficients?.map((c) => c.name), "coefficients", "name", ctx);
  });

export const submissionSchema = z
  .object({
    build: buildInputSchema,
    runs: z.array(runInputSchema).min(1, "must hold at least one run").max(SUBMISSION_LIMITS.runs),
  })
  .superRefine((s, ctx) => {
    const seen = new Map<string, number>();
    s.runs.forEach((r, i) => {
      const id = `${r.case}|${r.model}|${r.grid}`;
      const first = seen.get(id);
      if (first !== undefined) {
        ctx.addIssue({
          code: "custom",
          path: ["runs", i],
          message: `repeats case ${r.case}, model ${r.model}, grid ${r.grid} already given in runs[${first}]`,
        });
      } else seen.set(id, i);
    });
  });

export type ResultSubmission = z.infer<typeof submissionSchema>;
export type RunSubmission = z.infer<typeof runInputSchema>;

function flagDuplicates(keys: string[] | undefined, field: string, prop: string, ctx: z.RefinementCtx) {
  if (!keys) return;
  const seen = new Set<string>();
  keys.forEach((k, i) => {
    if (seen.has(k)) ctx.addIssue({ code: "custom", path: [field, i, prop], message: `repeats ${prop} "${k}"` });
    seen.add(k);
  });
}
