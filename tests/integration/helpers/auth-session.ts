import { NextRequest } from "next/server";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import { checkContract } from "./contract";

export const APP_ORIGIN = "http://localhost:3000";

/** Signs in through the real auth handler and returns the Cookie header its answer sets. */
export async function signIn(email: string, password: string): Promise<string> {
  const response = await authPost(
    new NextRequest(`${APP_ORIGIN}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP_ORIGIN },
      body: JSON.stringify({ email, password }),
    }),
  );
  if (response.status !== 200) throw new Error(`sign-in as ${email} answered ${response.status}: ${await response.text()}`);
  const cookies = response.headers.getSetCookie().map((cookie) => cookie.split(";")[0]);
  if (cookies.length === 0) throw new Error(`sign-in as ${email} set no cookie`);
  return cookies.join("; ");
}

type Handler = (request: NextRequest, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

/**
 * Calls a route handler as a browser at the app's address would, with an optional session cookie and
 * JSON body; the answer is checked against the API description.
 */
export async function callRoute(
  handler: Handler,
  method: string,
  path: string,
  options: { cookie?: string; body?: unknown; params?: Record<string, string> } = {},
): Promise<Response> {
  const headers = new Headers({ origin: APP_ORIGIN });
  if (options.cookie) headers.set("cookie", options.cookie);
  if (options.body !== undefined) headers.set("content-type", "application/json");
  const body = options.body === undefined ? undefined : typeof options.body === "string" ? options.body : JSON.stringify(options.body);
  const request = new NextRequest(`${APP_ORIGIN}${path}`, { method, headers, body });
  return checkContract(request, await handler(request, { params: Promise.resolve(options.params ?? {}) }));
}
