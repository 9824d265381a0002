import type { APIRequestContext } from "@playwright/test";
import { client } from "../security/http";
import { expectNoAxeViolations } from "./helpers/axe";
import { expect, test } from "./helpers/test";

// The tire on the car in the demo requests, as the finder writes it; its size is stocked deeply in the demo catalog.
const ORIGINAL = "225/65R17 102H";
const ALTERNATIVES = "/api/v1/alternatives?size=225-65R17&loadIndex=102&speedSymbol=H&quantity=4&inStock=true&sort=price";

let staff: APIRequestContext;

test.beforeAll(async ({ baseURL }) => {
  staff = await client(baseURL!, "staff@sidewise.test");
});

test.afterAll(async () => {
  await staff?.dispose();
});

/** The shop's offer of four tires in stock for a demo request that names the tire on the car: the offer's token, SKU and vehicle. */
async function sendOffer(): Promise<{ token: string; sku: string; vehicle: string }> {
  const listed = (await (await staff.get("/api/v1/quote-requests")).json()) as { requests: { id: number; tires: string; vehicle: string }[] };
  const request = listed.requests.find((candidate) => candidate.tires === `Replacing ${ORIGINAL}`);
  expect(request, `a demo request replacing ${ORIGINAL}`).toBeDefined();
  const { results } = (await (await staff.get(ALTERNATIVES)).json()) as { results: { sku: string; quantity: number }[] };
  const sku = results.find((tire) => tire.quantity >= 4)?.sku;
  expect(sku, "a tire with a set of four on hand").toBeDefined();
  const sent = await staff.post(`/api/v1/quote-requests/${request!.id}/offers`, { data: { lines: [{ sku, quantity: 4 }], message: "Ask for Wren at the counter." } });
  expect(sent.status(), await sent.text()).toBe(201);
  return { token: ((await sent.json()) as { token: string }).token, sku: sku!, vehicle: request!.vehicle };
}

test.describe("The driver's offer page", () => {
  test("a driver opens an offer by its link, books a fitting time and cancels it", async ({ browser, baseURL, viewport, isMobile, hasTouch, extraHTTPHeaders }) => {
    test.slow(); // an offer, three accessibility scans and two changes of the offer
    const { token, sku, vehicle } = await sendOffer();
    // Signed out, in a browser of its own, on this project's screen.
    const driver = await browser.newContext({ baseURL, viewport, isMobile, hasTouch, extraHTTPHeaders });
    const page = await driver.newPage();

    await page.goto(`/o/${token}`);
    await expect(page.getByRole("heading", { level: 1, name: "Your offer" })).toBeVisible();
    await expect(page.getByText("Status: Open")).toBeVisible();
    await expect(page.getByText(`For your ${vehicle}`)).toBeVisible();
    await expect(page.getByText("Ask for Wren at the counter.")).toBeVisible();
    const line = page.locator(`li[data-sku="${sku}"]`);
    await expect(line).toContainText("4 ×");
    await expect(line).toContainText("Equal or better than the tire on the car:");
    await expect(page.getByRole("heading", { name: /^Out the door for 4: \$[\d,]+\.\d\d$/ })).toBeVisible();
    await expect(page.getByText(/valid until the end of .* \(America\/New_York time\)/)).toBeVisible();
    await expect(page.getByRole("heading", { name: "Before you choose" })).toBeVisible();
    await expect(page.locator('meta[name="robots"]')).toHaveAttribute("content", /noindex/);

    const times = page.getByRole("group", { name: /^Time on / });
    await expect(times.getByRole("radio").first()).toBeVisible();
    await expectNoAxeViolations(page);
    await page.getByRole("button", { name: "Accept and book this time" }).click();
    await expect(page.getByText("Choose a free time first, then accept.")).toBeVisible();
    // The days after the first list are past the shop's cut-off for cancelling online, so the booking can be cancelled below.
    const firstDay = await page.getByRole("group", { name: "Day" }).getByRole("radio").first().getAttribute("value");
    await page.getByRole("button", { name: "Later dates" }).click();
    await expect(page.getByRole("group", { name: "Day" }).getByRole("radio").first()).not.toHaveAttribute("value", firstDay!);
    const firstTime = times.getByRole("radio").first();
    await firstTime.check();
    await expect(page.getByText(/^Your choice: /)).toBeVisible();
    await page.getByRole("button", { name: "Accept and book this time" }).click();

    const fitting = page.getByRole("region", { name: "Your fitting" });
    await expect(fitting).toBeVisible();
    await expect(page.getByText("Status: Booked")).toBeVisible();
    await expect(fitting).toContainText("What to bring");
    await expect(page.getByRole("button", { name: "Accept and book this time" })).toHaveCount(0);
    await expectNoAxeViolations(page);

    await fitting.getByRole("button", { name: "Cancel this fitting" }).click();
    await expect(fitting.getByRole("button", { name: "Keep the booking" })).toBeFocused();
    await fitting.getByRole("button", { name: "Keep the booking" }).click();
    await expect(fitting.getByRole("button", { name: "Cancel this fitting" })).toBeFocused();
    await fitting.getByRole("button", { name: "Cancel this fitting" }).click();
    await fitting.getByRole("button", { name: "Yes, cancel the fitting" }).click();
    await expect(page.getByText("Status: Cancelled")).toBeVisible();
    await expect(page.getByText("This offer was cancelled: ask the shop for a new one.")).toBeVisible();
    await expect(page.getByRole("region", { name: "Your fitting" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Accept and book this time" })).toHaveCount(0);
    await expectNoAxeViolations(page);
    await driver.close();
  });

  test("an unknown or malformed link answers the offer's 404 page", async ({ page }) => {
    for (const token of ["A".repeat(32), "not-a-token"]) {
      const response = await page.goto(`/o/${token}`);
      expect(response?.status()).toBe(404);
      await expect(page.getByRole("heading", { level: 1, name: "No offer has this address" })).toBeVisible();
    }
    await expectNoAxeViolations(page);
  });
});
