/**
 * What the walk of malformed requests sends (tests/security/route-walk.spec.ts): every route file
 * and every page, each with the place its input comes in. `{name}` in a path is a segment the walk
 * replaces with broken ones; `query` is a valid base plus the parameters the route reads; `body` is
 * a valid-looking body whose fields the walk spoils one at a time (chosen so that none of them can
 * change anything stored: unknown brands, SKUs and cards).
 */
export type Caller = "anonymous" | "staff" | "admin";

export interface ApiWalk {
  method: string;
  path: string;
  as?: Caller;
  query?: { base: string; names: string[] };
  body?: Record<string, unknown>;
  multipart?: true;
}

const SLUG = "N".repeat(24);
/** An offer token no offer has. */
const OFFER_TOKEN = "N".repeat(32);
/** A brand or line id no row has: a body the walk spoils into a valid one still changes nothing (404). */
const NO_SUCH_ID = "2147483647";
const LINE = { name: "Walk Line", season: "all-season", terrain: "highway", threePeak: false, treadDepth32: 10 };

export const API_WALKS: Record<string, ApiWalk[]> = {
  "auth/[...all]/route.ts": [
    { method: "GET", path: "/api/auth/get-session" },
    { method: "GET", path: "/api/auth/reset-password/{token}", query: { base: "callbackURL=%2Freset-password", names: ["callbackURL"] } },
    { method: "POST", path: "/api/auth/sign-in/email", body: { email: "walker@example.test", password: "not-the-password" } },
    { method: "POST", path: "/api/auth/sign-up/email", body: { name: "Walker", email: "walker@example.test", password: "walk-password-1" } },
    { method: "POST", path: "/api/auth/request-password-reset", body: { email: "walker@example.test", redirectTo: "/reset-password" } },
    { method: "POST", path: "/api/auth/reset-password", body: { newPassword: "walk-password-2", token: "not-a-token" } },
    { method: "POST", path: "/api/auth/admin/create-user", as: "staff", body: { email: "made@example.test", name: "Made", password: "walk-password-3" } },
    { method: "POST", path: "/api/auth/sign-out", as: "staff" },
  ],
  "health/route.ts": [{ method: "GET", path: "/api/health" }],
  "v1/alternatives/route.ts": [
    {
      method: "GET",
      path: "/api/v1/alternatives",
      query: {
        base: "size=285-50R20&loadIndex=119&speedSymbol=S",
        names: ["size", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "runFlat", "tolerancePct", "season", "terrain", "threePeak", "brand", "minPriceCents", "maxPriceCents", "inStock", "quantity", "sort", "limit", "cursor"],
      },
    },
  ],
  "v1/brands/route.ts": [
    { method: "GET", path: "/api/v1/brands" },
    // Every spoiled name is refused (too long, empty, no letter, a control or broken character), so nothing is added.
    { method: "POST", path: "/api/v1/brands", as: "staff", body: { name: "Walk Brand" } },
  ],
  "v1/brands/[id]/route.ts": [{ method: "PATCH", path: "/api/v1/brands/{id}", as: "staff", body: { name: "Walk Brand" } }],
  "v1/brands/[id]/lines/route.ts": [
    { method: "POST", path: "/api/v1/brands/{id}/lines", as: "staff" },
    { method: "POST", path: `/api/v1/brands/${NO_SUCH_ID}/lines`, as: "staff", body: LINE },
  ],
  "v1/lines/[id]/route.ts": [
    { method: "PATCH", path: "/api/v1/lines/{id}", as: "staff" },
    { method: "PATCH", path: `/api/v1/lines/${NO_SUCH_ID}`, as: "staff", body: { ...LINE, retired: false } },
  ],
  "v1/catalog/route.ts": [
    { method: "GET", path: "/api/v1/catalog", query: { base: "limit=5", names: ["cursor", "limit"] } },
    {
      method: "POST",
      path: "/api/v1/catalog",
      as: "staff",
      body: { sku: "WALK-1", brand: "No Such Brand", line: "No Such Line", designation: "205/55R16", loadIndex: 91, speedSymbol: "V", priceCents: 100, quantity: 1 },
    },
  ],
  "v1/catalog/[sku]/route.ts": [
    { method: "PATCH", path: "/api/v1/catalog/{sku}", as: "staff", body: { priceCents: 100, brand: "No Such Brand" } },
    { method: "DELETE", path: "/api/v1/catalog/{sku}", as: "staff" },
  ],
  "v1/catalog/export/route.ts": [
    { method: "GET", path: "/api/v1/catalog/export", as: "staff", query: { base: "", names: ["q", "brand", "season", "terrain", "rim", "stock", "sort", "dir", "page"] } },
  ],
  "v1/catalog/import/route.ts": [{ method: "POST", path: "/api/v1/catalog/import", as: "staff", multipart: true }],
  "v1/offers/[token]/route.ts": [{ method: "GET", path: "/api/v1/offers/{token}" }],
  "v1/offers/[token]/slots/route.ts": [{ method: "GET", path: `/api/v1/offers/${OFFER_TOKEN}/slots`, query: { base: "from=2026-12-07", names: ["from"] } }],
  // An unknown token: every spoiled body still reaches no offer.
  "v1/offers/[token]/accept/route.ts": [{ method: "POST", path: `/api/v1/offers/${OFFER_TOKEN}/accept`, body: { slotStart: "2026-12-07T09:00:00-05:00" } }],
  "v1/offers/[token]/cancel/route.ts": [{ method: "POST", path: "/api/v1/offers/{token}/cancel" }],
  "v1/compare/route.ts": [{ method: "GET", path: "/api/v1/compare", query: { base: "sizes=265-70R17,285-70R17", names: ["sizes"] } }],
  "v1/decode/route.ts": [{ method: "GET", path: "/api/v1/decode", query: { base: "q=285%2F50R20", names: ["q"] } }],
  "v1/fit-cards/route.ts": [
    { method: "POST", path: "/api/v1/fit-cards", as: "staff", body: { sizes: ["225/45R17"], skus: ["NO-SUCH-SKU"], loadIndex: 91, speedSymbol: "V", note: "walk" } },
  ],
  "v1/fit-cards/[slug]/route.ts": [
    { method: "GET", path: "/api/v1/fit-cards/{slug}" },
    { method: "DELETE", path: "/api/v1/fit-cards/{slug}", as: "staff" },
  ],
  "v1/fit-cards/[slug]/email/route.ts": [{ method: "POST", path: `/api/v1/fit-cards/${SLUG}/email`, as: "staff", body: { to: "nobody@example.test", message: "walk" } }],
  "v1/openapi.json/route.ts": [{ method: "GET", path: "/api/v1/openapi.json" }],
  "v1/wear-match/route.ts": [
    {
      method: "GET",
      path: "/api/v1/wear-match",
      query: { base: "size=225-65R17&newTreadDepth32=10&remaining32=6,6,7", names: ["size", "newTreadDepth32", "remaining32", "limit32", "limitCircumferenceMm"] },
    },
  ],
  "v1/plus/route.ts": [{ method: "GET", path: "/api/v1/plus", query: { base: "size=225-45R17", names: ["size", "loadIndex", "speedSymbol", "tolerancePct", "all"] } }],
  "v1/quote-requests/route.ts": [
    {
      method: "POST",
      path: "/api/v1/quote-requests",
      body: { name: "Walker", email: "walker@example.test", vehicle: "2019 family SUV", tires: "235/65R17", quantity: 4, source: "size-sheet", skus: ["WALK-1"], website: "", renderedAt: "1.unsigned" },
    },
    { method: "GET", path: "/api/v1/quote-requests", as: "staff", query: { base: "", names: ["status", "page"] } },
  ],
  "v1/quote-requests/[id]/offers/route.ts": [
    { method: "POST", path: "/api/v1/quote-requests/{id}/offers", as: "staff" },
    // No such request and no such SKU: nothing is offered, however the body is spoiled.
    { method: "POST", path: `/api/v1/quote-requests/${NO_SUCH_ID}/offers`, as: "staff", body: { lines: [{ sku: "NO-SUCH-SKU", quantity: 4 }], validUntil: "2026-12-20", message: "walk" } },
  ],
  "v1/quote-requests/form-token/route.ts": [{ method: "GET", path: "/api/v1/quote-requests/form-token" }],
  "v1/shop/route.ts": [
    { method: "GET", path: "/api/v1/shop" },
    // tolerancePct 9 is out of range, and no spoiled value is in range, so no probe can change the shop.
    {
      method: "PATCH",
      path: "/api/v1/shop",
      as: "admin",
      body: {
        tolerancePct: 9, name: "Walk", address: { town: "Walk" }, phone: "(555) 010-0000", email: "walk@example.test", timeZone: "UTC",
        hours: { sat: [["08:00", "12:00"]] }, closedDates: ["2026-12-24"], fittingPerTireCents: 1, disposalPerTireCents: 1, tireFeePerTireCents: 1, taxRateBp: 1, taxServices: false,
      },
    },
  ],
};

