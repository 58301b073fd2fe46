import { z } from "zod";

/**
 * Every setting Clearhall reads, checked once. Demo defaults keep a fresh clone
 * runnable; in production the secret has no default, so start-up stops with a
 * message naming what is missing instead of running with a guessable key.
 */
const envSchema = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  DATABASE_URL: z.string().min(1).default("./data/clearhall.db"),
  SMTP_URL: z.url({ protocol: /^smtps?$/ }).default("smtp://127.0.0.1:1025"),
  APP_URL: z.url({ protocol: /^https?$/ }).default("http://localhost:3000"),
  AUTH_SECRET: z.string().min(32, "AUTH_SECRET must be at least 32 characters").optional(),
  MAIL_FROM: z.string().min(3).default("Wrenmoor Valley Schools <reopening@example.org>"),
  MAIL_SENDER_INTERVAL_MS: z.coerce.number().int().min(200).default(2_000),
  MAIL_MAX_ATTEMPTS: z.coerce.number().int().min(1).max(50).default(12),
  MAIL_SENDER_DISABLED: z
    .enum(["0", "1", "true", "false"])
    .default("0")
    .transform((v) => v === "1" || v === "true"),
  // Public questions accepted per IP address, and per e-mail address, in a sliding window.
  ASK_RATE_LIMIT_COUNT: z.coerce.number().int().min(1).max(1_000).default(5),
  ASK_RATE_LIMIT_WINDOW_MINUTES: z.coerce.number().int().min(1).max(24 * 60).default(10),
  // How many reverse proxies in front of the app append to X-Forwarded-For; 0 = the header is not trusted.
  TRUST_PROXY: z.coerce.number().int().min(0).max(10).default(0),
});

export type Env = z.infer<typeof envSchema> & { AUTH_SECRET: string };

/** Used only outside production, so sessions in dev and tests need no set-up. */
const DEVELOPMENT_SECRET = "clearhall-development-secret-not-for-production-use";

export class EnvError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "EnvError";
  }
}

export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `  ${issue.path.join(".") || "(env)"}: ${issue.message}`);
    throw new EnvError(`Clearhall cannot start: some settings are invalid.\n${lines.join("\n")}`);
  }
  const env = result.data;
  // `next build` runs with NODE_ENV=production but serves nobody; the secret is checked when the server starts.
  const building = source.NEXT_PHASE === "phase-production-build";
  if (!env.AUTH_SECRET) {
    if (env.NODE_ENV === "production" && !building) {
      throw new EnvError(
        "Clearhall cannot start: AUTH_SECRET is not set. Set it to a random string of 32 or more characters, " +
          'for example the output of `node -e "console.log(require(\'crypto\').randomBytes(32).toString(\'base64url\'))"`.',
      );
    }
    return { ...env, AUTH_SECRET: DEVELOPMENT_SECRET };
  }
  return { ...env, AUTH_SECRET: env.AUTH_SECRET };
}

let cached: Env | undefined;

export function env(): Env {
  cached ??= parseEnv(process.env);
  return cached;
}
