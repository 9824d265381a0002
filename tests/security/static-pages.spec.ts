import type { APIRequestContext } from "@playwright/test";
import { expect, test } from "@playwright/test";
import { client } from "./http";

// Pages that change with nothing a visitor sends are rendered once and served from the server's
// cache (lib/cache/bounded-cache-handler.mjs): the footer's shop contact comes from a cache too,
// which a change of the shop's settings expires. Against the production build; whatever this file
// changes is put back in afterAll, since other specs read the demo shop from the same server.
test.describe.configure({ mode: "serial" });

let anonymous: APIRequestContext;
let admin: APIRequestContext;
let originalPhone: string | undefined;

const CACHE = "x-nextjs-cache";

test.beforeAll(async ({ baseURL }) => {
  [anonymous, admin] = await Promise.all([client(baseURL!), client(baseURL!, "admin@sidewise.test")]);
  originalPhone = (await (await anonymous.get("/api/v1/shop")).json()).phone;
});

test.afterAll(async () => {
  if (originalPhone) expect((await admin.patch("/api/v1/shop", { data: { phone: originalPhone } })).status(), "the demo shop's phone is put back").toBe(200);
  await Promise.all([anonymous, admin].map((context) => context?.dispose()));
});

async function footerOf(path: string, status = 200): Promise<string> {
  const response = await anonymous.get(path);
  expect(response.status(), path).toBe(status);
  const html = await response.text();
  return html.slice(html.lastIndexOf("<footer"));
}

test("a static page's footer shows the shop's contact as the database has it, and the page is served from the cache", async () => {
  for (const path of ["/learn", "/learn/load-index", "/size/285-50R20"]) {
    expect(await footerOf(path), path).toContain(originalPhone!);
    const again = await anonymous.get(path);
    expect([path, again.headers()[CACHE]]).toEqual([path, "HIT"]);
  }
});

test("after an admin changes the shop's phone, the next page load shows the new one, everywhere the footer is", async () => {
  for (const path of ["/learn", "/size/285-50R20"]) expect((await anonymous.get(path)).headers()[CACHE], path).toBe("HIT");
  const newPhone = "(555) 014-6613";
  const changed = await admin.patch("/api/v1/shop", { data: { phone: newPhone } });
  expect(changed.status()).toBe(200);
  const pages: [string, number][] = [["/learn", 200], ["/learn/load-index", 200], ["/size/285-50R20", 200], ["/size/LT265-75R16", 200], ["/", 200], ["/no-such-page", 404]];
  for (const [path, status] of pages) {
    const footer = await footerOf(path, status);
    expect(footer, path).toContain(newPhone);
    expect(footer, path).not.toContain(originalPhone!);
  }
});

test("only a size's one spelling enters the cache: a string that is not a size stays 404, another spelling a 308, never stored", async () => {
  for (let round = 0; round < 2; round += 1) {
    const unknown = await anonymous.get("/size/999-99R99");
    expect(unknown.status()).toBe(404);
    expect(unknown.headers()[CACHE]).not.toBe("HIT");
    const spelling = await anonymous.get("/size/285-50r20", { maxRedirects: 0 });
    expect(spelling.status()).toBe(308);
    expect(spelling.headers()["location"]).toMatch(/\/size\/285-50R20$/);
    expect(spelling.headers()[CACHE]).not.toBe("HIT");
    const image = await anonymous.get("/size/not-a-size/opengraph-image");
    expect(image.status()).toBe(404);
    expect(image.headers()[CACHE]).not.toBe("HIT");
  }
});

test("a size not rendered at build is rendered at its first request, then served from the cache; its share image too", async () => {
  for (const path of ["/size/245-35R21", "/size/245-35R21/opengraph-image"]) {
    const first = await anonymous.get(path);
    expect(first.status(), path).toBe(200);
    const again = await anonymous.get(path);
    expect([path, again.status(), again.headers()[CACHE]]).toEqual([path, 200, "HIT"]);
  }
});
