import { z } from "zod";
import { branchName } from "./names";

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
    branchName.nullable().default(null),
  ),
  mode: z.enum(["immediate", "digest"], { error: "must be immediate or digest" }),
});

export type SubscriptionInput = z.infer<typeof subscriptionInputSchema>;

export const subscriptionIdSchema = z.coerce.number({ error: "must be a subscription id" }).int().positive();
