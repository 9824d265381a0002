import { expect, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { openMainNav } from "./helpers/main-nav";

const shellPages = [
  { path: "/", heading: "What does your sidewall say?" },
  { path: "/compare", heading: "What a different size changes" },
  { path: "/plus", heading: "Bigger (or smaller) wheels, same overall size" },
  { path: "/replace", heading: "Equal-or-better tires in stock" },
  { path: "/learn", heading: "Sidewall school" },
];

test.describe("the app shell", () => {
  for (const { path, heading } of shellPages) {
    test(`${path} renders with header, footer and no accessibility violations`, async ({ page }) => {
      const response = await page.goto(path);
      expect(response?.status()).toBe(200);
      await expect(page.getByRole("heading", { level: 1, name: heading })).toBeVisible();
      await expect(page.getByRole("navigation", { name: "Main" })).toBeVisible();
      await expect(page.getByRole("contentinfo")).toContainText("Tires carry people");
      await expect(page.getByRole("contentinfo")).toContainText("Marrowby Tire Works");
      await expectNoAxeViolations(page);
    });
  }

  test("the main navigation leads to each screen and marks the current one", async ({ page }) => {
    await page.goto("/");
    await (await openMainNav(page)).getByRole("link", { name: "Side-by-side" }).click();
    await expect(page).toHaveURL(/\/compare$/);
    await expect(page.getByRole("heading", { level: 1, name: "What a different size changes" })).toBeVisible();
    const nav = await openMainNav(page);
    await expect(nav.getByRole("link", { name: "Side-by-side" })).toHaveAttribute("aria-current", "page");
    await nav.getByRole("link", { name: "Sidewall school" }).click();
    await expect(page).toHaveURL(/\/learn$/);
    await expect(page.getByRole("heading", { level: 1, name: "Sidewall school" })).toBeVisible();
    await (await openMainNav(page)).getByRole("link", { name: "Sidewall reader" }).click();
    await expect(page.getByRole("heading", { level: 1, name: "What does your sidewall say?" })).toBeVisible();
  });

  test("an unknown address answers 404 with a way back", async ({ page }) => {
    const response = await page.goto("/no-such-page");
    expect(response?.status()).toBe(404);
    await expect(page.getByRole("heading", { level: 1, name: "We could not find that page" })).toBeVisible();
    await expect(page.getByRole("link", { name: "Back to the Sidewall reader" })).toBeVisible();
    await expectNoAxeViolations(page);
  });

  test("the page fits a phone without sideways scrolling", async ({ page }) => {
    await page.goto("/");
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
  });
});

test("GET /api/health reports the embedded database", async ({ request }) => {
  const response = await request.get("/api/health");
  expect(response.status()).toBe(200);
  expect(await response.json()).toEqual({ status: "ok", db: "pglite" });
  expect(response.headers()["cache-control"]).toContain("no-store");
});
