import { and, asc, eq, gt, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { rateLimitHit } from "@/db/schema";

/** Failed sign-ins an account may have before each further attempt must wait. */
export const FAILURES_BEFORE_WAIT = 5;
const FIRST_WAIT_SECONDS = 30;
const LONGEST_WAIT_SECONDS = 15 * 60;
/** Failures are forgotten once this much time passes without one, counted from the end of any wait. */
const FORGET_AFTER_MS = 15 * 60 * 1000;
const DAY_MS = 86_400_000;

/**
 * How long the next attempt must wait after this many failures: nothing up to 5, then 30 s,
 * doubling with each further failure up to 15 minutes. Never a lock: the account always opens
 * again, and a password reset by e-mail clears the count (OWASP Authentication Cheat Sheet,
 * "Account Lockout": throttle rather than lock, so that a stranger cannot lock an owner out).
 */
export function waitSecondsAfter(failures: number): number {
  if (failures < FAILURES_BEFORE_WAIT) return 0;
  return Math.min(LONGEST_WAIT_SECONDS, FIRST_WAIT_SECONDS * 2 ** (failures - FAILURES_BEFORE_WAIT));
}

export interface FailureRecord {
  at: Date;
  count: number;
}

/** The seconds the next attempt must still wait, from the account's failures (oldest first); 0 lets it through. */
export function retryAfterSeconds(failures: readonly FailureRecord[], now: Date): number {
  let count = 0;
  let last: number | null = null;
  const forgotten = (from: number, to: number) => to - from > waitSecondsAfter(count) * 1000 + FORGET_AFTER_MS;
  for (const failure of failures) {
    const at = failure.at.getTime();
    if (last !== null && forgotten(last, at)) count = 0;
    count += failure.count;
    last = at;
  }
  if (last === null || forgotten(last, now.getTime())) return 0;
  return Math.max(0, Math.ceil((last + waitSecondsAfter(count) * 1000 - now.getTime()) / 1000));
}

// Kept in the rate-limit table, one row per failure time, so that every server process agrees.
const keyFor = (email: string) => `sign-in-failure:${email.trim().toLowerCase()}`;

/** Seconds before this account may try to sign in again, whatever address the attempt comes from. */
export async function signInWaitSeconds(db: Database, email: string, now = new Date()): Promise<number> {
  const rows = await db
    .select({ at: rateLimitHit.windowStart, count: rateLimitHit.hits })
    .from(rateLimitHit)
    .where(and(eq(rateLimitHit.key, keyFor(email)), gt(rateLimitHit.windowStart, new Date(now.getTime() - DAY_MS))))
    .orderBy(asc(rateLimitHit.windowStart));
  return retryAfterSeconds(rows, now);
}

export async function recordSignInFailure(db: Database, email: string, now = new Date()): Promise<void> {
  await db
    .insert(rateLimitHit)
    .values({ key: keyFor(email), windowStart: now, hits: 1 })
    .onConflictDoUpdate({ target: [rateLimitHit.key, rateLimitHit.windowStart], set: { hits: sql`${rateLimitHit.hits} + 1` } });
}

/** After a successful sign-in or a password reset. */
export async function clearSignInFailures(db: Database, email: string): Promise<void> {
  await db.delete(rateLimitHit).where(eq(rateLimitHit.key, keyFor(email)));
}
