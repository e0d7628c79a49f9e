import { z } from "zod";
import { NO_NUL } from "./names";

const optionalNumber = z.number().refine(Number.isFinite, "must be a finite number").nullable();
const slug = z.string().trim().min(1, "must not be empty").max(64).regex(/^[a-z0-9][a-z0-9-]*$/, "must be lower-case letters, digits and dashes");

export const fitSettingsSchema = z
  .object({
    reTau: z.number().positive().optional(),
    logLawWindow: z
      .object({ yPlusMin: z.number().positive(), yPlusMax: z.number().positive() })
      .refine((w) => w.yPlusMax > w.yPlusMin, { message: "yPlusMax must exceed yPlusMin", path: ["yPlusMax"] })
      .optional(),
    cfStation: z.number().refine(Number.isFinite).optional(),
    cfStationLabel: z.string().max(200).optional(),
    stepHeight: z.number().positive().optional(),
    residualTargetOrders: z.number().positive().max(20).optional(),
  })
  .strict();

/** A new version of a band: every field of the band plus the reason for the change. */
export const bandRevisionSchema = z
  .object({
    caseKey: slug,
    quantityKey: z.string().trim().min(1).max(64).regex(/^[A-Za-z][A-Za-z0-9_]*$/, "must be a quantity key"),
    model: slug.nullable(),
    kind: z.enum(["verification", "validation"]),
    reference: optionalNumber,
    source: z.string().trim().min(3, "must name the published source").max(1000).refine(...NO_NUL),
    lower: optionalNumber,
    upper: optionalNumber,
    marginalMargin: z.number().min(0, "must not be negative").refine(Number.isFinite),
    noiseFloor: z.number().min(0, "must not be negative").refine(Number.isFinite),
    fitSettings: fitSettingsSchema.default({}),
    reason: z.string().trim().min(10, "must say why the band changes (at least 10 characters)").max(2000).refine(...NO_NUL),
  })
  .superRefine((b, ctx) => {
    if (b.lower === null && b.upper === null) ctx.addIssue({ code: "custom", path: ["lower"], message: "a band needs a lower or an upper limit" });
    if (b.lower !== null && b.upper !== null && b.lower > b.upper) ctx.addIssue({ code: "custom", path: ["upper"], message: "must not be below the lower limit" });
  });

export type BandRevision = z.infer<typeof bandRevisionSchema>;
