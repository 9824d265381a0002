import { expect, type Page, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { resultItems, resultsHeading, showFilters, signIn } from "./helpers/finder";

const FINDER = "/replace?size=235-65R17&loadIndex=104&speedSymbol=S";
const WEAR_TOGGLE = "Replacing fewer than four on an all-wheel-drive vehicle";
// The order "No shaving needed first" promises (see lib/tire/wear-match-candidate.ts).
const RANK = ["fitsAsIs", "shave", "unknownDepth", "replaceSet", "otherSize"];

const verdictsShown = (page: Page) => resultItems(page).locator("[data-wear]").evaluateAll((lines) => lines.map((line) => line.getAttribute("data-wear") ?? ""));

/** Opens the panel and types the depths left on the two tires that stay. */
async function judgeBesideStaying(page: Page, depths: [string, string]) {
  await page.getByLabel(WEAR_TOGGLE).check();
  await expect(page).toHaveURL(/awd=1/);
  await expect(page).toHaveURL(/quantity=2/);
  await page.getByLabel("Tire 1", { exact: true }).fill(depths[0]);
  await page.getByLabel("Tire 2", { exact: true }).fill(depths[1]);
  await expect(page).toHaveURL(new RegExp(`remaining32=${depths[0]}%2C${depths[1]}`));
}

test.describe("the finder beside the tires that stay on an all-wheel-drive vehicle", () => {
  test("judges every result by its line's new tread depth, sorts no shaving first, and keeps it all after a reload", async ({ page }) => {
    await page.goto(FINDER);
    await expect(resultsHeading(page)).toBeVisible();
    await expect(resultItems(page).locator("[data-wear]")).toHaveCount(0);
    await judgeBesideStaying(page, ["9", "10"]);
    await expect(page.getByText("Judged against a limit of 2/32 in between any two tires on the vehicle.")).toBeVisible();
    const count = await resultItems(page).count();
    await expect(resultItems(page).locator("[data-wear]")).toHaveCount(count);
    // Common practice: tread depth matches tires of one size only.
    const otherSize = resultItems(page).filter({ hasNotText: "235/65R17 " }).first();
    if ((await otherSize.count()) > 0) await expect(otherSize).toContainText("cannot be matched by tread depth");
    // 9 and 10/32 stay with a 2/32 limit: a new tire may be 8 to 11/32 deep; deeper is shaved to 11/32 (worked by hand).
    await expect(resultItems(page).locator('[data-wear="shave"]').first()).toContainText("Shave to 11/32 in before fitting");
    await expect(resultItems(page).locator('[data-wear="fitsAsIs"]').first()).toContainText("Fits as it is");

    await showFilters(page);
    await page.getByLabel("Sort by").selectOption({ label: "No shaving needed" });
    await expect(page).toHaveURL(/sort=noShaving/);
    // Fits as it is first, and never a better verdict after a worse one.
    const sortedNoShavingFirst = async () => {
      const ranks = (await verdictsShown(page)).map((verdict) => RANK.indexOf(verdict));
      return ranks[0] === 0 && ranks.every((rank, index) => index === 0 || ranks[index - 1]! <= rank);
    };
    await expect.poll(sortedNoShavingFirst).toBe(true);

    await page.reload();
    await expect(page.getByLabel(WEAR_TOGGLE)).toBeChecked();
    await expect(page.getByLabel("Tire 1", { exact: true })).toHaveValue("9");
    await expect(page.getByLabel("Tire 2", { exact: true })).toHaveValue("10");
    await expect(resultItems(page).locator("[data-wear]").first()).toBeVisible();
    await expectNoAxeViolations(page);
  });

  test("says what to fix when a depth is wrong or four tires are being replaced, and turning it off clears it", async ({ page }) => {
    await page.goto(`${FINDER}&awd=1&quantity=2`);
    await expect(resultsHeading(page)).toBeVisible();
    await page.getByLabel("Tire 1", { exact: true }).fill("7.3");
    await expect(page.getByLabel("Tire 1", { exact: true })).toHaveAttribute("aria-invalid", "true");
    await expect(page.getByText(/Give the depth left on each tire that stays in 32nds of an inch/)).toBeVisible();
    await expect(resultItems(page).locator("[data-wear]")).toHaveCount(0);

    await showFilters(page);
    await page.getByLabel("Tires needed").selectOption("4");
    await expect(page.getByText(/Choose 1 or 2 under Tires needed/)).toBeVisible();

    await page.getByLabel(WEAR_TOGGLE).uncheck();
    await expect(page).not.toHaveURL(/awd=|remaining32=/);
    await expect(page.getByLabel("Tire 1", { exact: true })).toHaveCount(0);
  });

  test("a request and a Fit card carry the depths that stay and each picked tire's verdict", async ({ page }) => {
    test.slow(); // sign-in, a saved card and a second page
    await signIn(page, "staff@sidewise.test");
    await page.goto(`${FINDER}&awd=1&quantity=2&remaining32=9%2C10`);
    await expect(resultsHeading(page)).toBeVisible();
    const sameSize = resultItems(page).filter({ has: page.locator('[data-wear="shave"], [data-wear="fitsAsIs"]') }).first();
    await sameSize.getByRole("checkbox").check();

    await page.getByRole("button", { name: "Ask the shop for a price" }).click();
    const tires = page.getByLabel("Tires or size");
    await expect(tires).toHaveValue(/All-wheel drive: 2 tires stay at 9\/32 in, 10\/32 in \(limit 2\/32 in\)/);
    await expect(tires).toHaveValue(/\((Shave to 11\/32 in before fitting|Fits as it is)/);

    await page.getByRole("button", { name: "Save as Fit card" }).click();
    await page.getByRole("button", { name: "Save the card" }).click();
    const saved = page.getByRole("status").filter({ hasText: "Fit card saved." });
    await expect(saved).toBeVisible();
    await page.goto((await saved.getByRole("link").getAttribute("href"))!);
    await expect(page.getByRole("heading", { name: "All-wheel drive: the tires that stay" })).toBeVisible();
    await expect(page.getByText(/Depth left: 9\/32 in \(7\.1 mm\), 10\/32 in \(7\.9 mm\)/)).toBeVisible();
    await expect(page.locator("[data-wear]").first()).toContainText(/Shave to 11\/32 in|Fits as it is/);
    await expectNoAxeViolations(page);
  });
});

test.describe("Wear match at a phone's and a desktop's width", () => {
  const pages = [
    ["finder", `${FINDER}&awd=1&quantity=2&remaining32=9%2C10&sort=noShaving`, /Fits as it is: 10\/32 in new/],
    ["page", "/wear-match?size=235-65R17&newTreadDepth32=12&remaining32=9,9.5,10", /Shave the new tire to 11\/32 in/],
  ] as const;
  for (const [name, path, verdict] of pages) {
    for (const width of [390, 1280]) {
      test(`the ${name} looks right at ${width} px`, async ({ page, isMobile }, testInfo) => {
        test.skip(isMobile !== (width === 390), "each width once, in its own project");
        await page.setViewportSize({ width, height: 844 });
        await page.goto(path);
        await expect(page.getByText(verdict).first()).toBeVisible();
        expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
        await page.screenshot({ path: testInfo.outputPath(`wear-${name}-${width}.png`), fullPage: true });
      });
    }
  }
});
