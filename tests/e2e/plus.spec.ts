import { expect, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

test.describe("the Plus planner", () => {
  test("groups sizes from one inch smaller to three larger and links to the finder with the right size", async ({ page }) => {
    await page.goto("/plus?size=205-55R16&loadIndex=91&speedSymbol=V");
    await expect(page.getByRole("heading", { level: 2, name: /Same 16-inch wheels/ })).toBeVisible();
    await expect(page.getByRole("heading", { level: 2, name: /Plus 1: 17-inch wheels/ })).toBeVisible();
    // 205/55R16 → 225/45R17 is the classic plus-one step: 631.9 → 634.3 mm, +0.4 % (common practice).
    const plusOne = page.getByRole("row", { name: /225\/45R17/ });
    await expect(plusOne).toContainText("+0.4 %");
    const inCatalog = page.getByRole("link", { name: /\d+ tires?/ }).first();
    const href = await inCatalog.getAttribute("href");
    expect(href).toMatch(/^\/replace\?size=[^&]+&loadIndex=91&speedSymbol=V$/);
    const counted = Number.parseInt((await inCatalog.textContent()) ?? "", 10);
    expect(counted).toBeGreaterThan(0);
    await inCatalog.click();
    await expect(page).toHaveURL(/\/replace\?size=/);
    // Every tire the planner counted is of that exact size and meets the load and speed asked for, so the finder lists it too.
    const heading = page.getByRole("heading", { level: 2, name: /equal-or-better/ });
    await expect(heading).toBeVisible();
    expect(Number.parseInt((await heading.textContent()) ?? "", 10)).toBeGreaterThanOrEqual(counted);
  });

  test("the tolerance is chosen in the form and kept in the address", async ({ page }) => {
    await page.goto("/plus?size=205-55R16");
    const wide = Number((await page.getByText(/sizes within ±3 %/).textContent())?.match(/^(\d+)/)?.[1]);
    await page.getByLabel("Tolerance").selectOption("1");
    await page.getByRole("button", { name: "Plan" }).click();
    await expect(page).toHaveURL(/tolerancePct=1/);
    const narrow = Number((await page.getByText(/sizes within ±1 %/).textContent())?.match(/^(\d+)/)?.[1]);
    expect(narrow).toBeLessThan(wide);
  });

  test("shows the wheel cautions and has no accessibility violations", async ({ page }) => {
    // The scan walks every row of a page listing some two hundred sizes; on a busy machine that alone can take half a minute.
    test.slow();
    await page.goto("/plus?size=225-45R17&loadIndex=94&speedSymbol=W");
    await expect(page.getByText(/bolt pattern/)).toBeVisible();
    await expectNoAxeViolations(page);
  });
});
