import { expect, test, type Locator, type Page } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

const FOUR_SIZES = "/compare?sizes=225-45R17,235-40R18,245-35R19,255-30R20";
// 265/70R17 is 802.8 mm; 285/70R17 830.8 mm (+3.5 %), 265/65R17 776.3 mm (−3.3 %), 245/75R17 799.3 mm (−0.4 %):
// nominal diameters, rim × 25.4 + 2 × width × aspect ratio ÷ 100.
const MIXED_SIZES = "/compare?sizes=265-70R17,285-70R17,265-65R17,245-75R17";
// The danger colour of the light theme (app/globals.css), which only readings §5.3 forbids wear.
const ALARM_COLOUR = "rgb(155, 28, 28)";

/**
 * Every cell of `scope` that is rendered (th, td, dt, dd): its content fits its box (scrollWidth ≤
 * clientWidth), and its box lies inside every box above it that clips, and inside the viewport.
 */
async function cutCells(scope: Locator): Promise<string[]> {
  return scope.evaluate((root) => {
    const problems: string[] = [];
    const viewportWidth = document.documentElement.clientWidth;
    for (const cell of Array.from(root.querySelectorAll<HTMLElement>("th, td, dt, dd"))) {
      const box = cell.getBoundingClientRect();
      if (box.width === 0 && box.height === 0) continue;
      const name = `“${cell.innerText.trim().replace(/\s+/g, " ")}”`;
      if (cell.scrollWidth > cell.clientWidth) problems.push(`${name} overflows its cell`);
      let left = 0;
      let right = viewportWidth;
      for (let above = cell.parentElement; above; above = above.parentElement) {
        if (getComputedStyle(above).overflowX === "visible") continue;
        const clip = above.getBoundingClientRect();
        left = Math.max(left, clip.left);
        right = Math.min(right, clip.right);
      }
      if (box.left < left - 0.5 || box.right > right + 0.5) problems.push(`${name} lies outside the visible area (${box.left}–${box.right} of ${left}–${right})`);
    }
    return problems;
  });
}

const noSidewaysScroll = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= document.documentElement.clientWidth);
const results = (page: Page) => page.locator("main");
const sentences = (page: Page) => page.getByRole("region", { name: /^The speedometer, set for/ }).getByRole("listitem");

async function chooseUnits(page: Page, units: "Metric" | "Imperial") {
  await page.getByText(units, { exact: true }).click();
  await expect(page.getByRole("radio", { name: units })).toBeChecked();
}

test.describe("Side-by-side's tables at 1280 px", () => {
  test.use({ locale: "en-GB", viewport: { width: 1280, height: 900 } });
  test.skip(({ isMobile }) => isMobile, "the wide layout is for desktop browsers");

  test("four sizes fit in the difference and speedometer tables, in both unit systems, with nothing cut", async ({ page }, testInfo) => {
    await page.goto(FOUR_SIZES);
    const differences = page.getByRole("table", { name: "Differences from the reference (nominal sizes)" });
    await expect(differences.getByRole("columnheader")).toHaveCount(4);
    await expect(page.getByRole("table", { name: "True speed when the speedometer shows…" }).getByRole("columnheader")).toHaveCount(4);
    await expect(differences.getByRole("row", { name: /Diameter change/ })).toContainText("+4.2 %");
    expect(await cutCells(results(page))).toEqual([]);
    expect(await noSidewaysScroll(page)).toBe(true);
    await page.screenshot({ path: testInfo.outputPath("compare-four-metric-1280.png"), fullPage: true });

    await chooseUnits(page, "Imperial");
    await expect(differences.getByRole("row", { name: /Overall diameter/ })).toContainText("26.0 in");
    expect(await cutCells(results(page))).toEqual([]);
    await page.screenshot({ path: testInfo.outputPath("compare-four-imperial-1280.png"), fullPage: true });
    await expectNoAxeViolations(page);
  });

  test("the alarm colour and its words mark only the readings UN Regulation No. 39 §5.3 forbids", async ({ page }) => {
    await page.goto(MIXED_SIZES);
    const speedometer = page.getByRole("table", { name: "True speed when the speedometer shows…" });
    // Only the taller 285/70R17 reads below the true speed, at each of the four speeds.
    const marked = speedometer.locator("[data-breaks-rule]");
    await expect(marked).toHaveCount(4);
    for (const cell of await marked.all()) {
      await expect(cell).toContainText("below true speed");
      await expect(cell).toHaveCSS("color", ALARM_COLOUR);
    }
    await expect(speedometer.getByRole("row", { name: /^100 km\/h/ })).toContainText("96.7 km/h");
    await expect(speedometer.getByRole("row", { name: /^100 km\/h/ }).getByText("96.7 km/h")).not.toHaveCSS("color", ALARM_COLOUR);
  });
});

