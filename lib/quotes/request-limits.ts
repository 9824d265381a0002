import { z } from "zod";
import type { Database } from "@/db/client";
import { hitRateLimit, type RateLimitVerdict } from "@/lib/rate-limit/rate-limit";

const WINDOW_SECONDS = 10 * 60;
const countSchema = z.coerce.number().int().min(1).max(10_000);

/**
 * Requests allowed per 10 minutes from one address (default 5) and for one e-mail address
 * (default 3). QUOTE_LIMIT_PER_ADDRESS and QUOTE_LIMIT_PER_EMAIL change them, e.g. for a load test.
 */
export function quoteRequestLimits(env: NodeJS.ProcessEnv = process.env) {
  const read = (value: string | undefined, fallback: number) => countSchema.catch(fallback).parse(value || fallback);
  return {
    perAddress: { limit: read(env.QUOTE_LIMIT_PER_ADDRESS, 5), windowSeconds: WINDOW_SECONDS },
    perEmail: { limit: read(env.QUOTE_LIMIT_PER_EMAIL, 3), windowSeconds: WINDOW_SECONDS },
  };
}

export function hitAddressLimit(db: Database, address: string): Promise<RateLimitVerdict> {
  return hitRateLimit(db, `quote-request:address:${address}`, quoteRequestLimits().perAddress);
}

export function hitEmailLimit(db: Database, email: string): Promise<RateLimitVerdict> {
  return hitRateLimit(db, `quote-request:email:${email.trim().toLowerCase()}`, quoteRequestLimits().perEmail);
}
