import { readdirSync } from "node:fs";
import path from "node:path";
import { type APIRequestContext, type APIResponse, expect, request as playwrightRequest } from "@playwright/test";
import { contractChecker, type DescribedApi } from "../integration/helpers/contract-checker";

let addresses = 0;

/**
 * A client address no other request uses (from 10.0.0.0/8), sent as the one proxy in front would:
 * every limit then counts this request alone, so the checks never wait on each other's windows.
 */
export function freshAddress(): string {
  addresses += 1;
  return `10.${(addresses >> 16) & 255}.${(addresses >> 8) & 255}.${addresses & 255}`;
}

/** A client of the app: anonymous, or signed in through the sign-in service as a demo account. */
export async function client(baseURL: string, email?: string): Promise<APIRequestContext> {
  const context = await playwrightRequest.newContext({ baseURL, extraHTTPHeaders: { origin: baseURL, "x-forwarded-for": freshAddress() } });
  if (email) {
    const signedIn = await context.post("/api/auth/sign-in/email", { data: { email, password: "sidewise-demo" } });
    expect(signedIn.status(), `sign-in as ${email}`).toBe(200);
  }
  return context;
}

/** Route files under a folder of app/, as paths relative to it with forward slashes. */
export function filesNamed(folder: string, name: RegExp): string[] {
  return (readdirSync(path.join(process.cwd(), "app", folder), { recursive: true }) as string[])
    .map((file) => file.split(path.sep).join("/"))
    .filter((file) => name.test(file.split("/").pop() ?? ""))
    .sort();
}

/**
 * The API's error shape, or the sign-in service's own `{message, code}`. A 405 for a method a route
 * file does not export comes from Next.js itself, with an empty body.
 */
export async function errorShapeProblem(url: string, response: APIResponse): Promise<string | null> {
  if (response.status() < 400 || !new URL(url, "http://x").pathname.startsWith("/api/")) return null;
  if (response.status() === 405) return null;
  const text = await response.text();
  let body: { error?: { code?: unknown; message?: unknown; field?: unknown }; message?: unknown };
  try {
    body = JSON.parse(text);
  } catch {
    return `not JSON: ${text.slice(0, 80)}`;
  }
  if (typeof body.error?.code === "string" && typeof body.error.message === "string" && ["undefined", "string"].includes(typeof body.error.field)) return null;
  if (url.includes("/api/auth/") && typeof body.message === "string") return null;
  return `not the error shape: ${text.slice(0, 120)}`;
}

/**
 * What the OpenAPI document the server serves says is wrong with each API answer over HTTP
 * (proxy.ts included), or null. A 405 for a method a route does not export, and the 204 with its
 * Allow header to an OPTIONS request, come from Next.js itself, not from the API.
 */
export async function contractOf(context: APIRequestContext) {
  const served = await context.get("/api/v1/openapi.json");
  expect(served.status(), "GET /api/v1/openapi.json").toBe(200);
  const { checkContract } = contractChecker((await served.json()) as DescribedApi);
  return async (method: string, url: string, response: APIResponse): Promise<string | null> => {
    const address = new URL(url, "http://localhost");
    if (!address.pathname.startsWith("/api/") || response.status() === 405 || method === "OPTIONS") return null;
    const answer = new Response(response.status() === 204 ? null : new Uint8Array(await response.body()), { status: response.status(), headers: response.headers() });
    try {
      await checkContract(new Request(address, { method }), answer);
      return null;
    } catch (error) {
      return (error as Error).message;
    }
  };
}
