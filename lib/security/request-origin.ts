import { getSessionCookie } from "better-auth/cookies";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** POST, PUT, PATCH, DELETE and anything else that is not a safe method (RFC 9110 §9.2.1). */
export function isStateChanging(method: string): boolean {
  return !SAFE_METHODS.has(method.toUpperCase());
}

function serializedOrigin(value: string): string | null {
  if (value === "null") return null;
  try {
    return new URL(value).origin;
  } catch {
    return null;
  }
}

export type OriginCheck = { ok: true } | { ok: false; message: string };

/**
 * Whether a state-changing request comes from the app's own pages: its Origin header (RFC 6454 §7),
 * or when a browser sent none, its Referer, must name exactly the app's origin. A request with
 * neither passes only when it carries no session cookie, so that a script holding a signed-in
 * browser's cookie can never write without saying where it comes from (OWASP CSRF Prevention Cheat
 * Sheet: "Verifying Origin With Standard Headers").
 */
export function checkRequestOrigin(headers: Headers, appOrigin: string): OriginCheck {
  const origin = headers.get("origin");
  const referer = origin === null ? headers.get("referer") : null;
  const claimed = origin ?? referer;
  if (claimed !== null) {
    return serializedOrigin(claimed) === appOrigin
      ? { ok: true }
      : { ok: false, message: "This request comes from another site or page origin, so it is refused." };
  }
  if (getSessionCookie(headers)) {
    return { ok: false, message: "This request carries a session but neither an Origin nor a Referer header, so it is refused." };
  }
  return { ok: true };
}
