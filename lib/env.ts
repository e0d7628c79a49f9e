import { z } from "zod";

// The one place that reads process.env. Everything is validated once, with a
// message that names the variable, so a mis-set deployment fails at start-up
// instead of at the first request.
const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, "must be a postgres:// connection URL")
    .default("postgres://tauline@127.0.0.1:54329/tauline"),
  DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  APP_URL: z.url().default("http://127.0.0.1:3000"),
  NEXTAUTH_SECRET: z.string().min(16, "must be at least 16 characters").optional(),
  SMTP_HOST: z.string().min(1).default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_SECURE: z
    .enum(["true", "false"])
    .default("false")
    .transform((v) => v === "true"),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().min(3).default("Tauline <tauline@fenwick-hydro.test>"),
  MAIL_DIR: z.string().default(".data/mail"),
  TAULINE_CI_TOKEN: z.string().min(16, "must be at least 16 characters").default("tauline-demo-ci-token"),
  TAULINE_DEMO_PASSWORD: z.string().min(8, "must be at least 8 characters").default("cormorant-demo"),
  MAX_BODY_BYTES: z.coerce.number().int().min(1024).default(64 * 1024 * 1024),
  // Sign-in throttle (lib/auth/sign-in-throttle.ts): attempts per account and failed
  // attempts per address within one window; TRUST_PROXY=1 keys the address on the
  // last X-Forwarded-For entry (one reverse proxy in front), else on the connection.
  SIGNIN_ACCOUNT_LIMIT: z.coerce.number().int().min(1).max(1000).default(5),
  SIGNIN_ADDRESS_LIMIT: z.coerce.number().int().min(1).max(100_000).default(30),
  SIGNIN_WINDOW_MINUTES: z.coerce.number().int().min(1).max(24 * 60).default(15),
  TRUST_PROXY: z
    .enum(["0", "1"])
    .default("0")
    .transform((v) => v === "1"),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function getEnv(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment configuration:\n${lines.join("\n")}`);
  }
  cached = parsed.data;
  return cached;
}
