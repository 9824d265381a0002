import { expect, type Page, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { resultsHeading, showFilters } from "./helpers/finder";

async function totalShown(page: Page): Promise<number> {
  const text = (await resultsHeading(page).textContent()) ?? "";
  return text.startsWith("No tire") ? 0 : Number.parseInt(text, 10);
}

test.describe("the Replacement finder", () => {
  test.use({ locale: "en-GB" });

  test("is reached from the reader with everything filled in, and lists tires with their reasons", async ({ page }) => {
    await page.goto("/?q=285%2F50R20%20119S");
    await page.getByRole("link", { name: /Replacement finder/ }).filter({ visible: true }).last().click();
    await expect(page).toHaveURL(/\/replace\?size=285-50R20&loadIndex=119&speedSymbol=S/);
    await expect(resultsHeading(page)).toBeVisible();
    expect(await totalShown(page)).toBeGreaterThan(0);
    const first = page.locator("article[data-sku]").first();
    await expect(first).toContainText("same 20-inch rim");
    await expect(first).toContainText(/load index \d+ ≥ 119/);
    await expect(page.getByText("Before you choose")).toBeVisible();
  });

  test("keeps a filter change in the address and after a reload", async ({ page }) => {
    await page.goto("/replace?size=285-50R20&loadIndex=119&speedSymbol=S");
    await expect(resultsHeading(page)).toBeVisible();
    const before = await totalShown(page);
    await showFilters(page);
    await page.getByLabel("At least 4 on hand").check();
    await expect(page).toHaveURL(/inStock=1/);
    await expect.poll(() => totalShown(page)).toBeLessThanOrEqual(before);
    const filtered = await totalShown(page);
    await page.reload();
    await expect(page.getByLabel("At least 4 on hand")).toBeChecked();
    await expect.poll(() => totalShown(page)).toBe(filtered);
  });

  test("the Placard check raises the minimum load index and the list shrinks", async ({ page }) => {
    await page.goto("/replace?size=285-50R20&loadIndex=119&speedSymbol=S&sort=loadMargin");
    await expect(resultsHeading(page)).toBeVisible();
    const before = await totalShown(page);
    await page.getByText("Placard check: is the load index enough for the axles?").click();
    await page.getByLabel("Unit on the label").selectOption("kg");
    // 2,860 kg ÷ 2 = 1,430 kg per tire → load index 121 (1,450 kg) (ISO 4000-1 table).
    await page.getByLabel("Rear GAWR (kg)").fill("2860");
    await expect(page.getByText("The axles need load index 121 or higher")).toBeVisible();
    await expect(page.getByText("Rear axle: GAWR 2,860 kg ÷ 2 tires = 1,430 kg per tire.")).toBeVisible();
    await expect.poll(() => totalShown(page)).toBeLessThan(before);
    await expect(page).toHaveURL(/gawrRear=2860/);
  });

  test("dual rear wheels on a car with passenger tires leave every passenger tire out, and say why (common practice: no dual rating)", async ({ page }) => {
    await page.goto("/replace?size=P265-70R17&loadIndex=113&speedSymbol=S&vehicle=mpv-truck-trailer");
    await expect(resultsHeading(page)).toBeVisible();
    expect(await totalShown(page)).toBeGreaterThan(0);
    await page.getByText("Placard check: is the load index enough for the axles?").click();
    await page.getByLabel("Rear GAWR (lb)").fill("6000");
    await page.getByLabel("Dual wheels on the rear axle").check();
    await expect(page.getByText(/Passenger tires carry no dual rating and do not belong on dual wheels/)).toBeVisible();
    await expect.poll(() => totalShown(page)).toBe(0);
    await expect(page.getByText(/no dual load index: not rated for dual wheels/).first()).toBeVisible();
  });

  test("notes a change of season on each result when the driver says what is on the car now", async ({ page }) => {
    await page.goto("/replace?size=225-45R17&loadIndex=91&speedSymbol=V&originalSeason=summer&season=all-season");
    await expect(resultsHeading(page)).toBeVisible();
    const first = page.locator("article[data-sku]").first();
    await expect(first.getByRole("list", { name: "Notes" })).toContainText("season change: an all-season tire in place of the summer tire on the car now");
    await expect(page.getByLabel("Kind of tire on the car now")).toHaveValue("summer");
  });

  test("without a size, asks for the current tire", async ({ page }) => {
    await page.goto("/replace");
    await page.getByLabel("Size").fill("LT265/75R16");
    await page.getByLabel("Load index").fill("123");
    await page.getByLabel("Speed symbol").fill("S");
    await page.getByLabel(/Load range/).fill("E");
    await page.getByRole("button", { name: "Find tires" }).click();
    await expect(resultsHeading(page)).toBeVisible();
    await expect(page.locator("article[data-sku]").first()).toContainText(/load range [E-N]/i);
  });

  test("has no accessibility violations", async ({ page }) => {
    await page.goto("/replace?size=285-50R20&loadIndex=119&speedSymbol=S");
    await expect(resultsHeading(page)).toBeVisible();
    await expectNoAxeViolations(page);
  });
});
