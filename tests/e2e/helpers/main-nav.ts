import { expect, type Locator, type Page } from "@playwright/test";

/** The main navigation: a row of links on a desktop, a Menu button on a phone. */
export const mainNav = (page: Page): Locator => page.getByRole("navigation", { name: "Main" });

/**
 * Opens the phone menu when the links sit behind it; on a desktop the links are already shown.
 * Waits first for the account link, which appears once the page is interactive and has read the session.
 */
export async function openMainNav(page: Page): Promise<Locator> {
  const nav = mainNav(page);
  await expect(nav.getByRole("link", { name: /^(Sign in|Account of )/, includeHidden: true })).toBeAttached();
  const button = nav.getByRole("button", { name: "Menu" });
  if ((await button.isVisible()) && (await button.getAttribute("aria-expanded")) !== "true") {
    await button.click();
    await expect(button).toHaveAttribute("aria-expanded", "true");
  }
  return nav;
}
