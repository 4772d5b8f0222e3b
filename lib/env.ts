import { z } from "zod";

/** Dev-only fallback secret. Never used when NODE_ENV=production unless BETTER_AUTH_SECRET is set. */
export const DEV_ONLY_AUTH_SECRET = "knotwork-dev-only-secret-do-not-use-in-production-0000";

const EnvSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().min(1).default("file:./data/knotwork.db"),
  DATABASE_AUTH_TOKEN: z.string().optional(),
  BETTER_AUTH_SECRET: z.string().min(32).optional(),
  BETTER_AUTH_URL: z.url().default("http://localhost:3000"),
  AUTH_RATE_LIMIT_WINDOW: z.coerce.number().int().positive().default(60),
  AUTH_RATE_LIMIT_MAX: z.coerce.number().int().positive().default(60),
  /** Sign-in attempts per window from one address (on top of the per-account limit). */
  AUTH_SIGN_IN_MAX: z.coerce.number().int().positive().default(10),
  /** Reverse proxies whose X-Forwarded-For is believed (addresses or CIDR ranges, comma separated); unset: the socket address. */
  TRUSTED_PROXY: z.string().optional(),
  UPLOADTHING_TOKEN: z.string().optional(),
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default("Knotwork <no-reply@knotwork.test>"),
});

export type Env = z.infer<typeof EnvSchema>;

/** Parses the environment each call, so tests can set variables before opening the database. */
export function readEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const cleaned = Object.fromEntries(
    Object.entries(source).filter(([, v]) => v !== undefined && v !== ""),
  );
  const parsed = EnvSchema.safeParse(cleaned);
  if (!parsed.success) {
    const fields = Object.keys(z.flattenError(parsed.error).fieldErrors).join(", ");
    throw new Error(`Invalid environment variables: ${fields}`);
  }
  return parsed.data;
}

/** The auth secret: the configured one, or the labelled dev-only fallback outside production. */
export function authSecret(env: Env = readEnv()): string {
  if (env.BETTER_AUTH_SECRET) return env.BETTER_AUTH_SECRET;
  const building = process.env.NEXT_PHASE === "phase-production-build";
  if (env.NODE_ENV === "production" && !building) {
    throw new Error("BETTER_AUTH_SECRET must be set (32+ characters) in production.");
  }
  return DEV_ONLY_AUTH_SECRET;
}
