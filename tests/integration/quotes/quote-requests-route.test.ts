import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getFormToken } from "@/app/api/v1/quote-requests/form-token/route";
import { GET, POST } from "@/app/api/v1/quote-requests/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { quoteRequest } from "@/db/schema";
import { checkFormToken, signFormToken } from "@/lib/quotes/form-token";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { APP_ORIGIN, callRoute, signIn } from "../helpers/auth-session";
import { checkContract } from "../helpers/contract";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

const request = {
  name: "Rosa Iverley",
  email: "rosa@example.test",
  vehicle: "2019 family SUV",
  tires: "235/65R17 104H",
  quantity: 4,
  source: "size-sheet",
  reference: "235/65R17",
  website: "",
  renderedAt: signFormToken(Date.now() - 9000),
};

let fake: FakeResend;
let addressCount = 0;

/** Each call comes from its own address unless one is given, so that the per-address limit stays out of the way. */
async function ask(body: unknown, address = `198.51.100.${++addressCount}`) {
  const request = new NextRequest(`${APP_ORIGIN}/api/v1/quote-requests`, {
    method: "POST",
    headers: { origin: APP_ORIGIN, "content-type": "application/json", "x-forwarded-for": address },
    body: JSON.stringify(body),
  });
  const response = await checkContract(request, await POST(request));
  return { status: response.status, headers: response.headers, body: await response.json() };
}

beforeAll(async () => {
  fake = await startFakeResend({ port: 0 });
  vi.stubEnv("RESEND_BASE_URL", fake.url);
  vi.stubEnv("RESEND_API_KEY", "");
  vi.stubEnv("EMAIL_FROM", "");
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  vi.stubEnv("QUOTE_LIMIT_PER_ADDRESS", "");
  vi.stubEnv("QUOTE_LIMIT_PER_EMAIL", "");
  await getDb();
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  await fake.close();
  vi.unstubAllEnvs();
});

