import { expect, type Page, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

const input = (page: Page) => page.getByLabel("Type or paste what's on your sidewall");
const measurements = (page: Page) => page.getByRole("table").filter({ visible: true }).first();

test.describe("the Sidewall reader", () => {
  test.use({ locale: "en-GB" });

  test("decodes 285/50R20 119S in metric and in imperial", async ({ page }) => {
    await page.goto("/");
    await input(page).pressSequentially("285/50R20 119S");
    // 20 × 25.4 + 2 × 142.5 = 793 mm; load index 119 = 1,360 kg (ISO 4000-1 table).
    await expect(measurements(page).getByRole("row", { name: /Overall diameter/ })).toContainText("793 mm");
    await expect(page.getByText("119: carries up to 1,360 kg per tire")).toBeVisible();

    await page.getByText("Imperial", { exact: true }).click();
    await expect(measurements(page).getByRole("row", { name: /Overall diameter/ })).toContainText("31.2 in");
    await expect(page.getByText("119: carries up to 2,998 lb per tire")).toBeVisible();
    // Every figure changed: no millimetre or kilogram is left in the numbers or the parts.
    await expect(measurements(page)).not.toContainText(" mm");
    await expect(page.getByRole("list").filter({ hasText: "Load index" })).not.toContainText(" kg");
    await expect(page.locator('svg[role="img"]').filter({ visible: true })).toContainText("31.2 in");
  });

  test("sends no request while typing", async ({ page }) => {
    await page.goto("/");
    await page.waitForLoadState("networkidle");
    // The header asks once whether someone is signed in; let that settle before listening.
    await expect(page.getByRole("link", { name: "Sign in", includeHidden: true })).toBeAttached();
    // Decoding must not reach the server: no document, fetch or XHR request may leave the page.
    // (A code-split script loaded once, such as the animation engine, or the browser fetching the
    // page's icon as the address changes, is not a decoding request.)
    const requests: string[] = [];
    page.on("request", (request) => {
      if (["document", "fetch", "xhr"].includes(request.resourceType())) requests.push(`${request.resourceType()} ${request.url()}`);
    });
    await input(page).pressSequentially("LT265/75R16 123/120S Load Range E DOT 4B7X 2HRT 1523", { delay: 15 });
    await expect(page.getByText("Read as")).toBeVisible();
    await page.waitForTimeout(500);
    expect(requests).toEqual([]);
  });

  test("a DOT code alone shows its week and year", async ({ page }) => {
    await page.goto("/");
    await input(page).fill("DOT 4B7X 2HRT 1523");
    await expect(page.getByText(/made in week 15 of 2023/)).toBeVisible();
    await expect(page.getByText("No tire size in this text yet")).toBeVisible();
  });

  test("the link keeps what was typed across a reload", async ({ page }) => {
    await page.goto("/");
    await input(page).fill("245/40ZR18 97Y XL");
    await expect(page).toHaveURL(/q=245%2F40ZR18/);
    await page.reload();
    await expect(input(page)).toHaveValue("245/40ZR18 97Y XL");
    await expect(page.getByText(/Extra Load: reinforced/)).toBeVisible();
  });

  test("partial input says what is missing", async ({ page }) => {
    await page.goto("/");
    await input(page).fill("285/50R");
    await expect(page.getByRole("main").getByRole("alert")).toContainText(/rim diameter/i);
  });

  test("a part can be pointed at with the keyboard", async ({ page }) => {
    await page.goto("/?q=285%2F50R20%20119S");
    const sectionWidth = page.getByRole("button", { name: "Section width" });
    await sectionWidth.focus();
    await expect(sectionWidth).toHaveAttribute("aria-pressed", "true");
  });

  test("has no accessibility violations with a size decoded, in light and dark", async ({ page }) => {
    await page.goto("/?q=285%2F50R20%20119S%20XL%20M%2BS");
    await expectNoAxeViolations(page);
    await page.emulateMedia({ colorScheme: "dark" });
    await expectNoAxeViolations(page);
  });
});

test.describe("the first unit system", () => {
  test.use({ locale: "en-US" });

  test("follows a US browser locale", async ({ page }) => {
    await page.goto("/?q=285%2F50R20");
    await expect(measurements(page).getByRole("row", { name: /Overall diameter/ })).toContainText("31.2 in");
  });
});
