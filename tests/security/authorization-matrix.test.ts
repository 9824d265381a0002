import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import type { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { getDatabaseHandle, getDb } from "@/db/client";
import { seedDemoAccounts } from "@/db/seed/accounts";
import { callRoute, signIn } from "../integration/helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
// Server actions read the caller's cookie through next/headers; here it is whoever the test says,
// on a page of the app's own origin (APP_ORIGIN of the helpers; a hoisted mock cannot import it).
const actionCaller = vi.hoisted(() => ({ cookie: undefined as string | undefined }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ origin: "http://localhost:3000", ...(actionCaller.cookie ? { cookie: actionCaller.cookie } : {}) }) }));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

type Who = "anonymous" | "customer" | "staff" | "admin";
type Handler = (request: NextRequest, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** Handlers anyone may call, per route file and method; the auth library's own endpoints check their own requests. */
const PUBLIC_HANDLERS = [
  "auth/[...all]/route.ts#GET",
  "auth/[...all]/route.ts#POST",
  "health/route.ts#GET",
  "v1/alternatives/route.ts#GET",
  "v1/catalog/route.ts#GET",
  "v1/compare/route.ts#GET",
  "v1/decode/route.ts#GET",
  "v1/fit-cards/[slug]/route.ts#GET",
  "v1/plus/route.ts#GET",
  "v1/quote-requests/form-token/route.ts#GET",
  "v1/quote-requests/route.ts#POST",
];

/** Every method a route file can answer; Next.js answers 405 for one the file does not export. */
const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;

/**
 * Every protected handler, called so that nothing changes once authorization passes (an invalid
 * body, an unknown SKU): the status an allowed caller gets shows the request went past the guard.
 */
const MATRIX: { file: string; method: string; path: string; body?: unknown; params?: Record<string, string>; expected: Record<Who, number> }[] = [
  { file: "v1/fit-cards/route.ts", method: "POST", path: "/api/v1/fit-cards", body: {}, expected: { anonymous: 401, customer: 400, staff: 400, admin: 400 } },
  {
    file: "v1/fit-cards/[slug]/route.ts", method: "DELETE", path: `/api/v1/fit-cards/${"N".repeat(24)}`, params: { slug: "N".repeat(24) },
    expected: { anonymous: 401, customer: 404, staff: 404, admin: 404 },
  },
  {
    file: "v1/fit-cards/[slug]/email/route.ts", method: "POST", path: `/api/v1/fit-cards/${"N".repeat(24)}/email`, params: { slug: "N".repeat(24) },
    body: { to: "nobody@example.test" }, expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 },
  },
  { file: "v1/catalog/route.ts", method: "POST", path: "/api/v1/catalog", body: {}, expected: { anonymous: 401, customer: 403, staff: 400, admin: 400 } },
  {
    file: "v1/catalog/[sku]/route.ts", method: "PATCH", path: "/api/v1/catalog/NO-SUCH-SKU", params: { sku: "NO-SUCH-SKU" }, body: { priceCents: 100 },
    expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 },
  },
  {
    file: "v1/catalog/[sku]/route.ts", method: "DELETE", path: "/api/v1/catalog/NO-SUCH-SKU", params: { sku: "NO-SUCH-SKU" },
    expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 },
  },
  { file: "v1/catalog/import/route.ts", method: "POST", path: "/api/v1/catalog/import", expected: { anonymous: 401, customer: 403, staff: 400, admin: 400 } },
  { file: "v1/catalog/export/route.ts", method: "GET", path: "/api/v1/catalog/export", expected: { anonymous: 401, customer: 403, staff: 200, admin: 200 } },
  { file: "v1/quote-requests/route.ts", method: "GET", path: "/api/v1/quote-requests", expected: { anonymous: 401, customer: 403, staff: 200, admin: 200 } },
];

/**
 * Every server action, called with input that changes nothing once authorization passes; the
 * status it answers uses the API's numbers.
 */
