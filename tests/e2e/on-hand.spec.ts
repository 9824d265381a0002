import { demoShopCharges } from "../../lib/demo/shop";
import { estimateSet } from "../../lib/money/estimate";
import { formatPrice } from "../../lib/money/money";
import { FINDER_PAGE_SIZE } from "../../lib/finder/finder-state";
import { expect, type Page, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { showFilters } from "./helpers/finder";

// A common size the demo shop stocks deeply: its first page holds tires with a set or more, with one to three, and with none.
const SEARCH = "size=225-65R17&loadIndex=102&speedSymbol=H&sort=price";

interface Result {
  sku: string;
  priceCents: number;
  quantity: number;
  estimate: { quantity: number; tiresCents: number; servicesCents: number; feesCents: number; taxCents: number; totalCents: number };
}

const results = (page: Page) => page.locator("article[data-sku]");
const listShown = (page: Page) => expect(results(page).first()).toBeVisible();
const setSize = (page: Page) => page.getByLabel("Tires needed");

/** The first page of results, as the finder asks for it. */
async function firstPage(page: Page, quantity: number): Promise<Result[]> {
  const response = await page.request.get(`/api/v1/alternatives?${SEARCH}&quantity=${quantity}&limit=${FINDER_PAGE_SIZE}`);
  expect(response.status()).toBe(200);
  return ((await response.json()) as { results: Result[] }).results;
}

/** The card of a result, its words and its breakdown checked against the shop's charges. */
async function expectPriced(page: Page, tire: Result, quantity: number) {
  const card = page.locator(`article[data-sku="${tire.sku}"]`);
  const expected = estimateSet(tire.priceCents, quantity, demoShopCharges);
  expect(tire.estimate).toEqual(expected);
  const breakdown = card.locator("[data-estimate-total]");
  await expect(breakdown).toHaveAttribute("data-estimate-total", String(expected.totalCents));
  await expect(breakdown.getByRole("heading")).toHaveText(`Out the door for ${quantity}: ${formatPrice(expected.totalCents)}`);
  await expect(breakdown).toContainText(`${quantity} ${quantity === 1 ? "tire" : "tires"} × ${formatPrice(tire.priceCents)}${formatPrice(expected.tiresCents)}`);
  await expect(breakdown).toContainText(`Fitting${formatPrice(expected.servicesCents)}`);
  await expect(breakdown).toContainText(`Disposal & fees${formatPrice(expected.feesCents)}`);
  await expect(breakdown).toContainText(`Tax${formatPrice(expected.taxCents)}`);
  await expect(breakdown).toContainText(`Total${formatPrice(expected.totalCents)}`);
  await expect(breakdown).toContainText("Estimate — the shop confirms the price.");
  const words = tire.quantity === 0 ? "none on hand: ask the shop" : tire.quantity < quantity ? `${tire.quantity} on hand — fewer than the ${quantity} you need` : `${tire.quantity} on hand`;
  await expect(card.locator("[data-stock]")).toHaveText(words);
}

test.describe("how many are on hand, and what a set costs out the door", () => {
  test.use({ locale: "en-US" });
  // Each test reads several pages of results and scans them with axe.
  test.slow();

  test("the finder needs a set of four unless told otherwise, says how many each tire has and prices the set", async ({ page }) => {
    await page.goto(`/replace?${SEARCH}`);
    await listShown(page);
    await expect(setSize(page)).toHaveValue("4");
    const tires = await firstPage(page, 4);
    const enough = tires.find((tire) => tire.quantity >= 4);
    const short = tires.find((tire) => tire.quantity > 0 && tire.quantity < 4);
    const none = tires.find((tire) => tire.quantity === 0);
    expect(enough && short && none, "the demo list holds every kind of shelf").toBeTruthy();
    for (const tire of [enough!, short!, none!]) await expectPriced(page, tire, 4);
    await expect(page.getByText(/\d on hand — fewer than the 4 you need/).first()).toBeVisible();
    await expectNoAxeViolations(page);
  });

  test("a set of two stays in the address across a reload, and the words and estimates follow it", async ({ page }) => {
    await page.goto(`/replace?${SEARCH}`);
    await listShown(page);
    await showFilters(page);
    await setSize(page).selectOption("2");
    await expect(page).toHaveURL(/quantity=2/);
    await expect(results(page).first().locator("[data-estimate-total] h4")).toContainText("Out the door for 2");
    await page.reload();
    await expect(setSize(page)).toHaveValue("2");
    await expect(results(page).first().locator("[data-estimate-total] h4")).toContainText("Out the door for 2");
    const tires = await firstPage(page, 2);
    for (const tire of [tires.find((t) => t.quantity === 1), tires.find((t) => t.quantity >= 2), tires[0]]) if (tire) await expectPriced(page, tire, 2);

    // "At least 2 on hand" keeps only tires with two or more.
    await showFilters(page);
    await page.getByLabel("At least 2 on hand").check();
    await expect(page).toHaveURL(/inStock=1/);
    await expect.poll(async () => (await results(page).locator("[data-stock]").allTextContents()).every((text) => /^\d+ on hand$/.test(text))).toBe(true);
    await expectNoAxeViolations(page);
  });

  test("a malformed set size in the address falls back to four", async ({ page }) => {
    await page.goto(`/replace?${SEARCH}&quantity=3`);
    await listShown(page);
    await expect(setSize(page)).toHaveValue("4");
    await expect(results(page).first().locator("[data-estimate-total] h4")).toContainText("Out the door for 4");
  });

  test("Ask the shop names the picked tires with how many are on hand for the number asked for, and the Counter prices them", async ({ page }, testInfo) => {
    await page.goto(`/replace?${SEARCH}&quantity=6`);
    await listShown(page);
    const tires = await firstPage(page, 6);
    const short = tires.find((tire) => tire.quantity > 0 && tire.quantity < 6)!;
    await page.locator(`article[data-sku="${short.sku}"]`).getByRole("checkbox", { name: /^Add to my price request/ }).check();
    await page.getByRole("button", { name: "Ask the shop for a price" }).click();
    const form = page.locator("form").filter({ has: page.getByLabel("How many tires (1–16)") });
    await expect(form.getByLabel("How many tires (1–16)")).toHaveValue("6");
    await expect(form.getByRole("heading", { name: "On hand at the shop now, for 6 tires" })).toBeVisible();
    await expect(form.locator("[data-stock]")).toHaveText(`${short.quantity} on hand — fewer than the 6 you need`);
    await form.getByLabel("How many tires (1–16)").fill(String(short.quantity));
    await expect(form.locator("[data-stock]")).toHaveText(`${short.quantity} on hand`);
    await expectNoAxeViolations(page);

    // Sent, the request names the tire by SKU; the Counter prices the request's quantity of it.
    const stamp = `${testInfo.project.name}.${Date.now()}`;
    await form.getByLabel("Your name").fill(`Ines Calloway ${stamp}`);
    await form.getByLabel("E-mail (the answer goes here)").fill(`ines.${stamp}@example.test`);
    await form.getByLabel("Vehicle").fill("2016 estate car");
    const token = form.locator('input[name="renderedAt"]');
    await expect(token).toHaveValue(/^\d+\./);
    const openedAt = Number((await token.inputValue()).split(".")[0]);
    await expect.poll(() => Date.now() - openedAt, { message: "the form has been open 3 s" }).toBeGreaterThanOrEqual(3000);
    await form.getByRole("button", { name: "Send the request" }).click();
    const number = /number (\d+)/.exec(await page.getByRole("status").filter({ hasText: "Your request is with the shop" }).innerText())?.[1];
    expect(number).toBeDefined();

    await page.goto(`/counter/requests/${number}`);
    await page.getByLabel("E-mail").fill("staff@sidewise.test");
    await page.getByLabel("Password").fill("sidewise-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    const lines = page.getByRole("region", { name: "Catalog tires in the request" });
    const line = lines.locator(`li[data-sku="${short.sku}"]`);
    await expect(line.locator("[data-stock]")).toHaveText(`${short.quantity} on hand`);
    const expected = estimateSet(short.priceCents, short.quantity, demoShopCharges);
    await expect(line.locator("[data-estimate-total]")).toHaveAttribute("data-estimate-total", String(expected.totalCents));
    await expect(line).toContainText(`Out the door for ${short.quantity}: ${formatPrice(expected.totalCents)}`);
    await expect(line).toContainText("Estimate — the shop confirms the price.");
    await expectNoAxeViolations(page);
  });

  for (const width of [390, 1280]) {
    test(`looks right at ${width} px`, async ({ page }, testInfo) => {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`/replace?${SEARCH}`);
      const first = results(page).first();
      await expect(first.locator("[data-estimate-total]")).toBeVisible();
      // Nothing scrolls sideways.
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      await first.scrollIntoViewIfNeeded();
      await page.screenshot({ path: testInfo.outputPath(`finder-result-${width}.png`) });
      await first.screenshot({ path: testInfo.outputPath(`finder-card-${width}.png`) });
    });
  }
});
