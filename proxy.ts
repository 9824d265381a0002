import { getSessionCookie } from "better-auth/cookies";
import { NextResponse, type NextRequest } from "next/server";
import { apiError } from "@/lib/api/errors";
import { refusePagePost } from "@/lib/security/page-post";
import { pathDecodes } from "@/lib/security/path-segments";
import { API_POLICY, NONCE_PAGE_PREFIXES, pagePolicy, servesHttps } from "@/lib/security/security-headers.mjs";

const development = process.env.NODE_ENV === "development";
const https = () => servesHttps(process.env.BETTER_AUTH_URL);

const isUnder = (pathname: string, prefix: string) => pathname === prefix || pathname.startsWith(`${prefix}/`);

/** An answer proxy.ts makes itself still carries the policy its path would get. */
function withPolicy(response: Response, pathname: string): Response {
  response.headers.set("Content-Security-Policy", isUnder(pathname, "/api") ? API_POLICY : pagePolicy({ development, https: https() }));
  return response;
}

/** The Counter and the account are rendered per request anyway: their scripts carry a fresh nonce. */
function withNonce(request: NextRequest): NextResponse {
  const policy = pagePolicy({ nonce: Buffer.from(crypto.randomUUID()).toString("base64"), development, https: https() });
  const headers = new Headers(request.headers);
  headers.set("Content-Security-Policy", policy);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("Content-Security-Policy", policy);
  return response;
}

// Refuses what Next.js itself would answer with 500 (a path that does not decode, a page post that
// is not a well-formed action of this origin), sends visitors without a session cookie to sign in
// before the Counter or the account, and gives those pages their nonce. Whether a session is real,
// and whether its role may see the page, is checked by the page itself: this never authorizes.
export async function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  if (!pathDecodes(pathname)) {
    if (isUnder(pathname, "/api")) {
      return withPolicy(apiError("invalid_parameter", "The address holds a part that is not valid percent-encoded UTF-8 (RFC 3986 §2.1)."), pathname);
    }
    return NextResponse.rewrite(new URL("/_not-found", request.url));
  }
  if (!isUnder(pathname, "/api")) {
    const refused = await refusePagePost(request);
    if (refused) return withPolicy(refused, pathname);
  }
  if (!NONCE_PAGE_PREFIXES.some((prefix) => isUnder(pathname, prefix))) return NextResponse.next();
  if (!getSessionCookie(request)) {
    const signIn = new URL("/sign-in", request.url);
    signIn.searchParams.set("next", `${pathname}${request.nextUrl.search}`);
    return withPolicy(NextResponse.redirect(signIn), pathname);
  }
  return withNonce(request);
}

export const config = {
  // Every page (API routes only for their path check: their bodies are read by the routes themselves).
  matcher: ["/((?!api/|_next/static/|_next/image).*)", "/api/(.*%.*)"],
};
