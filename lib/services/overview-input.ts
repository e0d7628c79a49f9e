import type { z } from "zod";
import { AppError, formatPath } from "@/lib/errors";

// zod parsing for the morning-view, trend and case-library services: a failed
// parse becomes one invalid_input AppError listing every field issue.
export function parseInput<T>(schema: z.ZodType<T>, unsafeInput: unknown): T {
  const r = schema.safeParse(unsafeInput ?? {});
  if (r.success) return r.data;
  const issues = r.error.issues.map((i) => ({ path: formatPath(i.path, ""), message: i.message }));
  throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
}