/** Every page by its file under app/, with its address and the parameters it reads. */
export const PAGE_WALKS: Record<string, { path: string; as?: Caller; names?: string[] }> = {
  "page.tsx": { path: "/", names: ["q"] },
  "account/page.tsx": { path: "/account", as: "staff" },
  "compare/page.tsx": { path: "/compare", names: ["sizes"] },
  "counter/(catalog)/page.tsx": { path: "/counter", as: "staff", names: ["q", "brand", "season", "rim", "stock", "sort", "dir", "page", "added"] },
  "counter/audit/page.tsx": { path: "/counter/audit", as: "admin", names: ["page"] },
  "counter/cards/page.tsx": { path: "/counter/cards", as: "staff", names: ["q", "page"] },
  "counter/fittings/page.tsx": { path: "/counter/fittings", as: "staff", names: ["day", "view"] },
  "counter/import/page.tsx": { path: "/counter/import", as: "staff" },
  "counter/items/[sku]/page.tsx": { path: "/counter/items/{sku}", as: "staff" },
  "counter/items/new/page.tsx": { path: "/counter/items/new", as: "staff" },
  "counter/lines/page.tsx": { path: "/counter/lines", as: "staff" },
  "counter/outbox/page.tsx": { path: "/counter/outbox", as: "staff" },
  "counter/requests/(inbox)/page.tsx": { path: "/counter/requests", as: "staff", names: ["status", "page"] },
  "counter/requests/[id]/page.tsx": { path: "/counter/requests/{id}", as: "staff" },
  "counter/shop/page.tsx": { path: "/counter/shop", as: "admin" },
  "counter/team/page.tsx": { path: "/counter/team", as: "admin", names: ["q"] },
  "forgot-password/page.tsx": { path: "/forgot-password" },
  "learn/[topic]/page.tsx": { path: "/learn/{topic}" },
  "learn/page.tsx": { path: "/learn" },
  "o/[token]/page.tsx": { path: "/o/{token}" },
  "plus/page.tsx": { path: "/plus", names: ["size", "loadIndex", "speedSymbol", "tolerancePct"] },
  "replace/page.tsx": { path: "/replace", names: ["size", "loadIndex", "speedSymbol", "brand", "season", "minPriceCents", "gawrFront", "vehicle", "quantity", "sort"] },
  "reset-password/page.tsx": { path: "/reset-password", names: ["token", "error"] },
  "s/[slug]/opengraph-image.tsx": { path: "/s/{slug}/opengraph-image" },
  "s/[slug]/page.tsx": { path: "/s/{slug}" },
  "sign-in/page.tsx": { path: "/sign-in", names: ["next", "reset", "signedUp"] },
  "sign-up/page.tsx": { path: "/sign-up", names: ["next"] },
  "size/[size]/opengraph-image.tsx": { path: "/size/{size}/opengraph-image" },
  "size/[size]/page.tsx": { path: "/size/{size}", names: ["units"] },
  "wear-match/page.tsx": { path: "/wear-match", names: ["size", "newTreadDepth32", "remaining32", "limit32", "limitCircumferenceMm"] },
};

