import { expect, test } from "@playwright/test";
import { client } from "./http";

// Security headers on every kind of response, from the production build (CSP Level 3, RFC 6797 for HSTS).
const COMMON = { "x-content-type-options": "nosniff", "referrer-policy": "strict-origin-when-cross-origin" };

const scriptNonces = (html: string) => [...html.matchAll(/<script\b[^>]*>/g)].map(([tag]) => /nonce="([^"]+)"/.exec(tag)?.[1] ?? null);

test("static files, pages and the API each carry their policy and the common headers", async ({ baseURL }) => {
  const anyone = await client(baseURL!);
  for (const path of ["/robots.txt", "/sitemap.xml", "/", "/size/285-50R20", "/learn", "/sign-in", "/api/health", "/api/v1/decode?q=285%2F50R20", "/no-such-page"]) {
    const headers = (await anyone.get(path)).headers();
    expect(headers, path).toMatchObject(COMMON);
    expect(headers["permissions-policy"], path).toContain("camera=()");
    expect(headers["strict-transport-security"], `${path}: the app runs on http here`).toBeUndefined();
    const policy = headers["content-security-policy"]!;
    expect(policy, path).toContain("frame-ancestors 'none'");
    expect(policy, path).not.toContain("unsafe-eval");
    if (path.startsWith("/api/")) expect(policy).toBe("default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'");
    else expect(policy, path).toMatch(/script-src 'self' 'unsafe-inline'; .*object-src 'none'; base-uri 'self'; form-action 'self'/);
  }
});

test("the Counter and the account run only scripts with a fresh nonce per response", async ({ baseURL }) => {
  const staff = await client(baseURL!, "staff@sidewise.test");
  const nonces = [];
  for (const path of ["/counter", "/counter", "/account"]) {
    const response = await staff.get(path);
    const policy = response.headers()["content-security-policy"]!;
    const nonce = /'nonce-([^']+)'/.exec(policy)?.[1];
    expect(policy).toContain("'strict-dynamic'");
    expect(policy).not.toMatch(/script-src[^;]*unsafe-inline/);
    const tags = scriptNonces(await response.text());
    expect(tags.length).toBeGreaterThan(0);
    expect(tags.every((tag) => tag === nonce), path).toBe(true);
    nonces.push(nonce);
  }
  expect(new Set(nonces).size).toBe(3);
  const signedOut = await (await client(baseURL!)).get("/counter", { maxRedirects: 0 });
  expect(signedOut.headers()["content-security-policy"]).toContain("frame-ancestors 'none'");
});

test("a Fit card still unfurls where it is shared: its Open Graph tags and image answer", async ({ baseURL }) => {
  const staff = await client(baseURL!, "staff@sidewise.test");
  const created = await staff.post("/api/v1/fit-cards", { data: { sizes: ["225/45R17", "225/40R18"], loadIndex: 91, speedSymbol: "V" } });
  expect(created.status()).toBe(201);
  const { slug } = await created.json();
  const html = await (await (await client(baseURL!)).get(`/s/${slug}`)).text();
  const image = /<meta property="og:image" content="([^"]+)"/.exec(html)?.[1];
  expect(html).toMatch(/<meta property="og:title" content="[^"]+"/);
  expect(image).toBeTruthy();
  const picture = await (await client(baseURL!)).get(new URL(image!).pathname + new URL(image!).search);
  expect([picture.status(), picture.headers()["content-type"]]).toEqual([200, "image/png"]);
});
