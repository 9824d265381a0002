import { expect, test, type Page, staffFlowsAtDesktopWidth } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

// Both projects share one database per run: each adds a brand of its own name and leaves it there.
async function signInToLines(page: Page) {
  await page.goto("/counter/lines");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fcounter%2Flines$/);
  await page.getByLabel("E-mail").fill("staff@sidewise.test");
  await page.getByLabel("Password").fill("sidewise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Brands and lines" })).toBeVisible();
}

const brandSection = (page: Page, name: string) => page.getByRole("region", { name, exact: true });

test.describe("the Counter's Lines page", () => {
  staffFlowsAtDesktopWidth();
  test("add a brand and a line, rename the brand from the keyboard, retire and un-retire the line", async ({ page }, testInfo) => {
    test.slow();
    const stamp = `${testInfo.project.name === "phone" ? "P" : "D"}${Date.now().toString(36).toUpperCase()}`;
    const brand = `Brisket ${stamp}`;
    const renamed = `Brantley ${stamp}`;
    await signInToLines(page);
    await expect(page.getByRole("link", { name: "Lines", exact: true })).toHaveAttribute("aria-current", "page");
    await expectNoAxeViolations(page);

    const brandName = page.getByLabel("Brand name");
    await brandName.fill(`  ${brand} `);
    await page.getByRole("button", { name: "Add brand" }).click();
    await expect(page.getByRole("status").filter({ hasText: `Added the brand ${brand}.` })).toBeVisible();
    await expect(page.getByRole("heading", { level: 2, name: brand })).toBeVisible();
    await expect(brandSection(page, brand).getByText("No lines yet.")).toBeVisible();

    // The same name in other letters is the same brand.
    await brandName.fill(brand.toUpperCase());
    await page.getByRole("button", { name: "Add brand" }).click();
    await expect(page.getByText(`Another brand is already called “${brand}”.`)).toBeVisible();
    await expect(brandName).toHaveAttribute("aria-invalid", "true");
    await expect(brandName).toBeFocused();
    await expectNoAxeViolations(page);

    const section = brandSection(page, brand);
    await section.getByRole("button", { name: `Add a line to ${brand}` }).click();
    const form = section.getByRole("form", { name: `New line for ${brand}` });
    await expect(form.getByLabel("Line name")).toBeFocused();
    await form.getByLabel("Line name").fill("Ridge Tour");
    await form.getByLabel("Season").selectOption("winter");
    await form.getByLabel("Three-peak mountain snowflake (3PMSF)").check();
    await form.getByLabel("New tread depth (32nds of an inch, optional)").fill("41");
    await form.getByRole("button", { name: "Add line" }).click();
    // New tires are a few 32nds to about 20/32 deep (common practice): 41 is refused before sending.
    await expect(form.getByLabel("New tread depth (32nds of an inch, optional)")).toBeFocused();
    await form.getByLabel("New tread depth (32nds of an inch, optional)").fill("12");
    await form.getByRole("button", { name: "Add line" }).click();
    await expect(section.getByRole("status").filter({ hasText: `Added the line ${brand} Ridge Tour.` })).toBeVisible();
    const line = section.getByRole("listitem").filter({ hasText: "Ridge Tour" });
    await expect(line).toContainText("winter · highway · 3PMSF · 12/32 in new");

    // Rename in place: Escape leaves the name as it was, Enter saves; focus comes back to Rename.
    const rename = section.getByRole("button", { name: `Rename ${brand}` });
    await rename.focus();
    await page.keyboard.press("Enter");
    const field = page.getByLabel(`New name for ${brand}`);
    await expect(field).toBeFocused();
    await page.keyboard.press("Escape");
    await expect(rename).toBeFocused();
    await page.keyboard.press("Enter");
    await field.fill(renamed);
    await page.keyboard.press("Enter");
    await expect(page.getByRole("heading", { level: 2, name: renamed })).toBeVisible();
    await expect(page.getByRole("button", { name: `Rename ${renamed}` })).toBeFocused();

    const renamedSection = brandSection(page, renamed);
    await renamedSection.getByRole("button", { name: `Retire ${renamed} Ridge Tour` }).click();
    await expect(renamedSection.getByText(`Retired ${renamed} Ridge Tour: it takes no new items`)).toBeVisible();
    await expect(renamedSection.getByRole("listitem").filter({ hasText: "Ridge Tour" })).toContainText("Retired");
    await expectNoAxeViolations(page);

    // The item form offers the retired line to no new item, and links back here.
    await page.goto("/counter/items/new");
    await page.getByLabel("Brand", { exact: true }).selectOption(renamed);
    await expect(page.getByRole("option", { name: "Ridge Tour (retired)" })).toBeDisabled();
    await page.getByRole("link", { name: "Add it on the Lines page" }).click();
    await expect(page.getByRole("heading", { level: 1, name: "Brands and lines" })).toBeVisible();

    await brandSection(page, renamed).getByRole("button", { name: `Un-retire ${renamed} Ridge Tour` }).click();
    await expect(brandSection(page, renamed).getByText(`${renamed} Ridge Tour is back in use`)).toBeVisible();
    await expect(brandSection(page, renamed).getByRole("button", { name: `Retire ${renamed} Ridge Tour` })).toBeVisible();
  });
});