/** Path segments that are not percent-encoded UTF-8, or that carry what no address should. */
export const BAD_SEGMENTS = ["%FF", "%", "%ED%A0%80", "%E2%82", "%C0%AF", "%00", "a%00b", "%0A", "%2F..%2F..", "%F0%9F%9A%97", "x".repeat(400), "NEW"];

/** Query values: control characters, broken encodings, numbers that are not, injections, an over-long text. */
export const BAD_QUERY_VALUES = [
  "%00", "a%00b", "%FF", "%ED%A0%80", "%E2%82", "%0A", "%09", "%7F", "%C2%85", "-1", "1e309", "0x1F", "NaN", "Infinity", "%5B%5D",
  "'%20OR%201%3D1--", "%E2%80%AE", "9".repeat(40), "x".repeat(2001),
];

/** The fewer of them a page gets: pages render, which takes longer than answering JSON. */
export const BAD_PAGE_VALUES = ["%00", "%FF", "%ED%A0%80", "%0A", "-1", "%5B%5D", "x".repeat(3000)];

/** What one field of a JSON body is spoiled with. */
export const BAD_FIELD_VALUES: unknown[] = ["\u0000", "a\u0000b", "\u001b[31m", "\ud800", "", -1, 1e308, 0.5, [], {}, null, true, "x".repeat(5000), ["\u0000"], { nested: "\u0000" }];

