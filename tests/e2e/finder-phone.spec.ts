import { FINDER_PAGE_SIZE } from "../../lib/finder/finder-state";
import { expect, test, type Locator, type Page } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { resultItems, resultsHeading, showFilters, signIn } from "./helpers/finder";
import { emailsTo } from "./helpers/inbox";

// A common size the demo shop stocks deeply: several pages of results, in stock and out of it.
const MANY = "/replace?size=225-65R17&loadIndex=102&speedSymbol=H&sort=price";
const SPORTY = "/replace?size=225/45R17&loadIndex=91&speedSymbol=W";

const askBar = (page: Page) => page.getByRole("button", { name: /^Ask for a price \(\d+ picked\)$/ });
const askToggle = (page: Page) => page.getByRole("button", { name: "Ask the shop for a price" });
const pickBoxes = (page: Page, name: RegExp) => resultItems(page).getByRole("checkbox", { name });

async function openFinder(page: Page, path: string) {
  await page.goto(path);
  await expect(resultsHeading(page)).toBeVisible();
  await expect(resultItems(page).first()).toBeVisible();
}

/** Ticks the first two results and answers their brand and line as the cards show them. */
async function pickTwo(page: Page): Promise<string[]> {
  const names: string[] = [];
  for (const item of [resultItems(page).nth(0), resultItems(page).nth(1)]) {
    await item.getByRole("checkbox").check();
    names.push((await item.getByRole("heading", { level: 3 }).innerText()).trim());
  }
  return names;
}

/** Scrolls the window so that its top is half-way down the list of results. */
async function scrollHalfWayDownTheResults(page: Page) {
  await page.evaluate(() => {
    const results = document.getElementById("results-heading")!.closest("section")!;
    window.scrollTo(0, results.getBoundingClientRect().top + window.scrollY + results.offsetHeight / 2);
  });
}

/** Presses Tab until the element has focus, at most `most` times. */
async function tabTo(page: Page, target: Locator, most: number) {
  for (let press = 0; press < most; press += 1) {
    await page.keyboard.press("Tab");
    if (await target.evaluate((element) => element === document.activeElement)) return;
  }
  throw new Error(`Tab did not reach ${target} in ${most} presses`);
}

/** The server refuses a form sent within 3 s of its signed opening time; a test fills faster than a person. */
async function waitUntilTheFormIsOldEnough(page: Page) {
  const token = page.locator('input[name="renderedAt"]');
  await expect(token).toHaveValue(/^\d+\./);
  const openedAt = Number((await token.inputValue()).split(".")[0]);
  await expect.poll(() => Date.now() - openedAt, { message: "the form has been open 3 s" }).toBeGreaterThanOrEqual(3000);
}

