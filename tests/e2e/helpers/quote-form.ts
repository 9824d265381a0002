import { expect, type Locator, type Page } from "@playwright/test";

/**
 * The server refuses a form sent within 3 s of handing it its signed opening time ("<ms>.<signature>");
 * a test fills faster than a person, so it waits until the form is that old (server and test share a clock).
 */
export async function waitUntilTheFormIsOldEnough(scope: Page | Locator) {
  const token = scope.locator('input[name="renderedAt"]');
  await expect(token).toHaveValue(/^\d+\./);
  const openedAt = Number((await token.inputValue()).split(".")[0]);
  await expect.poll(() => Date.now() - openedAt, { message: "the form has been open 3 s" }).toBeGreaterThanOrEqual(3000);
}
