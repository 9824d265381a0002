import { expect, test, type Page } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { emailsTo } from "./helpers/inbox";
import { FINDER_PAGE_SIZE } from "../../lib/finder/finder-state";

// A common size the demo shop stocks deeply. The test fits four of its best-stocked tire, so the
// on-hand specs that run later still find that tire with a set or more.
const SEARCH = "size=225-65R17&loadIndex=102&speedSymbol=H&sort=price";

async function signInAsStaff(page: Page, path: string) {
  await page.goto(path);
  await page.getByLabel("E-mail").fill("staff@sidewise.test");
  await page.getByLabel("Password").fill("sidewise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).not.toHaveURL(/\/sign-in/);
}

test.describe("offers and fittings at the Counter", () => {
  test("staff record a walk-in from the finder and send an offer; the driver books from the e-mailed link; staff mark the fitting", async ({ page, request, browser, viewport, isMobile, hasTouch }, testInfo) => {
    // A long journey through five pages, three of them scanned: more time in all, no step timed.
    test.slow();
    const stamp = `${testInfo.project.name}.${Date.now()}`;
    // The finder's first page of tires with a set on hand, as the page below shows it.
    const found = await page.request.get(`/api/v1/alternatives?${SEARCH}&quantity=4&inStock=true&limit=${FINDER_PAGE_SIZE}`);
    const { results } = (await found.json()) as { results: { sku: string; quantity: number }[] };
    const tire = results.reduce((best, candidate) => (candidate.quantity > best.quantity ? candidate : best));

    // The walk-in: recorded from the finder with the picked tire; the request page opens ready to price it.
    await signInAsStaff(page, "/counter/requests");
    await page.goto(`/replace?${SEARCH}&inStock=1`);
    await page.locator(`article[data-sku="${tire.sku}"]`).getByRole("checkbox", { name: /^Add to a Fit card/ }).check();
    const walkIn = page.getByRole("region", { name: "Record a customer" });
    await walkIn.getByRole("button", { name: "Record a customer" }).click();
    await expect(walkIn.getByLabel("Tires", { exact: true })).toHaveValue(/^Replacing 225\/65R17 102H\n/);
    await walkIn.getByLabel("Customer's name").fill(`Oriel Banfather ${stamp}`);
    await walkIn.getByLabel("Customer's e-mail").fill(`oriel.${stamp}@example.test`);
    await walkIn.getByLabel("Customer's phone (optional)").fill("(555) 010-4477");
    await walkIn.getByLabel("Customer's vehicle").fill("2018 delivery van");
    await walkIn.getByRole("button", { name: "Record and price an offer" }).click();
    await expect(page).toHaveURL(/\/counter\/requests\/\d+$/);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText(`Oriel Banfather ${stamp} asks for a price`);

    // The composer offers the picked tire first, ticked, four of it, with the estimate.
    const composer = page.locator("form").filter({ has: page.getByRole("button", { name: "Send the offer" }) });
    const line = composer.locator(`li[data-sku="${tire.sku}"]`);
    await expect(line.getByRole("checkbox")).toBeChecked();
    await expect(line.getByLabel("How many")).toHaveValue("4");
    await expect(composer.getByRole("heading", { name: /^Out the door for 4: \$/ })).toBeVisible();
    await line.getByLabel("How many").selectOption(String(tire.quantity + 1 > 8 ? 8 : tire.quantity + 1));
    if (tire.quantity < 8) await expect(line).toContainText(`Only ${tire.quantity} can be sold now`);
    await line.getByLabel("How many").selectOption("4");
    await page.getByLabel("Add another tire by SKU").fill("NO-SUCH-TIRE");
    await page.getByRole("button", { name: "Add", exact: true }).click();
    await expect(page.getByText("The catalog sells no current item with the SKU “NO-SUCH-TIRE”")).toBeVisible();
    await page.getByLabel("Message to the driver (optional)").fill("Four fitted and balanced; the old ones recycled.");
    await expectNoAxeViolations(page);
    await page.getByRole("button", { name: "Send the offer" }).click();

    const link = page.getByLabel("The offer's link");
    await expect(link).toHaveValue(/^https?:\/\/[^/]+\/o\/[A-Za-z0-9_-]{32}$/);
    const token = (await link.inputValue()).split("/o/")[1]!;
    const listed = page.locator("li[data-offer-id]").first();
    await expect(listed.locator("[data-offer-status]")).toHaveText("Open");
    await expect(listed).toContainText(`4 × `);
    await expect(listed).toContainText("Four fitted and balanced");
    await expectNoAxeViolations(page);

    // The driver opens the e-mailed link, signed out, in a browser of their own, and books the first free time.
    await expect.poll(async () => (await emailsTo(`oriel.${stamp}@example.test`)).find((email) => email.text?.includes(`/o/${token}`))?.subject ?? "").toContain("Your tire price");
    const [offerEmail] = await emailsTo(`oriel.${stamp}@example.test`);
    const emailedLink = /https?:\/\/\S+\/o\/[A-Za-z0-9_-]{32}/.exec(offerEmail!.text ?? "")![0];
    const driver = await browser.newContext({ viewport, isMobile, hasTouch });
    const driverPage = await driver.newPage();
    await driverPage.goto(new URL(new URL(emailedLink).pathname, page.url()).toString());
    await expect(driverPage.getByText("Status: Open")).toBeVisible();
    await driverPage.getByRole("group", { name: /^Time on / }).getByRole("radio").first().check();
    await driverPage.getByRole("button", { name: "Accept and book this time" }).click();
    await expect(driverPage.getByText("Status: Booked")).toBeVisible();
    await driver.close();
    const booked = (await (await request.get(`/api/v1/offers/${token}`)).json()) as { appointment: { start: string } };
    const first = booked.appointment;
    await expect
      .poll(async () => (await emailsTo(`oriel.${stamp}@example.test`)).flatMap((email) => email.attachments ?? []).map((file) => file.filename))
      .toContain("fitting.ics");

    // The fitting shows on its day (the slot's date is the shop's local date) and in its week.
    const day = first.start.slice(0, 10);
    await page.goto(`/counter/fittings?day=${day}&view=week`);
    await expect(page.getByRole("article", { name: new RegExp(`Oriel Banfather ${stamp}`) })).toBeVisible();
    await page.goto(`/counter/fittings?day=${day}`);
    const fitting = page.getByRole("article", { name: new RegExp(`Oriel Banfather ${stamp}`) });
    await expect(fitting.locator("[data-offer-status]")).toHaveText("Fitting booked");
    await expect(fitting).toContainText("(555) 010-4477");
    await expect(fitting).toContainText("2018 delivery van");
    await expectNoAxeViolations(page);
    await fitting.getByRole("button", { name: "Fitted", exact: true }).click();
    await fitting.getByRole("button", { name: "Yes, mark fitted" }).click();
    await expect(fitting.locator("[data-offer-status]")).toHaveText("Fitted");
    await expect(fitting.getByRole("button", { name: "Fitted", exact: true })).toHaveCount(0);

    // Back at the inbox, the request shows its offer's status.
    await page.goto("/counter/requests?status=offered");
    const inInbox = page.getByRole("listitem").filter({ hasText: `Oriel Banfather ${stamp}` });
    await expect(inInbox.locator("[data-offer-status]")).toHaveText("Offer: Fitted");
  });

  test("a day with no fittings says so, and an unreadable day opens today", async ({ page }) => {
    await signInAsStaff(page, "/counter/fittings?day=2031-02-30&view=sideways");
    await expect(page.getByRole("status")).toContainText(/No fittings booked for this day|\d+ fittings?/);
    await page.goto("/counter/fittings?day=2030-01-01");
    await expect(page.getByRole("status")).toContainText("No fittings booked for this day.");
    await page.getByRole("link", { name: "Show the week" }).click();
    await expect(page).toHaveURL(/day=2030-01-01&view=week/);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("Week of Monday, December 31, 2029");
    await expect(page.getByText("No fittings booked for this day.")).toHaveCount(7);
  });
});
