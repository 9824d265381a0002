import { expect, type Page, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

const topics = [
  { slug: "load-index", card: "Load index", heading: "Load index: how much one tire may carry" },
  { slug: "speed-symbols", card: "Speed symbols", heading: "Speed symbols: the letter after the load index" },
  { slug: "load-range", card: "Load range", heading: "Load range and ply rating" },
  { slug: "dot-code", card: "DOT code and tire age", heading: "The DOT code (TIN) and how old a tire is" },
  { slug: "utqg", card: "UTQG grades", heading: "UTQG: treadwear, traction and temperature grades" },
  { slug: "winter-marks", card: "Winter marks", heading: "Winter marks: M+S and the three-peak mountain snowflake" },
  { slug: "run-flat-and-xl", card: "Run-flat and XL", heading: "Run-flat and Extra Load (XL) tires" },
  { slug: "overall-diameter", card: "Diameter and speedometer", heading: "Overall diameter, aspect ratio and the speedometer" },
  { slug: "tread-depth", card: "Tread depth and AWD", heading: "Tread depth and all-wheel drive" },
];

const tableRows = (page: Page) => page.locator("tbody tr[data-row]");
const shownRows = (page: Page) => page.locator("tbody tr[data-row]:visible");
const rowCount = (page: Page) => page.getByRole("status").filter({ hasText: "Showing" });

test.describe("Sidewall school", () => {
  test("/learn lists every topic with a one-line summary", async ({ page }) => {
    const response = await page.goto("/learn");
    expect(response?.status()).toBe(200);
    await expect(page.getByRole("heading", { level: 1, name: "Sidewall school" })).toBeVisible();
    for (const { slug, card } of topics) {
      await expect(page.getByRole("link", { name: card, exact: true })).toHaveAttribute("href", `/learn/${slug}`);
    }
    await expectNoAxeViolations(page);
  });

  for (const { slug, heading } of topics) {
    test(`/learn/${slug} names its standard, links to the reader and has no accessibility violations`, async ({ page, isMobile }) => {
      test.skip(!isMobile, "the lessons share one layout, scanned at phone width; the desktop project scans /learn and the load-index table");
      const response = await page.goto(`/learn/${slug}`);
      expect(response?.status()).toBe(200);
      await expect(page.getByRole("heading", { level: 1, name: heading })).toBeVisible();
      await expect(page.getByText("Follows", { exact: true })).toBeVisible();
      await expect(page.getByRole("link", { name: /in the Sidewall reader$/ })).toHaveAttribute("href", /^\/\?q=/);
      await expectNoAxeViolations(page);
    });
  }

  test("the load-index table holds all 280 rows, opens at 60–130 and its search finds 119 → 1,360 kg (ISO 4000-1 / ETRTO)", async ({ page }) => {
    await page.goto("/learn/load-index");
    await expect(tableRows(page)).toHaveCount(280);
    // 60–130, the range common on cars and light trucks (common practice, content/learn/ranges.ts).
    await expect(shownRows(page)).toHaveCount(71);
    await expect(rowCount(page)).toContainText("Showing 71 of 280");
    await page.getByLabel("Find a load index or a weight").fill("119");
    await expect(tableRows(page)).toHaveCount(1);
    await expect(tableRows(page).first()).toContainText("carries 1,360 kg / 2,998 lb per tire");
    await expect(rowCount(page)).toContainText("Showing 1 of 280");
    await page.getByLabel("Find a load index or a weight").fill("");
    await page.getByLabel("Show all 280 load indices").check();
    await expect(shownRows(page)).toHaveCount(280);
    await expectNoAxeViolations(page);
  });

  test("the speed table runs in order of speed, H between U and V (UN R30)", async ({ page }) => {
    await page.goto("/learn/speed-symbols");
    const symbols = await tableRows(page).evaluateAll((rows) => rows.map((row) => row.getAttribute("data-row")));
    expect(symbols.slice(-6)).toEqual(["U", "H", "V", "W", "Y", "(Y)"]);
    await page.getByLabel("Find a speed symbol or a speed").fill("130 mph");
    await expect(rowCount(page)).toContainText("130 mph needs speed symbol H or faster.");
  });

  test("an unknown topic answers 404 with the not-found page", async ({ page }) => {
    const response = await page.goto("/learn/no-such-topic");
    expect(response?.status()).toBe(404);
    await expect(page.getByRole("heading", { level: 1, name: "We could not find that page" })).toBeVisible();
    await expectNoAxeViolations(page);
  });
});

test.describe("Sidewall school without JavaScript", () => {
  test.use({ javaScriptEnabled: false });

  test("every row of the load-index table is in the page, and the rest of the table unfolds", async ({ page }) => {
    await page.goto("/learn/load-index");
    await expect(tableRows(page)).toHaveCount(280);
    await expect(page.locator('tbody tr[data-row="119"]')).toContainText("1,360 kg");
    await expect(shownRows(page)).toHaveCount(71);
    await page.getByLabel("Show all 280 load indices").check();
    await expect(shownRows(page)).toHaveCount(280);
  });
});
