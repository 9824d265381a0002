import { lt, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { rateLimitHit } from "@/db/schema";

export interface RateLimit {
  /** Most requests allowed in one window. */
  limit: number;
  windowSeconds: number;
}

export type RateLimitVerdict = { allowed: true; remaining: number } | { allowed: false; retryAfterSeconds: number };

/**
 * Counts one request against `key` in the current fixed window, in the database so that every
 * server process shares the count. Windows older than a day are pruned now and then.
 */
export async function hitRateLimit(db: Database, key: string, { limit, windowSeconds }: RateLimit, now = new Date()): Promise<RateLimitVerdict> {
  const windowMs = windowSeconds * 1000;
  const windowStart = new Date(Math.floor(now.getTime() / windowMs) * windowMs);
  const [row] = await db
    .insert(rateLimitHit)
    .values({ key, windowStart, hits: 1 })
    .onConflictDoUpdate({ target: [rateLimitHit.key, rateLimitHit.windowStart], set: { hits: sql`${rateLimitHit.hits} + 1` } })
    .returning({ hits: rateLimitHit.hits });
  if (Math.random() < 0.01) await db.delete(rateLimitHit).where(lt(rateLimitHit.windowStart, new Date(now.getTime() - 86_400_000)));
  const hits = row?.hits ?? 1;
  if (hits <= limit) return { allowed: true, remaining: limit - hits };
  return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil((windowStart.getTime() + windowMs - now.getTime()) / 1000)) };
}
