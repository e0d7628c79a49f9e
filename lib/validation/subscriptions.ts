import { z } from "zod";

// One alert subscription as the settings form and the GraphQL mutation send it.
// An empty case or branch means "every case" / "every branch".

const emptyToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);

export const subscriptionInputSchema = z.object({
  caseKey: z.preprocess(
    emptyToNull,
    z.string().trim().max(64).regex(/^[a-z0-9][a-z0-9-]*$/, "must be a case key (lower-case letters, digits, dashes)").nullable().default(null),
  ),
  branch: z.preprocess(
    emptyToNull,
    z.string().trim().max(200, "must be at most 200 characters").regex(/^[A-Za-z0-9._\/-]+$/, "must be a branch name (letters, digits, . _ / -)").nullable().default(null),
  ),
  mode: z.enum(["immediate", "digest"], { error: "must be immediate or digest" }),
});

export type SubscriptionInput = z.infer<typeof subscriptionInputSchema>;

export const subscriptionIdSchema = z.coerce.number({ error: "must be a subscription id" }).int().positive();
