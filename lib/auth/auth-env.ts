import { z } from "zod";

const DEVELOPMENT_SECRET = "sidewise-development-secret-not-for-production";

const authEnvSchema = z.object({
  BETTER_AUTH_URL: z.url({ protocol: /^https?$/ }).default("http://localhost:3000"),
  BETTER_AUTH_SECRET: z.string().min(32, "BETTER_AUTH_SECRET must be at least 32 characters").optional(),
});

export interface AuthEnv {
  baseURL: string;
  secret: string;
}

/**
 * The app's own origin (RFC 6454 §6.2: scheme, host and port), from BETTER_AUTH_URL: the only origin
 * whose pages may change anything.
 */
export function appOrigin(source: NodeJS.ProcessEnv = process.env): string {
  const parsed = authEnvSchema.shape.BETTER_AUTH_URL.safeParse(source.BETTER_AUTH_URL || undefined);
  if (!parsed.success) throw new Error(`Invalid environment: BETTER_AUTH_URL: ${parsed.error.issues[0]?.message}`);
  return new URL(parsed.data).origin;
}

let warnedAboutSecret = false;

/** Reads the sign-in settings; without a secret a development one is used, loudly refused to go unnoticed in production. */
export function readAuthEnv(source: NodeJS.ProcessEnv = process.env): AuthEnv {
  const parsed = authEnvSchema.safeParse({
    BETTER_AUTH_URL: source.BETTER_AUTH_URL || undefined,
    BETTER_AUTH_SECRET: source.BETTER_AUTH_SECRET || undefined,
  });
  if (!parsed.success) {
    throw new Error(`Invalid environment: ${parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}`);
  }
  const secret = parsed.data.BETTER_AUTH_SECRET;
  if (!secret && source.NODE_ENV === "production" && !warnedAboutSecret) {
    warnedAboutSecret = true;
    console.warn(
      "\n!!! BETTER_AUTH_SECRET is not set: sessions are signed with the public development secret. Set it before going live. !!!\n",
    );
  }
  return { baseURL: parsed.data.BETTER_AUTH_URL, secret: secret ?? DEVELOPMENT_SECRET };
}
