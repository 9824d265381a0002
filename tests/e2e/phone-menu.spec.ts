import { expect, test, type Page } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { mainNav } from "./helpers/main-nav";

const menuButton = (page: Page) => mainNav(page).getByRole("button", { name: "Menu" });
const counterLink = (page: Page) => page.getByRole("link", { name: "Counter", exact: true });

/** Waits until the header has read the session in the browser (its account link or name is in place). */
async function sessionRead(page: Page, accountLink: string | RegExp = "Sign in") {
  await expect(mainNav(page).getByRole("link", { name: accountLink, includeHidden: true })).toBeAttached();
}

async function signIn(page: Page, email: string) {
  await page.goto("/sign-in?next=/learn");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("sidewise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/learn$/);
}

async function expectNoSidewaysScroll(page: Page) {
  const widths = await page.evaluate(() => {
    const header = document.querySelector("header")!;
    return { page: document.documentElement.scrollWidth - window.innerWidth, header: header.scrollWidth - header.clientWidth };
  });
  expect(widths).toEqual({ page: expect.any(Number), header: 0 });
  expect(widths.page).toBeLessThanOrEqual(0);
}

const isInsideNav = (page: Page) => page.evaluate(() => document.activeElement?.closest('nav[aria-label="Main"]') !== null);

test.describe("the menu on a phone", () => {
  test.skip(({ isMobile }) => !isMobile, "phone layout");
  test.use({ viewport: { width: 390, height: 844 } });

  test("hides the screens behind one button, without Counter for a visitor, and never scrolls sideways", async ({ page }, testInfo) => {
    await page.goto("/");
    await sessionRead(page);
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");
    await expect(mainNav(page).getByRole("link", { name: "Side-by-side" })).toBeHidden();
    await expectNoSidewaysScroll(page);
    await page.locator("header").screenshot({ path: testInfo.outputPath("header-closed-390.png") });

    await menuButton(page).click();
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "true");
    await expect(mainNav(page).getByRole("link", { name: "Side-by-side" })).toBeVisible();
    await expect(mainNav(page).getByRole("link", { name: "Sign in" })).toBeVisible();
    await expect(counterLink(page)).toHaveCount(0);
    await expectNoSidewaysScroll(page);
    await expectNoAxeViolations(page);
    await page.screenshot({ path: testInfo.outputPath("header-open-390.png") });
  });

  test("opens from the keyboard, keeps Tab inside, and Escape returns to the button", async ({ page }) => {
    await page.goto("/");
    await sessionRead(page);
    await menuButton(page).focus();
    await page.keyboard.press("Enter");
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "true");

    // Button, five screens and Sign in: seven stops, then Tab comes back round to the button.
    const stops: string[] = [];
    for (let step = 0; step < 8; step++) {
      await page.keyboard.press("Tab");
      expect(await isInsideNav(page)).toBe(true);
      stops.push(await page.evaluate(() => document.activeElement?.textContent?.trim() ?? ""));
    }
    expect(stops).toEqual(["Sidewall reader", "Side-by-side", "Plus planner", "Replacement finder", "Sidewall school", "Sign in", "Menu", "Sidewall reader"]);
    await page.keyboard.press("Shift+Tab");
    await expect(menuButton(page)).toBeFocused();
    await page.keyboard.press("Shift+Tab");
    await expect(mainNav(page).getByRole("link", { name: "Sign in" })).toBeFocused();

    await page.keyboard.press("Escape");
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");
    await expect(menuButton(page)).toBeFocused();

    await page.keyboard.press("Space");
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "true");
  });

  test("closes when a link is followed and on a click outside", async ({ page }) => {
    await page.goto("/");
    await sessionRead(page);
    await menuButton(page).click();
    await mainNav(page).getByRole("link", { name: "Sidewall school" }).click();
    await expect(page).toHaveURL(/\/learn$/);
    await expect(page.getByRole("heading", { level: 1, name: "Sidewall school" })).toBeVisible();
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");
    await expect(mainNav(page).getByRole("link", { name: "Sidewall school", includeHidden: true })).toHaveAttribute("aria-current", "page");

    await menuButton(page).click();
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "true");
    // The open menu covers the top of the page: click the footer's corner, outside the menu.
    await page.getByRole("contentinfo").click({ position: { x: 4, y: 4 } });
    await expect(menuButton(page)).toHaveAttribute("aria-expanded", "false");
  });

  test("shows Counter and the account to staff, inside the menu", async ({ page }, testInfo) => {
    await signIn(page, "staff@sidewise.test");
    await sessionRead(page, /^Account of /);
    await expect(counterLink(page)).toBeHidden();
    await menuButton(page).click();
    await expect(counterLink(page)).toBeVisible();
    await expect(mainNav(page).getByRole("button", { name: "Sign out" })).toBeVisible();
    await expectNoSidewaysScroll(page);
    await page.screenshot({ path: testInfo.outputPath("header-open-staff-390.png") });
    await counterLink(page).click();
    await expect(page.getByRole("heading", { level: 1, name: "Counter" })).toBeVisible();
  });
});

