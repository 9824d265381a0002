import { expect, test, type Page } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { openMainNav } from "./helpers/main-nav";

async function signIn(page: Page, email: string) {
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("sidewise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
}

test.describe("accounts", () => {
  test("the sign-in page has no accessibility violations and explains a missing field", async ({ page }) => {
    await page.goto("/sign-in");
    await expect(page.getByRole("heading", { level: 1, name: "Sign in" })).toBeVisible();
    await expectNoAxeViolations(page);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByText("Enter an e-mail address")).toBeVisible();
    await expect(page.getByLabel("E-mail")).toHaveAttribute("aria-invalid", "true");
  });

  test("staff are sent to sign in on the way to the Counter, and reach it", async ({ page }) => {
    await page.goto("/counter");
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fcounter$/);
    await signIn(page, "staff@sidewise.test");
    await expect(page).toHaveURL(/\/counter$/);
    await expect(page.getByRole("heading", { level: 1, name: "Counter" })).toBeVisible();
    await (await openMainNav(page)).getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL(/\/$/);
    const nav = await openMainNav(page);
    await expect(nav.getByRole("link", { name: "Sign in" })).toBeVisible();
    // The Counter leaves the navigation with the session.
    await expect(nav.getByRole("link", { name: "Counter", exact: true })).toHaveCount(0);
  });

  test("a customer is refused the Counter but sees their account", async ({ page }) => {
    await page.goto("/sign-in?next=/account");
    await signIn(page, "customer@sidewise.test");
    await expect(page).toHaveURL(/\/account$/);
    await expect(page.getByText("customer@sidewise.test")).toBeVisible();
    await page.goto("/counter");
    await expect(page.getByRole("heading", { level: 1, name: "The Counter is for shop staff" })).toBeVisible();
  });

  test("a new account continues at sign-in, which says the same as it would for a taken address", async ({ page }, testInfo) => {
    const address = `new.${testInfo.project.name}.${Date.now()}@example.test`;
    await page.goto("/sign-up?next=/account");
    await page.getByLabel("Name").fill("Ines Calloway");
    await page.getByLabel("E-mail").fill(address);
    await page.getByLabel("Password (at least 8 characters)").fill("my-own-password");
    await page.getByRole("button", { name: "Create account" }).click();
    await expect(page).toHaveURL(/\/sign-in\?signedUp=1&next=%2Faccount$/);
    await expect(page.getByRole("status")).toContainText("If the address was new to us, your account is ready");
    await expectNoAxeViolations(page);
    await page.getByLabel("E-mail").fill(address);
    await page.getByLabel("Password").fill("my-own-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page).toHaveURL(/\/account$/);
    await expect(page.getByText(address)).toBeVisible();
  });
});
