import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as authGet, POST as authPost } from "@/app/api/auth/[...all]/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { answerNoSoonerThan, EQUAL_TIME_MS } from "@/lib/auth/auth-route";
import { type FakeResend, type ReceivedEmail, startFakeResend } from "@/scripts/fake-resend.mjs";
import { APP_ORIGIN, signIn } from "../integration/helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

let fake: FakeResend;
let addresses = 0;

function auth(method: "GET" | "POST", path: string, options: { body?: unknown; cookie?: string } = {}) {
  addresses += 1;
  const request = new NextRequest(`${APP_ORIGIN}/api/auth/${path}`, {
    method,
    headers: {
      origin: APP_ORIGIN,
      "x-forwarded-for": `203.0.113.${addresses % 250}`,
      ...(options.body === undefined ? {} : { "content-type": "application/json" }),
      ...(options.cookie ? { cookie: options.cookie } : {}),
    },
    body: options.body === undefined ? undefined : JSON.stringify(options.body),
  });
  return method === "GET" ? authGet(request) : authPost(request);
}

/** Sending is not awaited by the sign-in service (so that timing reveals no account): wait for the e-mail itself. */
async function emailsTo(address: string): Promise<ReceivedEmail[]> {
  for (let attempt = 0; attempt < 200; attempt += 1) {
    const found = fake.received().filter((email) => email.to === address);
    if (found.length > 0) return found;
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  throw new Error(`no e-mail reached ${address}`);
}

beforeAll(async () => {
  fake = await startFakeResend({ port: 0 });
  vi.stubEnv("RESEND_BASE_URL", fake.url);
  vi.stubEnv("RESEND_API_KEY", "");
  vi.stubEnv("EMAIL_FROM", "");
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "off");
  await seedDemoAccounts(await getDb());
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  await fake.close();
  vi.unstubAllEnvs();
});

// OWASP Authentication Cheat Sheet, "Authentication and Error Messages": sign-up and recovery
// answer alike whether or not an account exists.
describe("sign-up never tells whether an address has an account", () => {
  it("answers a taken address like a new one, signs neither in, and e-mails the owner of the taken one instead", async () => {
    const fresh = await auth("POST", "sign-up/email", { body: { name: "Lio Farrant", email: "lio@example.test", password: "a-new-password" } });
    const taken = await auth("POST", "sign-up/email", { body: { name: "Someone Else", email: "customer@sidewise.test", password: "another-password" } });
    expect([taken.status, fresh.status]).toEqual([200, 200]);
    const [takenBody, freshBody] = [await taken.json(), await fresh.json()];
    expect(Object.keys(takenBody).sort()).toEqual(Object.keys(freshBody).sort());
    expect(Object.keys(takenBody.user).sort()).toEqual(Object.keys(freshBody.user).sort());
    expect([takenBody.token, freshBody.token]).toEqual([null, null]);
    expect([taken.headers.getSetCookie(), fresh.headers.getSetCookie()]).toEqual([[], []]);

    const [warning] = await emailsTo("customer@sidewise.test");
    expect(warning).toMatchObject({ subject: "Your Sidewise account already exists" });
    expect(String(warning!.text)).toContain("Someone tried to create a Sidewise account with this e-mail address");
    expect(String(warning!.text)).not.toMatch(/token|reset-password\//);
    expect(fake.received().filter((email) => email.to === "lio@example.test")).toEqual([]);
    // The new account works with its password; the taken one kept its own.
    expect((await auth("POST", "sign-in/email", { body: { email: "lio@example.test", password: "a-new-password" } })).status).toBe(200);
    expect((await auth("POST", "sign-in/email", { body: { email: "customer@sidewise.test", password: "another-password" } })).status).toBe(401);
  });

  it("answers forgot-password alike for a known and an unknown address", async () => {
    const known = await auth("POST", "request-password-reset", { body: { email: "staff@sidewise.test", redirectTo: "/reset-password" } });
    const unknown = await auth("POST", "request-password-reset", { body: { email: "no.one@example.test", redirectTo: "/reset-password" } });
    expect([unknown.status, await unknown.json()]).toEqual([known.status, await known.json()]);
  });

  it("answers forgot-password and sign-up no sooner than the equal time, however quickly the work is done", async () => {
    let waited: number | null = null;
    let release: () => void = () => undefined;
    const wait = (ms: number) => {
      waited = ms;
      return new Promise<void>((resolve) => (release = resolve));
    };
    let settled = false;
    const answer = answerNoSoonerThan(EQUAL_TIME_MS, Promise.resolve("done"), wait).then((value) => {
      settled = true;
      return value;
    });
    await Promise.resolve();
    await Promise.resolve();
    expect([waited, settled]).toEqual([EQUAL_TIME_MS, false]);
    release();
    expect(await answer).toBe("done");
  });
});

describe("passwords an admin sets", () => {
  it("obey the sign-up rule when an admin creates an account", async () => {
    const admin = await signIn("admin@sidewise.test", "sidewise-demo");
    const create = (password?: string) =>
      auth("POST", "admin/create-user", { cookie: admin, body: { email: `made.${addresses}@example.test`, name: "Made By Admin", role: "customer", ...(password === undefined ? {} : { password }) } });
    for (const password of [undefined, "", "short", "x".repeat(129)]) {
      const refused = await create(password);
      expect(refused.status, String(password)).toBe(400);
      expect((await refused.json()).code).toBe("INVALID_PASSWORD");
    }
    expect((await create("long-enough-password")).status).toBe(200);
  });

  it("end the account's sessions, as a reset by e-mail does", async () => {
    const admin = await signIn("admin@sidewise.test", "sidewise-demo");
    const customer = await signIn("customer@sidewise.test", "sidewise-demo");
    const me = await (await auth("GET", "get-session", { cookie: customer })).json();
    const set = await auth("POST", "admin/set-user-password", { cookie: admin, body: { userId: me.user.id, newPassword: "chosen-by-the-admin" } });
    expect(set.status).toBe(200);
    expect(await (await auth("GET", "get-session", { cookie: customer })).json()).toBeNull();
    expect(await (await auth("GET", "get-session", { cookie: admin })).json()).toMatchObject({ user: { email: "admin@sidewise.test" } });
  });
});
