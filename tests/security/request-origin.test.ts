import path from "node:path";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { checkRequestOrigin } from "@/lib/security/request-origin";
import { APP_ORIGIN, signIn } from "../integration/helpers/auth-session";
import { checkContract } from "../integration/helpers/contract";
import { ACTION_MATRIX, MATRIX } from "./route-table";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
const actionHeaders = vi.hoisted(() => ({ current: new Headers() }));
vi.mock("next/headers", () => ({ headers: async () => actionHeaders.current }));
vi.mock("next/cache", () => import("../integration/helpers/next-cache-outside-server"));

type Handler = (request: NextRequest, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

const FOREIGN = "http://localhost:3001";
const apiFolder = path.join(process.cwd(), "app", "api");
const stateChanging = MATRIX.filter((row) => row.method !== "GET");
let staff = "";
let admin = "";

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "off");
  await seedDemoAccounts(await getDb());
  staff = await signIn("staff@sidewise.test", "sidewise-demo");
  admin = await signIn("admin@sidewise.test", "sidewise-demo");
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

const callerOf = (row: (typeof MATRIX)[number]) => (row.expected.staff === 403 ? "admin" : "staff");
/** What a route answers the caller `call` signs in as, when its origin and content type pass. */
const expectedFor = (row: (typeof MATRIX)[number]) => row.expected[callerOf(row)];

/** Calls a route as staff, or as admin where staff are refused (the role is checked before the body). */
async function call(row: (typeof MATRIX)[number], headers: Record<string, string>, body?: string) {
  const routeModule = (await import(/* @vite-ignore */ path.join(apiFolder, row.file))) as Record<string, Handler>;
  const cookie = callerOf(row) === "admin" ? admin : staff;
  const request = new NextRequest(`${APP_ORIGIN}${row.path}`, { method: row.method, headers: { cookie, ...headers }, body });
  return checkContract(request, await routeModule[row.method]!(request, { params: Promise.resolve(row.params ?? {}) }));
}

const jsonBody = (row: (typeof MATRIX)[number]) => (row.body === undefined ? undefined : JSON.stringify(row.body));

describe("the origin of a state-changing request (RFC 6454 origins, Fetch Metadata's Origin header)", () => {
  const check = (headers: Record<string, string>) => checkRequestOrigin(new Headers(headers), APP_ORIGIN).ok;

  it("passes the app's own origin, however its serialization is spelled", () => {
    expect(check({ origin: APP_ORIGIN })).toBe(true);
    expect(check({ origin: "HTTP://LOCALHOST:3000" })).toBe(true);
    expect(check({ referer: `${APP_ORIGIN}/counter/items/new?from=table` })).toBe(true);
  });

  it("refuses another port, host or scheme of the same machine, an opaque origin, and a foreign Referer", () => {
    for (const origin of [FOREIGN, "http://127.0.0.1:3000", "https://localhost:3000", "http://localhost", "null", "not a url"]) {
      expect(check({ origin }), origin).toBe(false);
    }
    expect(check({ referer: `${FOREIGN}/page` })).toBe(false);
    // The Origin header decides when both are there (OWASP CSRF Prevention Cheat Sheet).
    expect(check({ origin: FOREIGN, referer: `${APP_ORIGIN}/` })).toBe(false);
  });

  it("lets a request with neither header through only when it carries no session cookie", () => {
    expect(check({})).toBe(true);
    expect(check({ cookie: "better-auth.session_token=abc.def" })).toBe(false);
    expect(check({ cookie: "unrelated=1" })).toBe(true);
  });
});

