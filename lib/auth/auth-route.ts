import { apiError } from "@/lib/api/errors";
import { hasBody, isJsonMediaType, maxJsonBodyBytes, readBodyBytes, readJson, tooLargeBody, wrongMediaType } from "@/lib/api/body";
import { CLIENT_ADDRESS_HEADER, clientAddress } from "@/lib/security/client-address";
import { checkRequestOrigin, isStateChanging } from "@/lib/security/request-origin";
import { appOrigin } from "./auth-env";

interface AuthHandlers {
  GET: (request: Request) => Promise<Response>;
  POST: (request: Request) => Promise<Response>;
}

/**
 * Endpoints whose answer must not take longer for a known address than for an unknown one: each
 * answers no sooner than this, which is longer than the work either way takes (a password hash,
 * a row written), so the time tells nothing (OWASP Authentication Cheat Sheet, "Authentication
 * Responses").
 */
export const EQUAL_TIME_MS = 600;
const EQUAL_TIME_PATHS = new Set(["/api/auth/request-password-reset", "/api/auth/sign-up/email"]);

const sleep = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms));

/** The work's answer, no sooner than `ms` after it started. */
export async function answerNoSoonerThan<T>(ms: number, work: Promise<T>, wait: (ms: number) => Promise<void> = sleep): Promise<T> {
  const [answer] = await Promise.all([work, wait(ms)]);
  return answer;
}

/**
 * In front of the sign-in service's own endpoints: it hears the client address by the
 * TRUSTED_PROXY_HOPS rule (any value a client wrote in that header is replaced), and a
 * state-changing request is checked like any other route (origin, JSON content type, 64 KB, no
 * control characters) before the service reads it.
 */
export async function handleAuthRequest(request: Request, handlers: AuthHandlers): Promise<Response> {
  const headers = new Headers(request.headers);
  headers.set(CLIENT_ADDRESS_HEADER, clientAddress(request.headers));
  if (!isStateChanging(request.method)) return handlers.GET(new Request(request.url, { method: request.method, headers }));

  const origin = checkRequestOrigin(request.headers, appOrigin());
  if (!origin.ok) return apiError("forbidden", origin.message);
  if (hasBody(request) && !isJsonMediaType(request.headers.get("content-type"))) return wrongMediaType();
  const read = await readBodyBytes(request, maxJsonBodyBytes);
  if (!read.ok) return tooLargeBody();
  if (read.bytes.length > 0) {
    const json = readJson(read.bytes);
    if (!json.ok) return json.response;
  }
  const forwarded = handlers.POST(new Request(request.url, { method: request.method, headers, body: read.bytes.length > 0 ? read.bytes : undefined }));
  return EQUAL_TIME_PATHS.has(new URL(request.url).pathname) ? answerNoSoonerThan(EQUAL_TIME_MS, forwarded) : forwarded;
}
