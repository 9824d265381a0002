import type { Database } from "@/db/client";
import { readEnv } from "@/lib/env/env";
import { hitRateLimit, type RateLimitVerdict } from "@/lib/rate-limit/rate-limit";

const WINDOW_SECONDS = 10 * 60;

/**
 * Requests allowed per 10 minutes from one address (default 5) and for one e-mail address
 * (default 3). QUOTE_LIMIT_PER_ADDRESS and QUOTE_LIMIT_PER_EMAIL change them, e.g. for a load test.
 */
export function quoteRequestLimits() {
  const env = readEnv();
  return {
    perAddress: { limit: env.QUOTE_LIMIT_PER_ADDRESS, windowSeconds: WINDOW_SECONDS },
    perEmail: { limit: env.QUOTE_LIMIT_PER_EMAIL, windowSeconds: WINDOW_SECONDS },
  };
}

export function hitAddressLimit(db: Database, address: string): Promise<RateLimitVerdict> {
  return hitRateLimit(db, `quote-request:address:${address}`, quoteRequestLimits().perAddress);
}

export function hitEmailLimit(db: Database, email: string): Promise<RateLimitVerdict> {
  return hitRateLimit(db, `quote-request:email:${email.trim().toLowerCase()}`, quoteRequestLimits().perEmail);
}
