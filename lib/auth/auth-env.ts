import { readEnv } from "@/lib/env/env";

const DEVELOPMENT_SECRET = "sidewise-development-secret-not-for-production";

export interface AuthEnv {
  baseURL: string;
  secret: string;
}

/**
 * The app's own origin (RFC 6454 §6.2: scheme, host and port), from BETTER_AUTH_URL: the only origin
 * whose pages may change anything.
 */
export function appOrigin(source: NodeJS.ProcessEnv = process.env): string {
  return new URL(readEnv(source).BETTER_AUTH_URL).origin;
}

let warnedAboutSecret = false;

/** Reads the sign-in settings; without a secret a development one is used, loudly refused to go unnoticed in production. */
export function readAuthEnv(source: NodeJS.ProcessEnv = process.env): AuthEnv {
  const env = readEnv(source);
  if (!env.BETTER_AUTH_SECRET && env.NODE_ENV === "production" && !warnedAboutSecret) {
    warnedAboutSecret = true;
    console.warn(
      "\n!!! BETTER_AUTH_SECRET is not set: sessions are signed with the public development secret. Set it before going live. !!!\n",
    );
  }
  return { baseURL: env.BETTER_AUTH_URL, secret: env.BETTER_AUTH_SECRET ?? DEVELOPMENT_SECRET };
}
