import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { recordSignInFailure, retryAfterSeconds, signInWaitSeconds, waitSecondsAfter } from "@/lib/auth/sign-in-throttle";
import { APP_ORIGIN } from "../integration/helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

const at = (minute: number, second = 0) => new Date(Date.UTC(2026, 11, 4, 9, minute, second));
const failures = (...times: Date[]) => times.map((time) => ({ at: time, count: 1 }));

// OWASP Authentication Cheat Sheet ("Account Lockout"): a growing delay per account rather than a
// lock that a stranger could keep shut.
describe("the wait after failed sign-ins for one account", () => {
  it("starts after the fifth failure at 30 s and doubles with each further one, up to 15 minutes", () => {
    expect([1, 4, 5, 6, 7, 8, 9, 10, 20].map(waitSecondsAfter)).toEqual([0, 0, 30, 60, 120, 240, 480, 900, 900]);
  });

  it("makes the sixth attempt within the wait answer with the seconds left, and lets one through after it", () => {
    const five = failures(at(0), at(1), at(2), at(3), at(4));
    expect(retryAfterSeconds(five.slice(0, 4), at(4, 1))).toBe(0);
    expect(retryAfterSeconds(five, at(4, 10))).toBe(20);
    expect(retryAfterSeconds(five, at(4, 30))).toBe(0);
    expect(retryAfterSeconds([...five, ...failures(at(4, 40))], at(4, 41))).toBe(59);
  });

  it("forgets failures once 15 minutes pass without one after the wait, and never locks for good", () => {
    const many = failures(...Array.from({ length: 12 }, (_, i) => at(i)));
    expect(retryAfterSeconds(many, at(12))).toBe(840);
    expect(retryAfterSeconds(many, at(26))).toBe(0);
    expect(retryAfterSeconds([...failures(at(0), at(1), at(2), at(3)), ...failures(at(40))], at(40, 1))).toBe(0);
  });
});

describe("sign-in throttling through the sign-in service", () => {
  let sent = 0;
  const attempt = (email: string, password: string) => {
    sent += 1;
    return authPost(
      new NextRequest(`${APP_ORIGIN}/api/auth/sign-in/email`, {
        method: "POST",
        // Each attempt from another address: the limit is the account's, not the address's.
        headers: { origin: APP_ORIGIN, "content-type": "application/json", "x-forwarded-for": `198.51.100.${sent}` },
        body: JSON.stringify({ email, password }),
      }),
    );
  };

  beforeAll(async () => {
    vi.stubEnv("DATABASE_URL", "");
    vi.stubEnv("PGLITE_DATA_DIR", "memory://");
    vi.stubEnv("DEMO_SEED", "off");
    await seedDemoAccounts(await getDb());
  });
  afterAll(async () => {
    await (await getDatabaseHandle()).close();
    vi.unstubAllEnvs();
  });

  it("answers 429 with Retry-After after 5 failures for one account from 5 addresses, even to the right password", async () => {
    for (let i = 0; i < 5; i++) expect((await attempt("admin@sidewise.test", `wrong-${i}`)).status).toBe(401);
    const refused = await attempt("Admin@Sidewise.test", "sidewise-demo");
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(Number(refused.headers.get("retry-after"))).toBeLessThanOrEqual(30);
    expect((await refused.json()).message).toMatch(/^Too many failed sign-ins for this account\. Try again in \d+ seconds, or reset the password\.$/);
    // Other accounts are untouched.
    expect((await attempt("staff@sidewise.test", "sidewise-demo")).status).toBe(200);
  });

  it("treats an unknown address like a known one, so the answer tells nobody which accounts exist", async () => {
    for (let i = 0; i < 5; i++) expect((await attempt("nobody@sidewise.test", `wrong-${i}`)).status).toBe(401);
    expect((await attempt("nobody@sidewise.test", "anything")).status).toBe(429);
  });

  it("clears an account's failures when it signs in", async () => {
    for (let i = 0; i < 4; i++) expect((await attempt("customer@sidewise.test", `wrong-${i}`)).status).toBe(401);
    expect((await attempt("customer@sidewise.test", "sidewise-demo")).status).toBe(200);
    for (let i = 0; i < 4; i++) expect((await attempt("customer@sidewise.test", `again-${i}`)).status).toBe(401);
    expect((await attempt("customer@sidewise.test", "sidewise-demo")).status).toBe(200);
  });

  it("grows the wait with each failure recorded after it, as stored in the database", async () => {
    const db = await getDb();
    const email = "grows@sidewise.test";
    for (let i = 0; i < 5; i++) await recordSignInFailure(db, email, at(0, i));
    expect(await signInWaitSeconds(db, email, at(0, 5))).toBe(29);
    await recordSignInFailure(db, email, at(1));
    expect(await signInWaitSeconds(db, email, at(1))).toBe(60);
    await recordSignInFailure(db, email, at(3));
    expect(await signInWaitSeconds(db, email, at(3))).toBe(120);
  });
});