test.describe("Side-by-side's tables at 390 px", () => {
  test.use({ locale: "en-GB", viewport: { width: 390, height: 844 } });
  test.skip(({ isMobile }) => !isMobile, "the narrow layout is for phones");

  test("each size becomes its own block, nothing cut and nothing scrolls sideways", async ({ page }, testInfo) => {
    await page.goto(FOUR_SIZES);
    const differences = page.getByRole("region", { name: "Differences from the reference (nominal sizes)" });
    await expect(differences.getByRole("heading", { level: 3 })).toHaveText([/225\/45R17\s*reference/, /235\/40R18/, /245\/35R19/, /255\/30R20/]);
    await expect(differences.getByRole("table")).toBeHidden();
    await expect(differences.getByRole("listitem").filter({ hasText: "255/30R20" })).toContainText("+4.2 %");
    const speedometer = page.getByRole("region", { name: "True speed when the speedometer shows…" });
    await expect(speedometer.getByRole("heading", { level: 3 })).toHaveCount(3);
    expect(await cutCells(results(page))).toEqual([]);
    expect(await noSidewaysScroll(page)).toBe(true);
    await page.screenshot({ path: testInfo.outputPath("compare-four-metric-390.png"), fullPage: true });

    await chooseUnits(page, "Imperial");
    expect(await cutCells(results(page))).toEqual([]);
    expect(await noSidewaysScroll(page)).toBe(true);
    await page.screenshot({ path: testInfo.outputPath("compare-four-imperial-390.png"), fullPage: true });
    await expectNoAxeViolations(page);
  });
});

test.describe("the speedometer in one sentence per size", () => {
  test.use({ locale: "en-GB" });

  test("reads at 100 km/h in metric and 65 mph in imperial, following the unit toggle", async ({ page }) => {
    await page.goto(MIXED_SIZES);
    // 100 × 830.8 ÷ 802.8 = 103.5; 100 × 776.3 ÷ 802.8 = 96.7; 100 × 799.3 ÷ 802.8 = 99.6 km/h.
    await expect(sentences(page)).toHaveText([
      /^On 285\/70R17, showing 100 km\/h, you would be doing 103\.5 km\/h: .*below the true speed, which UN Regulation No\. 39 §5\.3 forbids\.$/,
      /^On 265\/65R17, showing 100 km\/h, you would be doing 96\.7 km\/h: the speedometer reads 3\.3 km\/h high, within what/,
      /^On 245\/75R17, showing 100 km\/h, you would be doing 99\.6 km\/h: a small change \(−0\.4 % in diameter\)/,
    ]);
    await chooseUnits(page, "Imperial");
    // 65 × 830.8 ÷ 802.8 = 67.27; 65 × 776.3 ÷ 802.8 = 62.85; 65 × 799.3 ÷ 802.8 = 64.72 mph.
    await expect(sentences(page)).toHaveText([
      /^On 285\/70R17, showing 65 mph, you would be doing 67\.3 mph: /,
      /^On 265\/65R17, showing 65 mph, you would be doing 62\.9 mph: /,
      /^On 245\/75R17, showing 65 mph, you would be doing 64\.7 mph: /,
    ]);
  });

  test("wears the alarm colour only for what UN Regulation No. 39 §5.3 forbids: below true speed, or over 110 % + 4 km/h", async ({ page }) => {
    await page.goto(MIXED_SIZES);
    await expect(sentences(page).nth(0)).toHaveCSS("color", ALARM_COLOUR);
    await expect(sentences(page).nth(1)).not.toHaveCSS("color", ALARM_COLOUR);
    await expect(sentences(page).nth(2)).not.toHaveCSS("color", ALARM_COLOUR);
    await expect(sentences(page).nth(2)).toContainText("a small change");

    // 285/75R16 → 205/55R16, 833.9 → 631.9 mm: 75.8 km/h true at 100 shown, over 0.1 × 75.8 + 4 = 11.6 km/h high.
    await page.goto("/compare?sizes=285-75R16,205-55R16");
    await expect(sentences(page)).toHaveText([/you would be doing 75\.8 km\/h: the speedometer reads 24\.2 km\/h high, more than UN Regulation No\. 39 §5\.3 allows/]);
    await expect(sentences(page).first()).toHaveCSS("color", ALARM_COLOUR);
    await expectNoAxeViolations(page);
  });
});

test.describe("the Counter's catalog table at 390 px", () => {
  test.use({ locale: "en-US", viewport: { width: 390, height: 844 } });
  test.skip(({ isMobile }) => !isMobile, "the narrow layout is for phones");

  test("shows each item's size, load/speed, price and on hand without scrolling sideways", async ({ page }, testInfo) => {
    // A budget, not a measure: the accessibility scan reads fifty rows of inputs.
    test.slow();
    await page.goto("/counter");
    await page.getByLabel("E-mail").fill("staff@sidewise.test");
    await page.getByLabel("Password").fill("sidewise-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    const table = page.getByRole("region", { name: "Catalog items" });
    await expect(table.getByRole("columnheader")).toHaveText([/Item/, /Price/, /Quantity/]);

    const row = table.locator("tbody tr").first();
    const sku = (await row.getAttribute("data-sku")) ?? "";
    // The item's cell leads with its size and load index with speed symbol, as on the sidewall: 205/55R16 91V.
    await row.scrollIntoViewIfNeeded();
    await expect(row.getByRole("rowheader")).toContainText(/R\d{2}\S* \d{2,3}(\/\d{2,3})?\(?[A-Z]/);
    for (const shown of [row.getByRole("rowheader"), page.getByLabel(`Price of ${sku} in dollars`), page.getByLabel(`Quantity of ${sku} on hand`), row.locator("[data-stock]")]) {
      await expect(shown).toBeInViewport();
      const box = (await shown.boundingBox())!;
      expect(box.x).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width).toBeLessThanOrEqual(390);
    }
    expect(await table.evaluate((region) => region.scrollWidth <= region.clientWidth)).toBe(true);
    expect(await noSidewaysScroll(page)).toBe(true);
    expect(await cutCells(table)).toEqual([]);
    await page.screenshot({ path: testInfo.outputPath("counter-catalog-390.png") });
    await expectNoAxeViolations(page);
  });
});