test.describe("the Replacement finder on a phone", () => {
  test.use({ viewport: { width: 390, height: 844 }, locale: "en-US" });
  test.skip(({ isMobile }) => !isMobile, "the phone's layout: the phone project");

  test("after picking two tires, the ask bar stays in view half-way down the results and opens the form with both, which sends", async ({ page }, testInfo) => {
    test.slow(); // a sent request and an e-mail on top of the page
    await openFinder(page, MANY);
    await expect(askBar(page)).toHaveCount(0);
    const names = await pickTwo(page);
    await expect(askBar(page)).toHaveText("Ask for a price (2 picked)");

    await scrollHalfWayDownTheResults(page);
    await expect(askBar(page)).toBeInViewport({ ratio: 1 });
    await page.screenshot({ path: testInfo.outputPath("finder-phone-bar-390.png") });

    // At the end of the page the bar is back in its place below the results, over nothing.
    await page.evaluate(() => window.scrollTo(0, document.documentElement.scrollHeight));
    const overlaps = await page.evaluate(() => {
      const bar = [...document.querySelectorAll("button")].find((button) => button.textContent?.startsWith("Ask for a price ("))!.parentElement!;
      const box = bar.getBoundingClientRect();
      return [...document.querySelectorAll("footer, section, article")].some((element) => {
        if (element.contains(bar) || !element.checkVisibility()) return false;
        const other = element.getBoundingClientRect();
        return other.top < box.bottom && box.top < other.bottom && other.height > 0;
      });
    });
    expect(overlaps).toBe(false);

    await askBar(page).click();
    await expect(askToggle(page)).toHaveAttribute("aria-expanded", "true");
    await expect(askToggle(page)).toBeFocused();
    await expect(askToggle(page)).toBeInViewport();
    const form = page.locator("form").filter({ has: page.getByLabel("Tires or size") });
    for (const name of names) await expect(form.getByLabel("Tires or size")).toHaveValue(new RegExp(name));
    await expect(form.getByRole("heading", { name: /^On hand at the shop now/ }).locator("xpath=..").getByRole("listitem")).toHaveCount(2);

    const stamp = `${testInfo.project.name}.${Date.now()}`;
    const driver = `finder.${stamp}@example.test`;
    await form.getByLabel("Your name").fill(`Marit Osei ${stamp}`);
    await form.getByLabel("E-mail (the answer goes here)").fill(driver);
    await form.getByLabel("Vehicle").fill("2017 compact SUV");
    await waitUntilTheFormIsOldEnough(page);
    await form.getByRole("button", { name: "Send the request" }).click();
    const done = page.getByRole("status").filter({ hasText: "Your request is with the shop" });
    const number = /number (\d+)/.exec(await done.innerText())?.[1];
    expect(number).toBeDefined();
    await expect.poll(async () => (await emailsTo(driver)).map((email) => email.subject)).toContain(`We have your price request (#${number})`);
  });

  test("the filters fold away behind one button that says whether they are open", async ({ page }) => {
    await openFinder(page, MANY);
    const fold = page.getByRole("button", { name: "Filter and sort" });
    const panel = page.locator(`[id="${await fold.getAttribute("aria-controls")}"]`);
    await expect(fold).toHaveAttribute("aria-expanded", "false");
    await expect(page.getByLabel("Tires needed")).toBeHidden();
    await fold.click();
    await expect(fold).toHaveAttribute("aria-expanded", "true");
    await expect(panel).toBeVisible();
    await expect(panel.getByLabel("Tires needed")).toBeVisible();
    await fold.click();
    await expect(fold).toHaveAttribute("aria-expanded", "false");
    await expect(panel).toBeHidden();
  });

  test("keyboard only: pick a tire, reach the ask bar, open the form", async ({ page }) => {
    await openFinder(page, MANY);
    const firstBox = resultItems(page).first().getByRole("checkbox");
    await page.getByRole("button", { name: "Filter and sort" }).focus();
    await tabTo(page, firstBox, 10);
    await page.keyboard.press("Space");
    await expect(firstBox).toBeChecked();
    await tabTo(page, askBar(page), 4 * FINDER_PAGE_SIZE);
    await expect(askBar(page)).toHaveText("Ask for a price (1 picked)");
    await page.keyboard.press("Enter");
    await expect(askToggle(page)).toBeFocused();
    await expect(askToggle(page)).toHaveAttribute("aria-expanded", "true");
    await expect(page.getByLabel("Your name")).toBeVisible();
    await page.keyboard.press("Tab");
    await expect(page.getByLabel("Your name")).toBeFocused();
  });

  test("the bar is not printed", async ({ page }) => {
    await openFinder(page, MANY);
    await pickTwo(page);
    await expect(askBar(page)).toBeVisible();
    await page.emulateMedia({ media: "print" });
    await expect(askBar(page)).toBeHidden();
  });
});

