import { z } from "zod";
import { NO_NUL } from "./names";
import { fitSettingsSchema } from "./band";

// Inputs of the case-library editor (QA lead). The same schemas run in the form
// (errors per field before anything is sent) and in the services (the authority).

const slug = z
  .string()
  .trim()
  .min(1, "must not be empty")
  .max(64, "must be at most 64 characters")
  .regex(/^[a-z0-9][a-z0-9-]*$/, "must be lower-case letters, digits and dashes");

/** Every library change says why; the reason is kept in the change record. */
export const changeReason = z
  .string()
  .trim()
  .min(10, "must say why (at least 10 characters)")
  .max(2000, "must be at most 2000 characters")
  .refine(...NO_NUL);

const text = (min: number, max: number, what: string) =>
  z.string().trim().min(min, min <= 1 ? "must not be empty" : `must be at least ${min} characters: ${what}`).max(max, `must be at most ${max} characters`).refine(...NO_NUL);

const caseFields = {
  title: text(3, 200, "the case as an engineer names it"),
  description: text(10, 4000, "what the case checks and how it is set up"),
  models: z
    .array(slug)
    .min(1, "choose at least one turbulence model")
    .max(20, "must list at most 20 models")
    .refine((m) => new Set(m).size === m.length, "lists a model twice"),
  parameters: fitSettingsSchema.default({}),
  reason: changeReason,
};

export const caseCreateSchema = z.object({ key: slug, ...caseFields });
export const caseRevisionSchema = z.object(caseFields);

export type CaseCreate = z.infer<typeof caseCreateSchema>;
export type CaseRevision = z.infer<typeof caseRevisionSchema>;

const quantityFields = {
  label: text(1, 120, ""),
  // SI or trade units as written on the plots; "1" marks a dimensionless quantity.
  unit: text(1, 40, "").regex(/^[^\s].*$/, "must not start with a space"),
  meaning: text(10, 1000, "how the value is defined, so a reader can recompute it"),
  reason: changeReason,
};

/**
 * A new quantity definition. Its origin is not an input: the server derives only
 * the quantities its analysis code knows (all already defined), so a new key is
 * always reported by the run.
 */
export const quantityCreateSchema = z.object({
  key: z
    .string()
    .trim()
    .min(1, "must not be empty")
    .max(64, "must be at most 64 characters")
    .regex(/^[a-z][a-z0-9_]*$/, "must be lower-case snake_case, starting with a letter (the key CI reports it under)"),
  ...quantityFields,
});
export const quantityRevisionSchema = z.object(quantityFields);

export type QuantityCreate = z.infer<typeof quantityCreateSchema>;
export type QuantityRevision = z.infer<typeof quantityRevisionSchema>;

/** Most builds one re-judgement may cover; a picker shows far fewer. */
export const REEVALUATION_MAX_BUILDS = 100;

export const reevaluationRequestSchema = z.object({
  buildIds: z
    .array(z.string().regex(/^[1-9][0-9]{0,15}$/, "must be a build id").transform(Number))
    .min(1, "choose at least one build")
    .max(REEVALUATION_MAX_BUILDS, `must list at most ${REEVALUATION_MAX_BUILDS} builds`)
    .refine((ids) => new Set(ids).size === ids.length, "lists a build twice"),
  /** The case whose band change prompted it, so the case's change record lists it. */
  caseKey: slug.nullish().transform((k) => k ?? null),
  reason: changeReason,
});

export type ReevaluationRequest = z.infer<typeof reevaluationRequestSchema>;

/** One band scope of a case: a quantity for one model, or for all models (model null). */
export const bandScopeSchema = z.object({
  caseKey: slug,
  quantityKey: z.string().trim().min(1).max(64).regex(/^[A-Za-z][A-Za-z0-9_]*$/, "must be a quantity key"),
  model: slug.nullish().transform((m) => m ?? null),
});

export const reevaluationCandidatesSchema = bandScopeSchema.extend({
  branch: z.string().trim().min(1).max(200).nullish().transform((b) => b ?? null),
  last: z.number().int().min(1, "must be at least 1").max(REEVALUATION_MAX_BUILDS, `must be at most ${REEVALUATION_MAX_BUILDS}`).default(30),
});

/** Issues keyed by dotted field path ("fitSettings.logLawWindow.yPlusMax"); the first message per field wins. */
export function fieldErrorsOf(issues: readonly { path: readonly PropertyKey[]; message: string }[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join(".") || "form";
    out[key] ??= issue.message;
  }
  return out;
}
