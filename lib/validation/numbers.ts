import { z } from "zod";

// Series carry up to a million numbers; validating them with one zod schema per
// element (z.array(z.number())) allocates a result per number and copies the
// array, which costs more than the whole analysis. These check an array in one
// tight loop, return the same array (no copy) and report the first offending
// index, so the error still names the element: input.runs[3].series[0].y[17].
export interface NumberArrayRules {
  minLength?: number;
  maxLength: number;
  positive?: boolean;
  strictlyIncreasing?: boolean;
}

export function numberArray(rules: NumberArrayRules) {
  return z
    .custom<number[]>((v) => Array.isArray(v), { error: (issue) => `must be a list of numbers, got ${describe(issue.input)}` })
    .superRefine((values, ctx) => {
      const issue = findNumberArrayIssue(values, rules);
      if (issue) ctx.addIssue({ code: "custom", path: issue.index === null ? [] : [issue.index], message: issue.message });
    });
}

/** The first rule an array breaks, with the index of the element (null: the array as a whole). */
export function findNumberArrayIssue(values: readonly unknown[], rules: NumberArrayRules): { index: number | null; message: string } | null {
  const min = rules.minLength ?? 1;
  if (values.length < min) return { index: null, message: `needs at least ${min} value${min === 1 ? "" : "s"}, got ${values.length}` };
  if (values.length > rules.maxLength) return { index: null, message: `holds ${values.length} values; the limit is ${rules.maxLength}` };
  const { positive = false, strictlyIncreasing = false } = rules;
  let previous = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    // typeof + a subtraction is the cheapest finite test: NaN and ±Infinity give NaN.
    if (typeof v !== "number" || v - v !== 0) return { index: i, message: `must be a finite number, got ${describe(v)}` };
    if (positive && !(v > 0)) return { index: i, message: `must be greater than 0, got ${v}` };
    if (strictlyIncreasing && !(v > previous)) return { index: i, message: `must be strictly increasing: ${v} follows ${previous}` };
    previous = v;
  }
  return null;
}

export const finiteNumber = z.number().refine(Number.isFinite, "must be a finite number");

function describe(v: unknown): string {
  if (typeof v === "number") return String(v);
  if (typeof v === "string") return v.length > 40 ? `a string of ${v.length} characters` : JSON.stringify(v);
  if (v === null) return "null";
  if (Array.isArray(v)) return "a list";
  return typeof v;
}