test.describe("the navigation on a desktop", () => {
  test.skip(({ isMobile }) => isMobile, "desktop layout");
  test.use({ viewport: { width: 1280, height: 900 } });

  test("shows the links without a menu button, and Counter only to staff", async ({ page }, testInfo) => {
    await page.goto("/");
    await sessionRead(page);
    await expect(menuButton(page)).toBeHidden();
    await expect(mainNav(page).getByRole("link", { name: "Replacement finder" })).toBeVisible();
    await expect(mainNav(page).getByRole("link", { name: "Sign in" })).toBeVisible();
    await expect(counterLink(page)).toHaveCount(0);
    await expectNoSidewaysScroll(page);
    await page.locator("header").screenshot({ path: testInfo.outputPath("header-1280.png") });

    await signIn(page, "admin@sidewise.test");
    await sessionRead(page, /^Account of /);
    await expect(counterLink(page)).toBeVisible();
    await page.locator("header").screenshot({ path: testInfo.outputPath("header-admin-1280.png") });
  });
});

test("the favicon answers as an icon, beside the SVG and apple-touch icons", async ({ request }) => {
  const favicon = await request.get("/favicon.ico");
  expect(favicon.status()).toBe(200);
  expect(favicon.headers()["content-type"]).toMatch(/^image\/(x-icon|vnd\.microsoft\.icon)/);
  const apple = await request.get("/apple-icon.png");
  expect(apple.status()).toBe(200);
  expect(apple.headers()["content-type"]).toBe("image/png");
  const svg = await request.get("/icon.svg");
  expect(svg.status()).toBe(200);
  expect(svg.headers()["content-type"]).toContain("image/svg+xml");
});

test.describe("the Sidewall reader on a phone", () => {
  test.use({ viewport: { width: 390, height: 844 }, locale: "en-US" });

  test("breaks the echoed marking only between words, and gives the width in inches with the printed millimetres", async ({ page }, testInfo) => {
    await page.goto("/");
    await page.getByLabel("Type or paste what's on your sidewall").fill("225/45R17 94W XL TREADWEAR 500 TRACTION AA TEMPERATURE A");
    const words = page.locator("[data-word]");
    await expect(words.filter({ hasText: /^TREADWEAR$/ })).toHaveCount(1);
    // Each word's text lies on one line: all its line boxes share one top.
    const linesPerWord = await words.evaluateAll((spans) =>
      spans.map((span) => {
        const range = document.createRange();
        range.selectNodeContents(span);
        return new Set([...range.getClientRects()].map((rect) => Math.round(rect.top))).size;
      }),
    );
    expect(linesPerWord.length).toBeGreaterThan(5);
    expect(linesPerWord.every((lines) => lines === 1)).toBe(true);
    // The echo does wrap at 390 px, so the check above is about real line breaks.
    const echoLines = await words.evaluateAll((spans) => new Set(spans.map((span) => Math.round(span.getBoundingClientRect().top))).size);
    expect(echoLines).toBeGreaterThan(1);

    // An en-US browser starts in imperial: 225 mm ÷ 25.4 = 8.86 in (1 in = 25.4 mm, by definition).
    await expect(page.locator('[data-part="sectionWidth"]')).toContainText("8.9 in (225 mm) wide");
    await expectNoSidewaysScroll(page);
    await page.screenshot({ path: testInfo.outputPath("reader-390.png"), fullPage: true });
  });
});

test.describe("the load-index table on a phone", () => {
  test.use({ viewport: { width: 390, height: 844 } });
  const shownRows = (page: Page) => page.locator("tbody tr[data-row]:visible");
  const rowCount = (page: Page) => page.getByRole("status").filter({ hasText: "Showing" });

  test("opens at the range common on cars and light trucks, and a search or an anchor still finds 150", async ({ page }, testInfo) => {
    await page.goto("/learn/load-index");
    // 60–130: the range of content/learn/ranges.ts (common practice).
    await expect(rowCount(page)).toContainText("Showing 71 of 280 load indices: those common on cars and light trucks");
    await expect(shownRows(page)).toHaveCount(71);
    await expect(page.locator('tr[data-row="150"]')).toBeHidden();
    await expectNoAxeViolations(page);
    await page.screenshot({ path: testInfo.outputPath("load-index-390.png") });

    // Load index 150 = 3,350 kg (ISO 4000-1 load-index table; quoted from memory, and the lesson reads it from lib/tire).
    await page.getByLabel("Find a load index or a weight").fill("150");
    await expect(shownRows(page)).toHaveCount(1);
    await expect(page.locator('tr[data-row="150"]')).toContainText("3,350 kg");
    await page.getByLabel("Find a load index or a weight").fill("");
    await expect(shownRows(page)).toHaveCount(71);

    await page.getByLabel("Show all 280 load indices").check();
    await expect(shownRows(page)).toHaveCount(280);
    await expect(rowCount(page)).toContainText("Showing 280 of 280");

    // A link from another page to a row outside the range unfolds that row alone.
    await page.goto("/learn");
    await page.goto("/learn/load-index#load-index-150");
    await expect(page.locator('tr[data-row="150"]')).toBeVisible();
    await expect(page.locator('tr[data-row="151"]')).toBeHidden();
  });
});

test("the lessons and the reader at 1280 px", async ({ page, isMobile }, testInfo) => {
  test.skip(isMobile, "desktop layout");
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto("/learn/load-index");
  await expect(page.locator("tbody tr[data-row]:visible")).toHaveCount(71);
  await page.screenshot({ path: testInfo.outputPath("load-index-1280.png") });
  await page.goto("/?q=225%2F45R17%2094W%20XL%20TREADWEAR%20500%20TRACTION%20AA%20TEMPERATURE%20A");
  await expect(page.locator("[data-word]").filter({ hasText: /^TREADWEAR$/ })).toHaveCount(1);
  await page.screenshot({ path: testInfo.outputPath("reader-1280.png") });
});
