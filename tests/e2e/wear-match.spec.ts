import { expect, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

// 225/65R17 is 724.3 mm new (17 × 25.4 + 2 × 225 × 0.65, ISO 4000-1); each 32nd worn takes
// 2 × 0.79375 mm off the diameter. The 2/32 in default limit is common practice.
test.describe("Wear match", () => {
  test("fills in by keyboard, says to shave and shows the arithmetic; the address survives a reload", async ({ page }, testInfo) => {
    await page.goto("/wear-match");
    await page.getByLabel("Tire size").fill("225/65R17");
    await page.getByLabel("New tire's tread depth (32nds of an inch)").fill("10");
    await page.getByLabel("Depths left on the tires that stay (32nds)").fill("6, 6, 7");
    await page.getByLabel("Depths left on the tires that stay (32nds)").press("Enter");
    await expect(page).toHaveURL(/size=225%2F65R17&newTreadDepth32=10&remaining32=6%2C\+6%2C\+7/);
    await expect(page.getByRole("heading", { level: 2, name: "Shave the new tire first" })).toBeVisible();
    // The sentence, which the drawing's description repeats for screen readers.
    await expect(page.locator("p", { hasText: /^Shave the new tire to 8\/32 in before it goes on: at 10\/32 in it is 4\/32 in deeper than the shallowest tire that stays \(6\/32 in\)/ })).toBeVisible();
    // 724.3 − 2 × 4 × 0.79375 = 717.95 mm for a tire at 6/32 in, which binary floating point holds as
    // 717.9499…, so a tenth shows 717.9; 717.95 / 25.4 = 28.27 in.
    await expect(page.getByRole("row", { name: /^front left, stays/ })).toContainText("717.9 mm (28.27 in)");
    await expect(page.getByRole("row", { name: /^rear right, new, shaved/ })).toContainText("8/32 in (6.4 mm)");
    await expect(page.getByRole("img", { name: "The vehicle from above, tires to scale" })).toBeVisible();
    await page.screenshot({ path: testInfo.outputPath(`wear-match-${testInfo.project.name}.png`), fullPage: true });
    await expectNoAxeViolations(page);

    await page.reload();
    await expect(page.getByLabel("Depths left on the tires that stay (32nds)")).toHaveValue("6, 6, 7");
    await expect(page.getByRole("heading", { level: 2, name: "Shave the new tire first" })).toBeVisible();
  });

  test("replaces the set when the tires that stay already differ too much, and fits as it is when close", async ({ page }) => {
    await page.goto("/wear-match?size=225-65R17&newTreadDepth32=10&remaining32=5,8");
    await expect(page.getByRole("heading", { level: 2, name: "Replace the set" })).toBeVisible();
    await page.goto("/wear-match?size=225-65R17&newTreadDepth32=10&remaining32=9,9.5&limitCircumferenceMm=10");
    await expect(page.getByRole("heading", { level: 2, name: "Fits as it is" })).toBeVisible();
    await expect(page.getByText(/10 mm of rolling circumference \(about 2\.01\/32 in of tread depth\)/).first()).toBeVisible();
  });

  test("says what is wrong with each field, keeps what was typed, and names both limits given at once", async ({ page }) => {
    await page.goto("/wear-match?size=banana&newTreadDepth32=10&remaining32=6&limit32=2&limitCircumferenceMm=10");
    await expect(page.getByLabel("Tire size")).toHaveAttribute("aria-invalid", "true");
    await expect(page.getByText('"banana" is not a tire size (try 285/50R20 or 285-50R20).')).toBeVisible();
    await expect(page.getByLabel("Depths left on the tires that stay (32nds)")).toHaveAccessibleDescription(/the depths left on the 2 or 3 tires that stay/i);
    await expect(page.getByLabel("or circumference difference (mm)")).toHaveAccessibleDescription(/not both/);
    await expect(page.getByLabel("Depths left on the tires that stay (32nds)")).toHaveValue("6");
    await expectNoAxeViolations(page);
  });
});