describe("POST /api/v1/quote-requests", () => {
  it("stores a request from anyone → 201 with its id and status new, and e-mails the shop and the driver", async () => {
    const { status, body } = await ask(request);
    expect(status).toBe(201);
    expect(body).toEqual({ id: expect.any(Number), status: "new" });
    expect(fake.received().filter((email) => email.subject.includes(`#${body.id}`)).map((email) => email.to).sort()).toEqual([
      "counter@marrowby-tire.test",
      "rosa@example.test",
    ]);
  });

  it.each([
    ["compare", "225-45R17,235-40R18", "225/45R17, 235/40R18"],
    ["plus", "225/45R17", "On the car now: 225/45R17\nOn new wheels (load index and speed symbol at least the vehicle's placard): 225/40R18"],
  ])("takes a request sent from Side-by-side or the Plus planner (source %s) → 201", async (source, reference, tires) => {
    const { status, body } = await ask({ ...request, email: `${source}@example.test`, source, reference, tires });
    expect(status).toBe(201);
    const [stored] = await (await getDb()).select().from(quoteRequest).where(eq(quoteRequest.id, body.id));
    expect(stored).toMatchObject({ source, reference, tires });
  });

  it.each([
    ["name", { name: "" }, "invalid_parameter", 'The field "name" is invalid: Type your name so the shop knows who is asking.'],
    ["email", { email: "rosa.example.test" }, "invalid_parameter", 'The field "email" is invalid: Check the e-mail address: it should look like name@example.com.'],
    ["phone", { phone: "call me" }, "invalid_parameter", 'The field "phone" is invalid: Use only digits, spaces and + ( ) - in the phone number.'],
    ["vehicle", { vehicle: undefined }, "missing_parameter", 'The field "vehicle" is required.'],
    ["tires", { tires: "" }, "invalid_parameter", 'The field "tires" is invalid: Say which tires or size you would like a price for.'],
    ["quantity", { quantity: 40 }, "invalid_parameter", 'The field "quantity" is invalid: Choose how many tires, 1 to 16.'],
    ["preferredDay", { preferredDay: "2020-01-01" }, "invalid_parameter", 'The field "preferredDay" is invalid: Pick a day from today to 90 days ahead, or leave it empty.'],
    ["source", { source: "elsewhere" }, "invalid_parameter", 'The field "source" is invalid: The page the request comes from is unknown.'],
  ])("refuses a wrong %s with 400 naming the field", async (field, change, code, message) => {
    const { status, body } = await ask({ ...request, ...change });
    expect(status).toBe(400);
    expect(body).toEqual({ error: { code, message, field } });
  });

  it("refuses a filled-in hidden field and a form token that is too fresh, too old, forged or missing, with the same neutral words, storing nothing", async () => {
    const before = (await (await getDb()).select({ id: quoteRequest.id }).from(quoteRequest)).length;
    const neutral = { error: { code: "invalid_parameter", message: "The request could not be accepted. Please wait a few seconds, check the form and send it again." } };
    expect(await ask({ ...request, website: "https://spam.example" })).toMatchObject({ status: 400, body: neutral });
    expect(await ask({ ...request, renderedAt: signFormToken(Date.now() - 800) })).toMatchObject({ status: 400, body: neutral });
    expect(await ask({ ...request, renderedAt: signFormToken(Date.now() - 2 * 86_400_000) })).toMatchObject({ status: 400, body: neutral });
    expect(await ask({ ...request, renderedAt: signFormToken(Date.now() - 9000, "someone-elses-secret-of-32-characters-or-more") })).toMatchObject({ status: 400, body: neutral });
    expect(await ask({ ...request, renderedAt: String(Date.now() - 9000) })).toMatchObject({ status: 400, body: neutral });
    expect(await ask({ ...request, renderedAt: undefined })).toMatchObject({ status: 400, body: neutral });
    expect((await (await getDb()).select({ id: quoteRequest.id }).from(quoteRequest)).length).toBe(before);
  });

  it("answers 429 with Retry-After after 5 requests from one address in 10 minutes", async () => {
    const address = "203.0.113.77";
    for (let i = 0; i < 5; i++) expect((await ask({ ...request, email: `driver${i}@example.test` }, address)).status).toBe(201);
    const refused = await ask({ ...request, email: "driver9@example.test" }, address);
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe("rate_limited");
    expect(refused.body.error.message).toMatch(/^Too many requests were sent from here in a short time\. Please try again in \d+ minutes?, or call the shop\.$/);
    expect(Number(refused.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(Number(refused.headers.get("retry-after"))).toBeLessThanOrEqual(600);
  });

  it("counts every request from an address against its limit, invalid ones too", async () => {
    const address = "203.0.113.78";
    for (let i = 0; i < 4; i++) expect((await ask({ ...request, name: "" }, address)).status).toBe(400);
    expect((await ask({ ...request, email: "counted@example.test" }, address)).status).toBe(201);
    expect((await ask({ ...request, email: "counted.again@example.test" }, address)).status).toBe(429);
  });

  it("answers 429 after 3 requests for one e-mail address, whatever the address they come from", async () => {
    for (let i = 0; i < 3; i++) expect((await ask({ ...request, email: "Same.Driver@example.test" })).status).toBe(201);
    const refused = await ask({ ...request, email: "same.driver@example.test" });
    expect(refused.status).toBe(429);
    expect(refused.headers.get("retry-after")).toMatch(/^\d+$/);
  });
});

describe("GET /api/v1/quote-requests", () => {
  it("lists requests for staff, newest first, with counts per status, filtered by status", async () => {
    const cookie = await signIn("staff@sidewise.test", "sidewise-demo");
    const response = await callRoute(GET, "GET", "/api/v1/quote-requests?status=new", { cookie });
    expect(response.status).toBe(200);
    const body = await response.json();
    // The demo seed's requests: one answered, three with offers (lib/demo/requests.ts).
    expect(body).toMatchObject({ page: 1, pageCount: 1, counts: { new: body.total, answered: 1, offered: 3, closed: 0 } });
    expect(body.requests.length).toBe(body.total);
    expect(body.requests[0]).toMatchObject({ id: expect.any(Number), status: "new", createdAt: expect.stringMatching(/Z$/) });
    const ids = body.requests.map((row: { id: number }) => row.id);
    expect(ids).toEqual([...ids].sort((a, b) => b - a));

    const wrong = await callRoute(GET, "GET", "/api/v1/quote-requests?status=open", { cookie });
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).error.message).toBe('The parameter "status" is invalid: use new, answered, offered or closed.');
  });

  it("is not for customers", async () => {
    const cookie = await signIn("customer@sidewise.test", "sidewise-demo");
    expect((await callRoute(GET, "GET", "/api/v1/quote-requests", { cookie })).status).toBe(403);
  });
});

describe("GET /api/v1/quote-requests/form-token", () => {
  it("hands out a token this server signed, too fresh to send a request with yet", async () => {
    const request = new NextRequest(`${APP_ORIGIN}/api/v1/quote-requests/form-token`);
    const response = await checkContract(request, await getFormToken());
    expect(response.headers.get("cache-control")).toBe("no-store");
    const { renderedAt } = await response.json();
    expect(checkFormToken(renderedAt)).toEqual({ ok: false, reason: "too_young" });
  });
});
