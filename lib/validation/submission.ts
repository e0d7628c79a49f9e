import { z } from "zod";
import { finiteNumber, numberArray } from "./numbers";

// The CI contract (DESIGN.md, "Public CI contract"), checked at the boundary.
// GraphQL has already checked the types; this adds the physics and sanity rules.

export const SUBMISSION_LIMITS = {
  runs: 5000,
  quantitiesPerRun: 1000,
  seriesPerRun: 50,
  pointsPerSeries: 1_000_000,
  stressSamplesPerRun: 100_000,
  coefficientsPerRun: 500,
} as const;

const slug = z
  .string()
  .trim()
  .min(1, "must not be empty")
  .max(64, "must be at most 64 characters")
  .regex(/^[a-z0-9][a-z0-9-]*$/, "must be lower-case letters, digits and dashes");

const quantityKey = z
  .string()
  .trim()
  .min(1, "must not be empty")
  .max(64, "must be at most 64 characters")
  .regex(/^[A-Za-z][A-Za-z0-9_]*$/, "must start with a letter and hold only letters, digits and underscores");

const label = (max: number) => z.string().trim().min(1, "must not be empty").max(max, `must be at most ${max} characters`);

export const buildInputSchema = z.object({
  solver: label(100),
  version: label(100),
  commit: z
    .string()
    .trim()
    .regex(/^[0-9a-fA-F]{7,64}$/, "must be a commit hash of 7 to 64 hexadecimal digits")
    .transform((s) => s.toLowerCase()),
  branch: label(200).regex(/^[A-Za-z0-9._\/-]+$/, "must be a branch name (letters, digits, . _ / -)"),
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
  .object({ key: quantityKey, x: z.array(z.unknown()), y: z.array(z.unknown()) })
  .superRefine((s, ctx) => {
    const rules = SERIES_RULES[s.key] ?? { x: {}, y: {} };
    const max = SUBMISSION_LIMITS.pointsPerSeries;
    for (const axis of ["x", "y"] as const) {
      const parsed = numberArray({ maxLength: max, ...rules[axis] }).safeParse(s[axis]);
      if (!parsed.success) {
        for (const issue of parsed.error.issues) ctx.addIssue({ code: "custom", path: [axis, ...issue.path], message: issue.message });
        return;
      }
    }
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
