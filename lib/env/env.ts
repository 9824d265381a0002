import { z } from "zod";

const httpUrl = (name: string) => z.url({ protocol: /^https?$/, error: `${name} must be an http(s) address` });
const count = (fallback: number) => z.coerce.number().int().min(1).max(10_000).default(fallback);

/** Every setting the server reads, with its default; README's Configuration table lists the same. */
const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().regex(/^postgres(ql)?:\/\//, "DATABASE_URL must start with postgres:// or postgresql://").optional(),
  PGLITE_DATA_DIR: z.string().min(1).default(".data/pglite"),
  DEMO_SEED: z.enum(["on", "off"]).default("on"),
  BETTER_AUTH_URL: httpUrl("BETTER_AUTH_URL").default("http://localhost:3000"),
  BETTER_AUTH_SECRET: z.string().min(32, "BETTER_AUTH_SECRET must be at least 32 characters").optional(),
  SITE_URL: httpUrl("SITE_URL").optional(),
  RESEND_BASE_URL: httpUrl("RESEND_BASE_URL").optional(),
  RESEND_API_KEY: z.string().min(1).optional(),
  EMAIL_FROM: z.string().min(3).default("Marrowby Tire Works <counter@marrowby-tire.test>"),
  FIT_CARD_EMAIL_LIMIT_PER_HOUR: count(20),
  QUOTE_LIMIT_PER_ADDRESS: count(5),
  QUOTE_LIMIT_PER_EMAIL: count(3),
  /** The server's five-minute step that releases holds whose day has ended and sends the day-before fitting reminders. */
  FITTING_SCHEDULE: z.enum(["on", "off"]).default("on"),
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0, "TRUSTED_PROXY_HOPS must be a whole number from 0 to 10").max(10, "TRUSTED_PROXY_HOPS must be a whole number from 0 to 10").default(1),
});

export type Env = z.infer<typeof envSchema>;

const NAMES = Object.keys(envSchema.shape) as (keyof Env)[];
let cached: { key: string; env: Env } | undefined;

/**
 * The server's settings, validated in one place; a bad value fails loudly, naming the variable. The
 * process's own environment is parsed once and again only if one of these variables changes (tests
 * change them); an empty value counts as unset.
 */
export function readEnv(source: Record<string, string | undefined> = process.env): Env {
  const values = Object.fromEntries(NAMES.map((name) => [name, source[name]?.trim() || undefined]));
  const key = JSON.stringify(values);
  if (source === process.env && cached?.key === key) return cached.env;
  const parsed = envSchema.safeParse(values);
  if (!parsed.success) {
    throw new Error(`Invalid environment: ${parsed.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`).join("; ")}`);
  }
  if (source === process.env) cached = { key, env: parsed.data };
  return parsed.data;
}
