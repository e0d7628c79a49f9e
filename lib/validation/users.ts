import { z } from "zod";
import { NO_NUL } from "./names";

// Inputs of the administration screen and the set-password page, shared by the
// forms (checked before sending) and the services (checked again on the server).

export const ROLES = ["developer", "qa", "release", "admin"] as const;
export const roleSchema = z.enum(ROLES, "must be developer, qa, release or admin");

export const PASSWORD_MIN_CHARS = 10;
// bcrypt reads at most 72 bytes of a password and ignores the rest, so a longer
// one would give a false sense of strength; we refuse it instead of truncating.
export const PASSWORD_MAX_BYTES = 72;

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN_CHARS, `must have at least ${PASSWORD_MIN_CHARS} characters`)
  .refine((s) => new TextEncoder().encode(s).length <= PASSWORD_MAX_BYTES, `must not exceed ${PASSWORD_MAX_BYTES} bytes (bcrypt ignores the rest)`)
  .refine((s) => s.trim().length === s.length, "must not start or end with a space");

const nameSchema = z.string().trim().min(2, "must have at least 2 characters").max(120, "must not exceed 120 characters").refine(...NO_NUL);
const emailSchema = z.string().trim().toLowerCase().max(320, "must not exceed 320 characters").pipe(z.email("must be an e-mail address"));

export const createUserSchema = z.object({ name: nameSchema, email: emailSchema, role: roleSchema, password: passwordSchema }).strict();
export const inviteUserSchema = z.object({ name: nameSchema, email: emailSchema, role: roleSchema }).strict();

export const idSchema = z.coerce.number().int("must be an id").positive("must be an id");
export const setRoleSchema = z.object({ userId: idSchema, role: roleSchema });

// Secrets are 32 random bytes in base64url (43 characters); invite links carry them bare,
// CI tokens with a "tl_" prefix so that a leaked one is recognisable in logs and scanners.
export const INVITE_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;
export const acceptInviteSchema = z
  .object({ token: z.string().regex(INVITE_TOKEN_PATTERN, "is not a set-password link of this server"), password: passwordSchema })
  .strict();

const MAX_TOKEN_LIFETIME_DAYS = 5 * 366;
export const ciTokenSchema = z
  .object({
    name: z.string().trim().min(3, "must have at least 3 characters").max(80, "must not exceed 80 characters").refine(...NO_NUL),
    expiresAt: z.coerce.date("must be a date").nullable().default(null),
  })
  .strict()
  .superRefine((t, ctx) => {
    if (!t.expiresAt) return;
    if (Number.isNaN(t.expiresAt.getTime())) ctx.addIssue({ code: "custom", path: ["expiresAt"], message: "must be a date" });
    else if (t.expiresAt.getTime() <= Date.now()) ctx.addIssue({ code: "custom", path: ["expiresAt"], message: "must be in the future" });
    else if (t.expiresAt.getTime() > Date.now() + MAX_TOKEN_LIFETIME_DAYS * 86_400_000) ctx.addIssue({ code: "custom", path: ["expiresAt"], message: "must be within five years" });
  });

export type CreateUserInput = z.infer<typeof createUserSchema>;
export type InviteUserInput = z.infer<typeof inviteUserSchema>;
export type CiTokenInput = z.infer<typeof ciTokenSchema>;
export type Role = (typeof ROLES)[number];
