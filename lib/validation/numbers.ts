import { z } from "zod";

// Series carry up to a million numbers; validating them with one zod schema per
// element costs more than the whole analysis. These check an array in one tight
// loop and report the first offending index, so the error still names the field.
export interface NumberArrayRules {
  minLength?: number;
  maxLength: number;
  positive?: boolean;
  strictlyIncreasing?: boolean;
}

export function numberArray(rules: NumberArrayRules) {
  return z.array(z.unknown()).superRefine((values, ctx) => {
    const min = rules.minLength ?? 1;
    if (values.length < min) {
      ctx.addIssue({ code: "custom", message: `needs at least ${min} value${min === 1 ? "" : "s"}, got ${values.length}` });
      return;
    }
    if (values.length > rules.maxLength) {
      ctx.addIssue({ code: "custom", message: `holds ${values.length} values; the limit is ${rules.maxLength}` });
      return;
    }
    let previous = -Infinity;
    for (let i = 0; i < values.length; i++) {
      const v = values[i];
      if (typeof v !== "number" || !Number.isFinite(v)) {
        ctx.addIssue({ code: "custom", path: [i], message: `must be a finite number, got ${describe(v)}` });
        return;
      }
      if (rules.positive && !(v > 0)) {
        ctx.addIssue({ code: "custom", path: [i], message: `must be greater than 0, got ${v}` });
        return;
      }
      if (rules.strictlyIncreasing && !(v > previous)) {
        ctx.addIssue({ code: "custom", path: [i], message: `must be strictly increasing: ${v} follows ${previous}` });
        return;
      }
      previous = v;
    }
  }) as unknown as z.ZodType<number[]>;
}

export const finiteNumber = z.number().refine(Number.isFinite, "must be a finite number");

function describe(v: unknown): string {
  if (typeof v === "number") return String(v);
  if (v === null) return "null";
  return typeof v;
}
