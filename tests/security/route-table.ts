/**
 * Every route handler and server action of the app, with what each kind of caller gets: the one
 * list the authorization matrix (tests/security/authorization-matrix.test.ts) and the walk of
 * malformed requests over HTTP (tests/security/route-walk.spec.ts) both read.
 */
export type Who = "anonymous" | "customer" | "staff" | "admin";
export const CALLERS: readonly Who[] = ["anonymous", "customer", "staff", "admin"];

/** Handlers anyone may call, per route file and method; the auth library's own endpoints check their own requests. */
export const PUBLIC_HANDLERS = [
  "auth/[...all]/route.ts#GET",
  "auth/[...all]/route.ts#POST",
  "health/route.ts#GET",
  "v1/alternatives/route.ts#GET",
  "v1/brands/route.ts#GET",
  "v1/catalog/route.ts#GET",
  "v1/compare/route.ts#GET",
  "v1/decode/route.ts#GET",
  "v1/fit-cards/[slug]/route.ts#GET",
  "v1/offers/[token]/route.ts#GET",
  "v1/offers/[token]/slots/route.ts#GET",
  "v1/offers/[token]/accept/route.ts#POST",
  "v1/offers/[token]/cancel/route.ts#POST",
  "v1/openapi.json/route.ts#GET",
  "v1/plus/route.ts#GET",
  "v1/quote-requests/form-token/route.ts#GET",
  "v1/quote-requests/route.ts#POST",
  "v1/shop/route.ts#GET",
  "v1/wear-match/route.ts#GET",
];

/** Every method a route file can answer; Next.js answers 405 for one the file does not export. */
export const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;

/** A brand or line id no row has (the largest PostgreSQL integer). */
const NO_SUCH_ID = "2147483647";

/**
 * Every protected handler, called so that nothing changes once authorization passes (an invalid
 * body, an unknown SKU): the status an allowed caller gets shows the request went past the guard.
 */
export const MATRIX: { file: string; method: string; path: string; body?: unknown; params?: Record<string, string>; expected: Record<Who, number> }[] = [
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
  {
    file: "v1/quote-requests/[id]/offers/route.ts", method: "POST", path: `/api/v1/quote-requests/${NO_SUCH_ID}/offers`, params: { id: NO_SUCH_ID },
    body: { lines: [{ sku: "NO-SUCH-SKU", quantity: 4 }] }, expected: { anonymous: 401, customer: 403, staff: 422, admin: 422 },
  },
  // A tolerance outside 1–5 % is refused after the guard, so nothing changes.
  { file: "v1/shop/route.ts", method: "PATCH", path: "/api/v1/shop", body: { tolerancePct: 9 }, expected: { anonymous: 401, customer: 403, staff: 403, admin: 400 } },
  { file: "v1/brands/route.ts", method: "POST", path: "/api/v1/brands", body: {}, expected: { anonymous: 401, customer: 403, staff: 400, admin: 400 } },
  {
    file: "v1/brands/[id]/route.ts", method: "PATCH", path: `/api/v1/brands/${NO_SUCH_ID}`, params: { id: NO_SUCH_ID }, body: { name: "Nobody" },
    expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 },
  },
  {
    file: "v1/brands/[id]/lines/route.ts", method: "POST", path: `/api/v1/brands/${NO_SUCH_ID}/lines`, params: { id: NO_SUCH_ID }, body: {},
    expected: { anonymous: 401, customer: 403, staff: 400, admin: 400 },
  },
  {
    file: "v1/lines/[id]/route.ts", method: "PATCH", path: `/api/v1/lines/${NO_SUCH_ID}`, params: { id: NO_SUCH_ID }, body: { retired: false },
    expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 },
  },
];

/**
 * Every server action, called with input that changes nothing once authorization passes; the
 * status it answers uses the API's numbers.
 */
export const ACTION_MATRIX: { file: string; action: string; input: unknown; expected: Record<Who, number> }[] = [
  {
    file: "lib/team/actions.ts", action: "changeRole", input: { userId: "no-such-account", role: "staff" },
    expected: { anonymous: 401, customer: 403, staff: 403, admin: 404 },
  },
  { file: "lib/quotes/actions.ts", action: "setQuoteStatus", input: { id: 999_999, status: "closed" }, expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 } },
  { file: "lib/quotes/actions.ts", action: "sendQuoteReply", input: { id: 999_999, body: "Hello" }, expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 } },
  {
    file: "lib/quotes/actions.ts", action: "recordWalkIn", input: { name: "Walk In", email: "walk-in@example.test", vehicle: "Van", tires: "225/65R17 102H", quantity: 4, skus: [] },
    expected: { anonymous: 401, customer: 403, staff: 200, admin: 200 },
  },
  { file: "lib/offers/actions.ts", action: "findOfferTire", input: { sku: "NO-SUCH-SKU" }, expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 } },
  // The catalog is empty here, so the SKU is refused before the request is looked up.
  { file: "lib/offers/actions.ts", action: "sendOffer", input: { requestId: 999_999, lines: [{ sku: "NO-SUCH-SKU", quantity: 4 }] }, expected: { anonymous: 401, customer: 403, staff: 400, admin: 400 } },
  { file: "lib/offers/actions.ts", action: "withdrawOffer", input: { id: 999_999, requestId: 999_999 }, expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 } },
  { file: "lib/offers/actions.ts", action: "markFitting", input: { id: 999_999, requestId: 999_999, outcome: "fitted" }, expected: { anonymous: 401, customer: 403, staff: 404, admin: 404 } },
];


/**
 * Every Counter page, with an address to open it at and the least role that sees it: anyone signed
 * out is sent to sign in, a signed-in account without the role gets the refusal in its place.
 * `{sku}` stands for an item the catalog holds.
 */
export const COUNTER_PAGES: { file: string; path: string; role: "staff" | "admin" }[] = [
  { file: "(catalog)/page.tsx", path: "/counter", role: "staff" },
  { file: "audit/page.tsx", path: "/counter/audit", role: "admin" },
  { file: "cards/page.tsx", path: "/counter/cards", role: "staff" },
  { file: "fittings/page.tsx", path: "/counter/fittings", role: "staff" },
  { file: "import/page.tsx", path: "/counter/import", role: "staff" },
  { file: "items/[sku]/page.tsx", path: "/counter/items/{sku}", role: "staff" },
  { file: "items/new/page.tsx", path: "/counter/items/new", role: "staff" },
  { file: "lines/page.tsx", path: "/counter/lines", role: "staff" },
  { file: "outbox/page.tsx", path: "/counter/outbox", role: "staff" },
  { file: "requests/(inbox)/page.tsx", path: "/counter/requests", role: "staff" },
  { file: "requests/[id]/page.tsx", path: "/counter/requests/1", role: "staff" },
  { file: "shop/page.tsx", path: "/counter/shop", role: "admin" },
  { file: "team/page.tsx", path: "/counter/team", role: "admin" },
];
