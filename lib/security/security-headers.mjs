// Plain JavaScript so that next.config.mjs can load it before anything is compiled; proxy.ts
// imports it too, so static and dynamic pages share one list of directives.

/**
 * A page's Content-Security-Policy. With a nonce (pages rendered per request: the Counter, the
 * account), only scripts carrying it run, and the ones they load ('strict-dynamic'). Without one
 * (pages that must stay static, whose HTML cannot carry a fresh nonce), inline scripts are allowed
 * because Next.js inlines its own, but scripts from any other origin are not. Either way: no
 * framing, no plugins, no forms posting elsewhere, no <base> pointing elsewhere. 'unsafe-eval' only
 * for the development server, which evaluates modules while it reloads them.
 * @param {{ nonce?: string, development?: boolean, https?: boolean }} options
 */
export function pagePolicy({ nonce, development = false, https = false } = {}) {
  const scripts = nonce ? ["'self'", `'nonce-${nonce}'`, "'strict-dynamic'"] : ["'self'", "'unsafe-inline'"];
  if (development) scripts.push("'unsafe-eval'");
  return [
    "default-src 'self'",
    `script-src ${scripts.join(" ")}`,
    // Inline style attributes: the drawing's motion and Next.js's own style tags.
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ].join("; ");
}

/** The API and the share images are never documents that run anything or sit in a frame. */
export const API_POLICY = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

/**
 * Headers every response carries. HSTS (RFC 6797) only when the app's address is https, so that a
 * development server on http://localhost never pins a browser to https.
 * @param {{ https?: boolean }} options
 * @returns {{ key: string, value: string }[]}
 */
export function commonHeaders({ https = false } = {}) {
  return [
    { key: "X-Content-Type-Options", value: "nosniff" },
    { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
    { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=(), browsing-topics=()" },
    ...(https ? [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }] : []),
  ];
}

/** Whether BETTER_AUTH_URL (the app's own address) is https. @param {string | undefined} url */
export function servesHttps(url) {
  return typeof url === "string" && url.trim().toLowerCase().startsWith("https://");
}

/** Paths whose pages are rendered per request and get the nonce policy from proxy.ts instead. */
export const NONCE_PAGE_PREFIXES = ["/counter", "/account"];

/**
 * The rules of next.config's `headers()`: applied to static files and prerendered pages too, so no
 * page turns dynamic for a header.
 * @param {{ development?: boolean, https?: boolean }} options
 */
export function headerRules({ development = false, https = false } = {}) {
  const noncePages = NONCE_PAGE_PREFIXES.map((prefix) => `${prefix.slice(1)}/|${prefix.slice(1)}$`).join("|");
  return [
    { source: "/:path*", headers: commonHeaders({ https }) },
    { source: `/((?!api/|${noncePages}).*)`, headers: [{ key: "Content-Security-Policy", value: pagePolicy({ development, https }) }] },
    { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: API_POLICY }] },
  ];
}
