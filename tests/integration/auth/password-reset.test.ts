import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { createAuth, type Auth } from "@/lib/auth/create-auth";
import { type FakeResend, type ReceivedEmail, startFakeResend } from "@/scripts/fake-resend.mjs";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const ORIGIN = "http://localhost:3000";
const OLD_PASSWORD = "first-password-1";
const NEW_PASSWORD = "second-password-2";

/** Sending is not awaited by the auth service (so that timing reveals no account), hence the wait. */
async function emailsTo(fake: FakeResend, address: string, count = 1): Promise<ReceivedEmail[]> {
  for (let attempt = 0; attempt < 100; attempt += 1) {
    const found = fake.received().filter((email) => email.to === address);
    if (found.length >= count) return found;
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  throw new Error(`no e-mail reached ${address}`);
}

function linkIn(email: ReceivedEmail): URL {
  const match = /https?:\/\/\S+\/api\/auth\/reset-password\/\S+/.exec(String(email.text));
  if (!match) throw new Error(`no reset link in: ${email.text}`);
  return new URL(match[0]);
}

describe.each(testDatabaseKinds)("password reset on %s", (kind) => {
  let database: TestDatabase;
  let auth: Auth;
  let fake: FakeResend;

  const call = (method: string, path: string, body?: unknown, cookie?: string) =>
    auth.handler(
      new Request(`${ORIGIN}${path}`, {
        method,
        headers: { origin: ORIGIN, ...(body ? { "content-type": "application/json" } : {}), ...(cookie ? { cookie } : {}) },
        body: body ? JSON.stringify(body) : undefined,
      }),
    );
  const signInStatus = async (email: string, password: string) => (await call("POST", "/api/auth/sign-in/email", { email, password })).status;

  beforeAll(async () => {
    fake = await startFakeResend({ port: 0 });
    vi.stubEnv("RESEND_BASE_URL", fake.url);
    vi.stubEnv("RESEND_API_KEY", "");
    vi.stubEnv("BETTER_AUTH_URL", ORIGIN);
    database = await openTestDatabase(kind);
    auth = createAuth(database.db);
  });
  afterAll(async () => {
    await database.close();
    await fake.close();
    vi.unstubAllEnvs();
  });
  afterEach(() => vi.restoreAllMocks());

  const sessionCookie = async (email: string, password: string) => {
    const signedIn = await call("POST", "/api/auth/sign-in/email", { email, password });
    expect(signedIn.status).toBe(200);
    return signedIn.headers.getSetCookie().map((cookie) => cookie.split(";")[0]).join("; ");
  };
  const sessionOf = async (cookie: string) => (await call("GET", "/api/auth/get-session", undefined, cookie)).json();

  it("e-mails a link that sets a new password once; the old password and every session of the account stop working", async () => {
    const address = `mara.oakes.${kind}@example.test`;
    const signUp = await call("POST", "/api/auth/sign-up/email", { name: "Mara Oakes", email: address, password: OLD_PASSWORD });
    expect(signUp.status).toBe(200);
    const [onPhone, onLaptop] = [await sessionCookie(address, OLD_PASSWORD), await sessionCookie(address, OLD_PASSWORD)];
    expect(await sessionOf(onPhone)).toMatchObject({ user: { email: address } });
    expect(await sessionOf(onLaptop)).toMatchObject({ user: { email: address } });

    const request = await call("POST", "/api/auth/request-password-reset", { email: address, redirectTo: "/reset-password" });
    expect(request.status).toBe(200);
    const [email, ...others] = await emailsTo(fake, address);
    expect(others).toEqual([]);
    expect(email).toMatchObject({ subject: "Reset your Sidewise password", from: "Marrowby Tire Works <counter@marrowby-tire.test>" });

    const opened = await call("GET", `${linkIn(email!).pathname}${linkIn(email!).search}`);
    expect(opened.status).toBe(302);
    const landing = new URL(opened.headers.get("location")!, ORIGIN);
    expect(landing.pathname).toBe("/reset-password");
    const token = landing.searchParams.get("token");
    expect(token).toBeTruthy();

    expect((await call("POST", "/api/auth/reset-password", { newPassword: NEW_PASSWORD, token })).status).toBe(200);
    expect(await signInStatus(address, NEW_PASSWORD)).toBe(200);
    expect(await signInStatus(address, OLD_PASSWORD)).toBe(401);
    expect(await sessionOf(onPhone)).toBeNull();
    expect(await sessionOf(onLaptop)).toBeNull();

    const reopened = await call("GET", `${linkIn(email!).pathname}${linkIn(email!).search}`);
    expect(new URL(reopened.headers.get("location")!, ORIGIN).searchParams.get("error")).toBe("INVALID_TOKEN");
    const reused = await call("POST", "/api/auth/reset-password", { newPassword: "third-password-3", token });
    expect([reused.status, (await reused.json()).code]).toEqual([400, "INVALID_TOKEN"]);
  });

  it("answers an unknown address exactly like a known one, and sends it nothing", async () => {
    const known = `ines.brandt.${kind}@example.test`;
    const unknown = `nobody.${kind}@example.test`;
    await call("POST", "/api/auth/sign-up/email", { name: "Ines Brandt", email: known, password: OLD_PASSWORD });
    const unknownAnswer = await call("POST", "/api/auth/request-password-reset", { email: unknown, redirectTo: "/reset-password" });
    const knownAnswer = await call("POST", "/api/auth/request-password-reset", { email: known, redirectTo: "/reset-password" });
    expect([unknownAnswer.status, await unknownAnswer.json()]).toEqual([knownAnswer.status, await knownAnswer.json()]);
    await emailsTo(fake, known);
    expect(fake.received().filter((email) => email.to === unknown)).toEqual([]);
  });

  it("refuses a made-up token and a too-short new password", async () => {
    const madeUp = await call("POST", "/api/auth/reset-password", { newPassword: NEW_PASSWORD, token: "made-up-token-123" });
    expect([madeUp.status, (await madeUp.json()).code]).toEqual([400, "INVALID_TOKEN"]);
    const short = await call("POST", "/api/auth/reset-password", { newPassword: "short", token: "made-up-token-123" });
    expect(short.status).toBe(400);
  });
});
