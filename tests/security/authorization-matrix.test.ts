import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import type { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { callRoute, signIn } from "../integration/helpers/auth-session";
import { ACTION_MATRIX, CALLERS, HTTP_METHODS, MATRIX, PUBLIC_HANDLERS, type Who } from "./route-table";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
// Server actions read the caller's cookie through next/headers; here it is whoever the test says,
// on a page of the app's own origin (APP_ORIGIN of the helpers; a hoisted mock cannot import it).
const actionCaller = vi.hoisted(() => ({ cookie: undefined as string | undefined }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ origin: "http://localhost:3000", ...(actionCaller.cookie ? { cookie: actionCaller.cookie } : {}) }) }));
vi.mock("next/cache", () => import("../integration/helpers/next-cache-outside-server"));

type Handler = (request: NextRequest, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

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

  it.each(MATRIX.flatMap((row) => CALLERS.map((who) => ({ ...row, who, status: row.expected[who] }))))(
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

  it.each(ACTION_MATRIX.flatMap((row) => CALLERS.map((who) => ({ ...row, who, status: row.expected[who] }))))(
    "server action $action as $who → $status",
    async ({ file, action, input, who, status }) => {
      const actions = (await import(/* @vite-ignore */ path.join(process.cwd(), file))) as Record<string, (input: unknown) => Promise<{ ok: boolean; status?: number }>>;
      actionCaller.cookie = cookies[who];
      const result = await actions[action]!(input);
      expect(result.ok ? 200 : result.status).toBe(status);
    },
  );
});
