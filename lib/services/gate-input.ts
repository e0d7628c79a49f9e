import type { z } from "zod";
import { AppError, formatPath } from "@/lib/errors";

/** zod parsing for the gate services: a failed parse is one invalid_input error naming every field. */
export function parseGateInput<T>(schema: z.ZodType<T, unknown>, unsafeInput: unknown, prefix = ""): T {
  const r = schema.safeParse(unsafeInput);
  if (r.success) return r.data;
  const issues = r.error.issues.map((i) => ({ path: formatPath(i.path, prefix) || prefix || "input", message: i.message }));
  throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
}