describe("every state-changing route handler", () => {
  it.each(stateChanging)("$method $path refuses a foreign Origin with 403 forbidden, even for staff", async (row) => {
    const response = await call(row, { origin: FOREIGN, "content-type": "application/json" }, jsonBody(row));
    expect(response.status).toBe(403);
    expect((await response.json()).error.code).toBe("forbidden");
  });

  it.each(stateChanging)("$method $path refuses a foreign Referer, and a session cookie with neither header", async (row) => {
    expect((await call(row, { referer: `${FOREIGN}/x`, "content-type": "application/json" }, jsonBody(row))).status).toBe(403);
    expect((await call(row, { "content-type": "application/json" }, jsonBody(row))).status).toBe(403);
  });

  it.each(stateChanging)("$method $path takes the app's own Referer when a browser sends no Origin", async (row) => {
    const response = await call(row, { referer: `${APP_ORIGIN}/counter`, ...(row.body === undefined ? {} : { "content-type": "application/json" }) }, jsonBody(row));
    expect(response.status).toBe(expectedFor(row));
  });

  it("refuses a foreign origin on the public Ask the shop route and on the sign-in service", async () => {
    const { POST: askTheShop } = await import("@/app/api/v1/quote-requests/route");
    const asking = new NextRequest(`${APP_ORIGIN}/api/v1/quote-requests`, { method: "POST", headers: { origin: FOREIGN, "content-type": "application/json" }, body: "{}" });
    const quote = await checkContract(asking, await askTheShop(asking));
    expect(quote.status).toBe(403);
    const signInAttempt = await authPost(
      new NextRequest(`${APP_ORIGIN}/api/auth/sign-in/email`, {
        method: "POST",
        headers: { origin: FOREIGN, "content-type": "application/json" },
        body: JSON.stringify({ email: "staff@sidewise.test", password: "sidewise-demo" }),
      }),
    );
    expect(signInAttempt.status).toBe(403);
    expect((await signInAttempt.json()).error.code).toBe("forbidden");
  });
});

describe("the content type of a JSON route (RFC 9110 §8.3)", () => {
  const jsonRoutes = stateChanging.filter((row) => row.body !== undefined);

  it.each(jsonRoutes)("$method $path refuses text/plain and form bodies with 415 unsupported_media_type", async (row) => {
    for (const type of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", "application/jsonp"]) {
      const response = await call(row, { origin: APP_ORIGIN, "content-type": type }, jsonBody(row));
      expect(response.status, type).toBe(415);
      expect((await response.json()).error.code).toBe("unsupported_media_type");
    }
    const missingType = await call(row, { origin: APP_ORIGIN }, jsonBody(row));
    expect(missingType.status).toBe(415);
  });

  it.each(jsonRoutes)("$method $path takes application/json with parameters such as charset", async (row) => {
    const response = await call(row, { origin: APP_ORIGIN, "content-type": "Application/JSON; charset=utf-8" }, jsonBody(row));
    expect(response.status).toBe(expectedFor(row));
  });

  it("leaves a request without a body to the route: DELETE needs no content type", async () => {
    const retire = MATRIX.find((row) => row.method === "DELETE" && row.file.startsWith("v1/catalog"))!;
    expect((await call(retire, { origin: APP_ORIGIN })).status).toBe(404);
  });

  it("refuses a non-JSON body to the sign-in service with 415", async () => {
    const response = await authPost(
      new NextRequest(`${APP_ORIGIN}/api/auth/sign-in/email`, { method: "POST", headers: { origin: APP_ORIGIN, "content-type": "text/plain" }, body: "email=x" }),
    );
    expect(response.status).toBe(415);
  });
});

describe("server actions", () => {
  it.each(ACTION_MATRIX)("$action answers a foreign origin with 403, signed in as staff or admin", async ({ file, action, input }) => {
    const actions = (await import(/* @vite-ignore */ path.join(process.cwd(), file))) as Record<string, (input: unknown) => Promise<{ ok: boolean; status?: number }>>;
    const admin = await signIn("admin@sidewise.test", "sidewise-demo");
    const attempts: Record<string, string>[] = [{ origin: FOREIGN, cookie: admin }, { referer: `${FOREIGN}/`, cookie: admin }, { cookie: admin }];
    for (const headers of attempts) {
      actionHeaders.current = new Headers(headers);
      expect(await actions[action]!(input)).toMatchObject({ ok: false, status: 403 });
    }
  });
});