const ACTION_MATRIX: { file: string; action: string; input: unknown; expected: Record<Who, number> }[] = [
  {
    file: "lib/team/actions.ts", action: "changeRole", input: { userId: "no-such-account", role: "staff" },
    expected: { anonymous: 401, customer: 403, staff: 403, admin: 404 },
  },
  { file: "lib/quotes/actions.ts", action: "setQuoteStatus", input: { id: 999_999, status: "closed" }, expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 } },
  { file: "lib/quotes/actions.ts", action: "sendQuoteReply", input: { id: 999_999, body: "Hello" }, expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 } },
];

/** Modules that start with the "use server" directive, in the folders that may hold server actions. */
const actionFiles = ["app", "lib", "components"].flatMap((folder) =>
  (readdirSync(path.join(process.cwd(), folder), { recursive: true }) as string[])
    .filter((file) => /\.tsx?$/.test(file))
    .map((file) => path.join(folder, file).split(path.sep).join("/"))
    .filter((file) => /^\s*["']use server["']/.test(readFileSync(path.join(process.cwd(), file), "utf8"))),
);

const apiFolder = path.join(process.cwd(), "app", "api");
const routeFiles = (readdirSync(apiFolder, { recursive: true }) as string[])
  .map((file) => file.split(path.sep).join("/"))
  .filter((file) => /(^|\/)route\.tsx?$/.test(file));

const cookies: Partial<Record<Who, string>> = {};

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "off");
  await seedDemoAccounts(await getDb());
  for (const who of ["customer", "staff", "admin"] as const) cookies[who] = await signIn(`${who}@sidewise.test`, "sidewise-demo");
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("authorization matrix", () => {
  it("lists every handler of every route file under app/api, per method, as public or in the matrix", async () => {
    const exported: string[] = [];
    for (const file of routeFiles) {
      const routeModule = (await import(/* @vite-ignore */ path.join(apiFolder, file))) as Record<string, unknown>;
      exported.push(...HTTP_METHODS.filter((method) => typeof routeModule[method] === "function").map((method) => `${file}#${method}`));
    }
    const listed = new Set([...PUBLIC_HANDLERS, ...MATRIX.map((row) => `${row.file}#${row.method}`)]);
    expect(exported.filter((entry) => !listed.has(entry))).toEqual([]);
    expect([...listed].filter((entry) => !exported.includes(entry))).toEqual([]);
  });

  it.each(MATRIX.flatMap((row) => (["anonymous", "customer", "staff", "admin"] as const).map((who) => ({ ...row, who, status: row.expected[who] }))))(
    "$method $path as $who → $status",
    async ({ file, method, path: url, body, params, who, status }) => {
      const routeModule = (await import(/* @vite-ignore */ path.join(apiFolder, file))) as Record<string, Handler | undefined>;
      const handler = routeModule[method];
      if (!handler) throw new Error(`${file} exports no ${method}`);
      const response = await callRoute(handler, method, url, { cookie: cookies[who], body, params });
      expect(response.status).toBe(status);
      if (response.status === 401) expect((await response.json()).error.code).toBe("unauthenticated");
      if (response.status === 403) expect((await response.json()).error.code).toBe("forbidden");
    },
  );

  it("lists every server action", async () => {
    const listed = new Set(ACTION_MATRIX.map((row) => `${row.file}#${row.action}`));
    const exported: string[] = [];
    for (const file of actionFiles) {
      const actions = (await import(/* @vite-ignore */ path.join(process.cwd(), file))) as Record<string, unknown>;
      exported.push(...Object.keys(actions).map((name) => `${file}#${name}`));
    }
    expect(exported.filter((entry) => !listed.has(entry))).toEqual([]);
    expect([...listed].filter((entry) => !exported.includes(entry))).toEqual([]);
  });

  it.each(ACTION_MATRIX.flatMap((row) => (["anonymous", "customer", "staff", "admin"] as const).map((who) => ({ ...row, who, status: row.expected[who] }))))(
    "server action $action as $who → $status",
    async ({ file, action, input, who, status }) => {
      const actions = (await import(/* @vite-ignore */ path.join(process.cwd(), file))) as Record<string, (input: unknown) => Promise<{ ok: boolean; status?: number }>>;
      actionCaller.cookie = cookies[who];
      const result = await actions[action]!(input);
      expect(result.ok ? 200 : result.status).toBe(status);
    },
  );
});
