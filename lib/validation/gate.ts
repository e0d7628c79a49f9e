import { z } from "zod";
import { branchName, NO_NUL } from "./names";

// Inputs of the release gate, shared by the forms (checked in the browser before
// sending) and the services (checked again on the server).

/** A waiver is time-limited: at most this long, so a let-through is looked at again. */
export const MAX_WAIVER_DAYS = 180;
const DAY_MS = 86_400_000;

export const idSchema = z
  .union([z.string(), z.number()])
  .transform((v) => String(v).trim())
  .refine((v) => /^[1-9][0-9]{0,15}$/.test(v), "must be a positive integer id")
  .transform(Number);

const slug = z.string().trim().min(1, "must not be empty").max(64).regex(/^[a-z0-9][a-z0-9-]*$/, "must be lower-case letters, digits and dashes");
const quantityKey = z.string().trim().min(1, "must not be empty").max(64).regex(/^[A-Za-z][A-Za-z0-9_]*$/, "must be a quantity key");
// Any branch a build can be posted on (git's ref rules, lib/validation/names.ts).
export const branchSchema = branchName;

export const decisionStates = ["approved", "held", "rejected"] as const;
export type DecisionState = (typeof decisionStates)[number];

export const gateDecisionSchema = z.object({
  buildId: idSchema,
  state: z.enum(decisionStates, "must be approved, held or rejected"),
  comment: z.string().trim().min(5, "must say why (at least 5 characters)").max(2000, "must be at most 2000 characters").refine(...NO_NUL),
});
export type GateDecisionInput = z.infer<typeof gateDecisionSchema>;

export const waiverGrantSchema = z
  .object({
    case: slug,
    quantity: quantityKey,
    model: slug.nullish().transform((v) => v ?? null),
    branch: branchSchema.nullish().transform((v) => v ?? null),
    reason: z.string().trim().min(10, "must say why the quantity may pass (at least 10 characters)").max(2000).refine(...NO_NUL),
    expiresAt: z.coerce.date("must be a date"),
  })
  .superRefine((w, ctx) => {
    const t = w.expiresAt.getTime();
    if (Number.isNaN(t)) return;
    if (t <= Date.now()) ctx.addIssue({ code: "custom", path: ["expiresAt"], message: "must be in the future" });
    else if (t > Date.now() + MAX_WAIVER_DAYS * DAY_MS) ctx.addIssue({ code: "custom", path: ["expiresAt"], message: `must be at most ${MAX_WAIVER_DAYS} days ahead` });
  });
export type WaiverGrant = z.infer<typeof waiverGrantSchema>;

export const waiverRevokeSchema = z.object({
  id: idSchema,
  reason: z.string().trim().min(10, "must say why the waiver is withdrawn (at least 10 characters)").max(2000).refine(...NO_NUL),
});

export const candidateListSchema = z.object({
  branch: branchSchema.nullish(),
  first: z.number().int().min(1).max(100).default(20),
  offset: z.number().int().min(0).max(1_000_000).default(0),
});

export const waiverListSchema = z.object({
  case: slug.nullish(),
  branch: branchSchema.nullish(),
  includeEnded: z.boolean().default(false),
});

export const commitSchema = z.string().trim().regex(/^[0-9a-fA-F]{7,64}$/, "must be a commit hash of 7 to 64 hexadecimal digits");

/** The end of a calendar day in UTC: a waiver "until 12 Dec" counts through that whole day. */
export function endOfUtcDay(isoDate: string): Date {
  const start = /^\d{4}-\d{2}-\d{2}$/.test(isoDate) ? Date.parse(`${isoDate}T00:00:00.000Z`) : NaN;
  return new Date(Number.isNaN(start) ? NaN : start + DAY_MS);
}
