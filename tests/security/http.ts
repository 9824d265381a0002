import { readdirSync } from "node:fs";
import path from "node:path";
import { type APIRequestContext, type APIResponse, expect, request as playwrightRequest } from "@playwright/test";

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
