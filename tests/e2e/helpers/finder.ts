import { expect, type Page } from "@playwright/test";

/** The heading over the finder's results, there once the first page has come (so the page has hydrated). */
export const resultsHeading = (page: Page) => page.getByRole("heading", { level: 2, name: /equal-or-better|No tire in the catalog/ });

/** The qualifying results shown, without the near misses. */
export const resultItems = (page: Page) => page.locator('section[aria-labelledby="results-heading"] > ol > li');

/**
 * Unfolds the finder's filters where they are folded (below lg); from lg up they are always shown
 * and the button is not. Call it once the results are shown, when the button answers clicks.
 */
export async function showFilters(page: Page): Promise<void> {
  const fold = page.getByRole("button", { name: "Filter and sort" });
  if (!(await fold.isVisible())) return;
  if ((await fold.getAttribute("aria-expanded")) === "false") await fold.click();
  await expect(fold).toHaveAttribute("aria-expanded", "true");
}

/** Signs in on the sign-in page, then leaves it. */
export async function signIn(page: Page, email: string): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("sidewise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).not.toHaveURL(/\/sign-in/);
}
