import { expect, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

test.describe("the Size sheet", () => {
  test("shows 285/50R20 in both unit systems, drawn, explained and with cautions", async ({ page }) => {
    const response = await page.goto("/size/285-50R20");
    expect(response?.status()).toBe(200);
    await expect(page.getByRole("heading", { level: 1, name: "285/50R20" })).toBeVisible();
    // Nominal geometry: 20 × 25.4 + 2 × 285 × 0.50 = 793 mm = 31.2 in.
    const overall = page.getByRole("row", { name: /Overall diameter/ });
    await expect(overall).toContainText("793 mm");
    await expect(overall).toContainText("31.2 in");
    await expect(page.locator('svg[role="img"]').filter({ visible: true })).toHaveCount(1);
    await expect(page.getByText("Before you choose")).toBeVisible();
    await expect(page.getByRole("link", { name: /Find replacements in stock/ })).toHaveAttribute("href", "/replace?size=285-50R20");
    await expect(page.locator('link[rel="canonical"]')).toHaveAttribute("href", /\/size\/285-50R20$/);
    await expectNoAxeViolations(page);
  });

  test("answers a permanent redirect (308) from another spelling to the canonical one", async ({ request }) => {
    for (const spelling of ["285%2F50R20", "285-50r20"]) {
      const response = await request.get(`/size/${spelling}`, { maxRedirects: 0 });
      expect(response.status()).toBe(308);
      expect(response.headers().location).toMatch(/\/size\/285-50R20$/);
    }
  });

  test("answers 404 with the not-found page for an unreadable size", async ({ page }) => {
    const response = await page.goto("/size/not-a-size");
    expect(response?.status()).toBe(404);
    await expect(page.getByRole("heading", { level: 1, name: "We could not find that page" })).toBeVisible();
    await expect(page.getByRole("link", { name: "Back to the Sidewall reader" })).toBeVisible();
  });

  test("has a 1200×630 PNG share image referenced by og:image", async ({ page, request }) => {
    await page.goto("/size/LT265-75R16");
    const imageUrl = await page.locator('meta[property="og:image"]').getAttribute("content");
    expect(imageUrl).toBeTruthy();
    const image = await request.get(new URL(imageUrl!).pathname + new URL(imageUrl!).search);
    expect(image.status()).toBe(200);
    expect(image.headers()["content-type"]).toBe("image/png");
    const bytes = await image.body();
    // PNG header: width and height are big-endian 32-bit integers at bytes 16 and 20 (PNG specification, IHDR).
    expect([bytes.readUInt32BE(16), bytes.readUInt32BE(20)]).toEqual([1200, 630]);
  });

  test("lists common Size sheets in the sitemap and points robots at it", async ({ request }) => {
    const sitemap = await (await request.get("/sitemap.xml")).text();
    expect(sitemap).toContain("/size/285-50R20</loc>");
    expect(sitemap).toContain("/size/LT265-75R16</loc>");
    const robots = await (await request.get("/robots.txt")).text();
    expect(robots).toContain("Sitemap:");
    expect(robots).toContain("Disallow: /counter");
  });
});