/** Whole bodies that are not what a JSON route takes, each with the content type it comes with. */
export const BAD_BODIES: { type?: string; body: string | Buffer }[] = [
  { type: "application/json", body: "{" },
  { type: "application/json", body: "[]" },
  { type: "application/json", body: "1" },
  { type: "application/json", body: "null" },
  { type: "application/json", body: '{"\\u0000":"\\u0000"}' },
  { type: "application/json", body: "\u0000" },
  { type: "application/json", body: Buffer.from([0xff, 0xfe, 0x7b, 0x7d]) },
  { type: "application/json", body: JSON.stringify({ filler: "x".repeat(70 * 1024) }) },
  { type: "application/json; charset=utf-8", body: "" },
  { type: "text/plain", body: "{}" },
  { type: "application/x-www-form-urlencoded", body: "a=b" },
  { type: "multipart/form-data; boundary=x", body: "--x\r\nbroken" },
  { body: "{}" },
];

/** Multipart bodies for the catalog import: broken framing, no file, text for a file, NUL bytes, an unknown mode. */
export const BAD_MULTIPART: { type: string; body: string | Buffer }[] = [
  { type: "multipart/form-data; boundary=x", body: "--x\r\nnonsense" },
  { type: "multipart/form-data", body: "--x--" },
  { type: "multipart/form-data; boundary=x", body: '--x\r\nContent-Disposition: form-data; name="mode"\r\n\r\nvalid-rows\r\n--x--\r\n' },
  { type: "multipart/form-data; boundary=x", body: '--x\r\nContent-Disposition: form-data; name="file"\r\n\r\nsku,brand\r\n--x--\r\n' },
  {
    type: "multipart/form-data; boundary=x",
    body: Buffer.from('--x\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\nContent-Type: text/csv\r\n\r\nsku,brand,line\n\u0000A,\u0000B,C\r\n--x--\r\n'),
  },
  { type: "multipart/form-data; boundary=x", body: '--x\r\nContent-Disposition: form-data; name="mode"\r\n\r\n\u0000\r\n--x--\r\n' },
];

/** Server-action requests to pages that are not the app's own: no action, a made-up one, bodies React cannot decode. */
export const BAD_PAGE_POSTS: { headers: Record<string, string>; body: string }[] = [
  { headers: { "content-type": "multipart/form-data; boundary=x" }, body: "nonsense" },
  { headers: { "content-type": "text/plain", "next-action": "zz" }, body: "[]" },
  { headers: { "content-type": "text/plain", "next-action": "7f".padEnd(42, "0") }, body: "garbage" },
  { headers: { "content-type": "text/plain", "next-action": "7f".padEnd(42, "0") }, body: '["$Q1"]' },
  { headers: { "content-type": "text/plain", "next-action": "7f".padEnd(42, "0") }, body: "[]" },
  { headers: { "content-type": "application/x-www-form-urlencoded" }, body: "a=b" },
  { headers: { "content-type": "text/plain", "next-action": "7f".padEnd(42, "0"), origin: "http://localhost:1" }, body: "[]" },
];