test.describe("the Replacement finder, on any screen", () => {
  test.use({ locale: "en-US" });

  test("shows a page of results at a time, and Show more brings the next", async ({ page }) => {
    await openFinder(page, MANY);
    const total = Number.parseInt((await resultsHeading(page).innerText()).replace(/,/g, ""), 10);
    expect(total, "the demo size has more than one page").toBeGreaterThan(FINDER_PAGE_SIZE);
    await expect(resultItems(page)).toHaveCount(FINDER_PAGE_SIZE);
    await page.getByRole("button", { name: `Show more (${FINDER_PAGE_SIZE} of ${total})` }).click();
    await expect(resultItems(page)).toHaveCount(Math.min(2 * FINDER_PAGE_SIZE, total));
  });

  test("a visitor's checkboxes add to a price request; staff's add to a Fit card, with their own tools kept", async ({ page }) => {
    test.slow(); // the finder twice and a sign-in between
    await openFinder(page, MANY);
    await expect(pickBoxes(page, /^Add to my price request \(/)).toHaveCount(FINDER_PAGE_SIZE);
    await expect(pickBoxes(page, /^Add to a Fit card/)).toHaveCount(0);
    await expect(page.getByRole("region", { name: "Record a customer" })).toHaveCount(0);

    await signIn(page, "staff@sidewise.test");
    await openFinder(page, MANY);
    await expect(pickBoxes(page, /^Add to a Fit card \(/)).toHaveCount(FINDER_PAGE_SIZE);
    await expect(pickBoxes(page, /^Add to my price request/)).toHaveCount(0);
    await expect(page.getByRole("region", { name: "Record a customer" })).toBeVisible();
    await expect(page.getByRole("button", { name: "Save as Fit card" })).toBeVisible();
  });

  test("price and stock sit in the same place on every card, in stock or not", async ({ page, isMobile }) => {
    await openFinder(page, MANY);
    // Where the words themselves start and end (a range's box), not the boxes of the paragraphs holding them.
    const offsets = await resultItems(page).locator("article").evaluateAll((cards) =>
      cards.map((card) => {
        const textBox = (element: Element) => {
          const range = document.createRange();
          range.selectNodeContents(element);
          return range.getBoundingClientRect();
        };
        const box = card.getBoundingClientRect();
        const words = [textBox(card.querySelector("[data-price]")!), textBox(card.querySelector("[data-stock]")!)];
        return { level: card.querySelector("[data-stock]")!.getAttribute("data-stock"), left: words.map((word) => Math.round(word.left - box.left)), right: words.map((word) => Math.round(box.right - word.right)) };
      }),
    );
    expect(new Set(offsets.map((offset) => offset.level)).size, "the first page holds more than one kind of shelf").toBeGreaterThan(1);
    // On a phone they start at the card's left edge, from sm up they end at its right edge.
    const edges = offsets.map((offset) => (isMobile ? offset.left : offset.right).join(" "));
    expect(new Set(edges).size).toBe(1);
  });

  test("on a desktop the filters stay open and no ask bar shows", async ({ page, isMobile }) => {
    test.skip(isMobile, "the desktop's layout: the desktop project");
    await openFinder(page, MANY);
    await expect(page.getByRole("button", { name: "Filter and sort" })).toBeHidden();
    await expect(page.getByLabel("Tires needed")).toBeVisible();
    await pickTwo(page);
    await expect(askBar(page)).toBeHidden();
    await expect(askToggle(page)).toBeVisible();
  });

  test("has no accessibility violations with tires picked and the filters open", async ({ page }) => {
    await openFinder(page, MANY);
    await pickTwo(page);
    await showFilters(page);
    await expectNoAxeViolations(page);
  });

  for (const [name, path] of [["sporty", SPORTY], ["many", MANY]] as const) {
    for (const width of [390, 1280]) {
      test(`looks right at ${width} px with two tires picked (${name})`, async ({ page, isMobile }, testInfo) => {
        test.skip(isMobile !== (width === 390), "each width once, in its own project");
        await page.setViewportSize({ width, height: 844 });
        await openFinder(page, path);
        await pickTwo(page);
        expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
        await resultItems(page).nth(1).scrollIntoViewIfNeeded();
        await page.screenshot({ path: testInfo.outputPath(`finder-picked-${name}-${width}.png`) });
        await page.screenshot({ path: testInfo.outputPath(`finder-picked-${name}-${width}-full.png`), fullPage: true });
      });
    }
  }
});
