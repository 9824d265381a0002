import { and, eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { POST as emailCard } from "@/app/api/v1/fit-cards/[slug]/email/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { emailSend, stockItem, user } from "@/db/schema";
import { getSessionUser } from "@/lib/auth/session";
import { newFitCardSchema } from "@/lib/fit-cards/card-input";
import { createFitCard } from "@/lib/fit-cards/create-card";
import { revokeFitCard } from "@/lib/fit-cards/revoke-card";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { APP_ORIGIN, signIn } from "../helpers/auth-session";
import { checkContract } from "../helpers/contract";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

let fake: FakeResend;
let staffCookie = "";
let adminCookie = "";

async function send(slug: string, body: unknown, { cookie = staffCookie, key }: { cookie?: string; key?: string } = {}) {
  const headers: Record<string, string> = { origin: APP_ORIGIN, cookie, "content-type": "application/json" };
  if (key) headers["idempotency-key"] = key;
  const request = new NextRequest(`${APP_ORIGIN}/api/v1/fit-cards/${slug}/email`, { method: "POST", headers, body: JSON.stringify(body) });
  const response = await checkContract(request, await emailCard(request, { params: Promise.resolve({ slug }) }));
  return { status: response.status, headers: response.headers, body: await response.json() };
}

async function newCard(): Promise<string> {
  const db = await getDb();
  const [staff] = await db.select({ id: user.id }).from(user).where(eq(user.email, "staff@sidewise.test"));
  const tires = await db.select({ sku: stockItem.sku }).from(stockItem).where(and(eq(stockItem.designation, "225/45R17"), eq(stockItem.retired, false))).limit(1);
  const input = newFitCardSchema.parse({ sizes: ["225/45R17", "225/40R18"], skus: tires.map((tire) => tire.sku), loadIndex: 91, speedSymbol: "V" });
  const saved = await createFitCard(db, staff!.id, input);
  if (!saved.ok) throw new Error(saved.message);
  return saved.slug;
}

beforeAll(async () => {
  fake = await startFakeResend({ port: 0 });
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  vi.stubEnv("SITE_URL", "https://shop.example.test");
  vi.stubEnv("RESEND_BASE_URL", fake.url);
  vi.stubEnv("RESEND_API_KEY", "");
  vi.stubEnv("EMAIL_FROM", "");
  vi.stubEnv("FIT_CARD_EMAIL_LIMIT_PER_HOUR", "6");
  await getDb();
  staffCookie = await signIn("staff@sidewise.test", "sidewise-demo");
  adminCookie = await signIn("admin@sidewise.test", "sidewise-demo");
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  await fake.close();
  vi.unstubAllEnvs();
});
beforeEach(async () => {
  await fetch(`${fake.url}/emails`, { method: "DELETE" });
});

describe("POST /api/v1/fit-cards/{slug}/email", () => {
  it("answers 202 with the record's id, and the e-mail service gets the card's link and sizes", async () => {
    const slug = await newCard();
    const answer = await send(slug, { to: "pat.reader@example.test", message: "Ask for Ollie" }, { key: "3b0f7d1e-8c52-4e43-9a57-1f6c2b9d0e11" });

    expect(answer.status).toBe(202);
    expect(answer.body).toEqual({ id: expect.any(Number), status: "sent", providerId: expect.any(String) });
    const [received] = fake.received();
    expect(fake.received()).toHaveLength(1);
    expect(received).toMatchObject({ id: answer.body.providerId, to: "pat.reader@example.test", subject: "Your Fit card: tires for 225/45R17" });
    expect(received?.text).toContain(`https://shop.example.test/s/${slug}`);
    expect(received?.text).toContain("Ask for Ollie");
    expect(received?.html).toContain(`href="https://shop.example.test/s/${slug}"`);
    expect(received?.html).toContain("225/40R18");

    const [row] = await (await getDb()).select().from(emailSend).where(eq(emailSend.id, answer.body.id));
    const staff = await getSessionUser(new Headers({ cookie: staffCookie }));
    expect(row).toMatchObject({ kind: "fit_card", reference: slug, toAddress: "pat.reader@example.test", status: "sent", senderId: staff?.id });
  });

  it("sends a repeated request with the same Idempotency-Key only once", async () => {
    const slug = await newCard();
    const first = await send(slug, { to: "twice@example.test" }, { key: "same-key-0001" });
    const again = await send(slug, { to: "twice@example.test" }, { key: "same-key-0001" });

    expect(again.body).toEqual(first.body);
    expect(fake.received()).toHaveLength(1);
  });

  it("answers 410 for a withdrawn card and 404 for an address with no card", async () => {
    const slug = await newCard();
    const admin = await getSessionUser(new Headers({ cookie: adminCookie }));
    expect(await revokeFitCard(await getDb(), admin!, slug)).toBe("revoked");

    expect(await send(slug, { to: "pat.reader@example.test" })).toMatchObject({ status: 410, body: { error: { code: "gone" } } });
    expect(await send("N".repeat(24), { to: "pat.reader@example.test" })).toMatchObject({ status: 404, body: { error: { code: "not_found" } } });
    expect(fake.received()).toHaveLength(0);
  });

  it("answers 400 with the field's name for a bad address, an over-long message or a malformed key", async () => {
    const slug = await newCard();
    const bad = await send(slug, { to: "pat.reader-at-example" });
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatchObject({ code: "invalid_parameter", message: expect.stringContaining('"to"') });
    expect(await send(slug, {})).toMatchObject({ status: 400, body: { error: { code: "missing_parameter" } } });
    expect(await send(slug, { to: "pat@example.test", message: "x".repeat(1001) })).toMatchObject({ status: 400, body: { error: { message: expect.stringContaining('"message"') } } });
    expect(await send(slug, { to: "pat@example.test" }, { key: "has spaces in it" })).toMatchObject({ status: 400, body: { error: { message: expect.stringContaining("Idempotency-Key") } } });
    expect(fake.received()).toHaveLength(0);
  });

  it("answers 202 with status failed and the reason when the e-mail service refuses, so the screen can offer a retry", async () => {
    const slug = await newCard();
    const refusing = await startFakeResend({ port: 0, failWith: { statusCode: 503, name: "application_error", message: "Try again shortly.", times: 1 } });
    vi.stubEnv("RESEND_BASE_URL", refusing.url);
    vi.spyOn(console, "error").mockImplementation(() => {});
    try {
      const failed = await send(slug, { to: "retry@example.test" }, { key: "retry-key-0001" });
      expect(failed).toMatchObject({ status: 202, body: { status: "failed", message: expect.stringContaining("Try again shortly.") } });
      const retried = await send(slug, { to: "retry@example.test" }, { key: "retry-key-0001" });
      expect(retried).toMatchObject({ status: 202, body: { id: failed.body.id, status: "sent" } });
      expect(refusing.received()).toHaveLength(1);
    } finally {
      vi.stubEnv("RESEND_BASE_URL", fake.url);
      vi.mocked(console.error).mockRestore();
      await refusing.close();
    }
  });

  it("answers 429 with Retry-After once a staff member has sent the hour's limit", async () => {
    const slug = await newCard();
    let answer = await send(slug, { to: "limit@example.test" }, { cookie: adminCookie });
    for (let sent = 1; answer.status === 202 && sent < 20; sent += 1) answer = await send(slug, { to: "limit@example.test" }, { cookie: adminCookie });

    expect(answer.status).toBe(429);
    expect(answer.body.error).toMatchObject({ code: "rate_limited", message: expect.stringContaining("Try again in") });
    expect(Number(answer.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(fake.received()).toHaveLength(6);
  });
});
