import { expect, type Page, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

const sizeBox = (page: Page, name: string) => page.getByRole("textbox", { name, exact: true });
// A figure in the difference table on a wide screen, or in its size's block on a phone: whichever shows.
const shownFigure = (page: Page, text: string) => page.getByText(text, { exact: true }).filter({ visible: true });

test.describe("Side-by-side", () => {
  test.use({ locale: "en-GB" });

  test("adds, reorders and removes sizes, and the address always holds the set", async ({ page }) => {
    await page.goto("/compare?sizes=265-70R17");
    await page.getByRole("button", { name: "Add a size" }).click();
    await sizeBox(page, "Size 2").fill("285/70R17");
    await expect(page).toHaveURL(/sizes=265-70R17%2C285-70R17|sizes=265-70R17,285-70R17/);
    // 285/70R17 is 830.8 mm against 802.8 mm: +3.5 %, and the speedometer reads below the true speed
    // (UN Regulation No. 39 §5.3 forbids that): 100 × 830.8 ÷ 802.8 = 103.5 km/h.
    await expect(shownFigure(page, "+3.5 %")).toBeVisible();
    await expect(page.getByText(/^On 285\/70R17, showing 100 km\/h, you would be doing 103\.5 km\/h: .*UN Regulation No\. 39 §5\.3 forbids\.$/)).toBeVisible();
    await expect(page.locator('svg[role="img"]').filter({ visible: true }).locator('[data-part="overall"]')).toHaveCount(2);

    await page.getByRole("button", { name: "Add a size" }).click();
    await sizeBox(page, "Size 3").fill("255/75R17");
    await page.getByRole("button", { name: "Move size 3 up" }).click();
    await expect(page).toHaveURL(/265-70R17%2C255-75R17%2C285-70R17|265-70R17,255-75R17,285-70R17/);
    await page.getByRole("button", { name: "Remove size 1" }).click();
    await expect(sizeBox(page, "Reference size (the one the speedometer is set for)")).toHaveValue("255/75R17");

    await page.reload();
    await expect(sizeBox(page, "Reference size (the one the speedometer is set for)")).toHaveValue("255/75R17");
    await expect(sizeBox(page, "Size 2")).toHaveValue("285/70R17");
  });

  test("reproduces the encyclopedia's speedometer example: 185/70R14 → 195/50R15 reads 6.7 % high", async ({ page }) => {
    await page.goto("/compare?sizes=185-70R14,195-50R15");
    // 576 ÷ 614.6 × 100 km/h = 93.7 km/h true when 100 is shown.
    await expect(page.getByText(/^On 195\/50R15, showing 100 km\/h, you would be doing 93\.7 km\/h/)).toBeVisible();
    await expect(shownFigure(page, "−6.3 %")).toBeVisible();
  });

  test("has no accessibility violations", async ({ page }) => {
    await page.goto("/compare?sizes=265-70R17,285-70R17,255-75R17");
    await expect(page.getByRole("heading", { name: "Differences from the reference (nominal sizes)" })).toBeVisible();
    await expectNoAxeViolations(page);
  });
});
