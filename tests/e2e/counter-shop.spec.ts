import type { APIRequestContext } from "@playwright/test";
import { client } from "../security/http";
import { expectNoAxeViolations } from "./helpers/axe";
import { expect, test, type Page, staffFlowsAtDesktopWidth } from "./helpers/test";

// Both projects share one database per run and every other spec expects the demo shop: each test
// starts from the settings read before it and afterAll puts them back.
test.describe.configure({ mode: "serial" });

let admin: APIRequestContext;
let original: Record<string, unknown>;

test.beforeAll(async ({ baseURL }) => {
  admin = await client(baseURL!, "admin@sidewise.test");
  original = await (await admin.get("/api/v1/shop")).json();
});

test.afterEach(async () => {
  expect((await admin.patch("/api/v1/shop", { data: original })).status(), "the demo shop's settings are put back").toBe(200);
});

test.afterAll(async () => {
  await admin?.dispose();
});

async function signIn(page: Page, email: string, path: string) {
  await page.goto(path);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("sidewise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
}

const footer = (page: Page) => page.getByRole("contentinfo");

test.describe("the Counter's shop settings", () => {
  staffFlowsAtDesktopWidth();
  test("an admin changes the charges, the tax rate, Saturday's hours and a closed date; the footer follows", async ({ page }) => {
    await signIn(page, "admin@sidewise.test", "/counter/shop");
    await expect(page.getByRole("heading", { level: 1, name: "Shop settings" })).toBeVisible();
    await expect(page.getByRole("navigation", { name: "Counter sections" }).getByRole("link", { name: "Shop" })).toHaveAttribute("aria-current", "page");
    await expect(footer(page)).toContainText("Sat 08:00–14:00");
    await expect(page.getByText(/^Now there: .+ E[SD]T\.$/)).toBeVisible();
    await expectNoAxeViolations(page);

    await page.getByLabel("Fitting per tire (US dollars)").fill("$30.00");
    await page.getByLabel("Sales tax rate (%)").fill("8");
    await page.getByLabel("Saturday interval 1 Closes").fill("12:00");
    await page.getByRole("button", { name: "Add hours after a break on Saturday" }).click();
    await page.getByLabel("Saturday interval 2 Opens").fill("13:00");
    await page.getByLabel("Saturday interval 2 Closes").fill("16:00");
    await page.getByLabel("Add a closed date").fill("2026-12-31");
    await page.getByRole("button", { name: "Add date" }).click();
    await expect(page.getByRole("button", { name: "Remove December 31, 2026" })).toBeVisible();
    await page.getByRole("button", { name: "Save settings" }).click();

    await expect(page.getByRole("status").filter({ hasText: "Saved:" })).toHaveText(
      "Saved: Saturday 08:00–14:00 → 08:00–12:00, 13:00–16:00; closed dates: 2026-12-31 added; fitting $25.00 → $30.00 per tire; tax rate 7.25 % → 8 %.",
    );
    await expect(footer(page)).toContainText("Sat 08:00–12:00, 13:00–16:00");
    const saved = await (await page.request.get("/api/v1/shop")).json();
    expect(saved).toMatchObject({ fittingPerTireCents: 3_000, taxRateBp: 800, closedDates: ["2026-12-25", "2026-12-31", "2027-01-01"], hours: { sat: [["08:00", "12:00"], ["13:00", "16:00"]] } });
    await page.goto("/learn");
    await expect(footer(page)).toContainText("Sat 08:00–12:00, 13:00–16:00");
  });

  test("errors stand next to their fields: the browser's checks, then the server's", async ({ page }) => {
    await signIn(page, "admin@sidewise.test", "/counter/shop");
    await page.getByLabel("Sales tax rate (%)").fill("7.255");
    await page.getByLabel("Tuesday interval 1 Opens").fill("19:00");
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect(page.getByRole("alert").filter({ hasText: "Nothing was saved" })).toBeVisible();
    await expect(page.getByLabel("Sales tax rate (%)")).toHaveAccessibleDescription(/at most two decimals/);
    await expect(page.getByRole("group", { name: "Tuesday" })).toContainText("19:00–18:00 closes before it opens");
    await expect(page.getByLabel("Tuesday interval 1 Opens")).toBeFocused();

    await page.getByLabel("Sales tax rate (%)").fill("21");
    await expect(page.getByText("Above 15 % is more than US state and local sales taxes add up to anywhere")).toBeVisible();
    await page.getByLabel("Sales tax rate (%)").fill("7.25");
    await page.getByLabel("Tuesday interval 1 Opens").fill("07:30");
    await page.getByLabel("Time zone").fill("Mars/Olympus");
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect(page.getByLabel("Time zone")).toHaveAccessibleDescription(/use an IANA time zone name/);
    await expectNoAxeViolations(page);
  });

  test("an admin sets the fitting bays and the online cancel cut-off; a value out of range stands next to its field", async ({ page }) => {
    await signIn(page, "admin@sidewise.test", "/counter/shop");
    await expect(page.getByLabel("Fitting bays")).toHaveAccessibleDescription("How many sets can be fitted at the same time.");
    await page.getByLabel("Fitting bays").fill("21");
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect(page.getByLabel("Fitting bays")).toHaveAccessibleDescription(/a whole number from 1 to 20/);
    await expect(page.getByLabel("Fitting bays")).toBeFocused();

    await page.getByLabel("Fitting bays").fill("3");
    await page.getByLabel("Cancel online until (hours before)").fill("48");
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect(page.getByRole("status").filter({ hasText: "Saved:" })).toHaveText("Saved: fitting bays 2 → 3; online cancelling until 24 → 48 hours before.");
    expect(await (await page.request.get("/api/v1/shop")).json()).toMatchObject({ fittingBays: 3, fittingMinutes: 60, leadMinutes: 120, cancelCutoffHours: 48 });
    await expectNoAxeViolations(page);
  });

  test("the Counter's times follow the shop's time zone and say which it is", async ({ page }) => {
    await signIn(page, "admin@sidewise.test", "/counter/audit");
    await expect(page.getByText(/times in America\/New_York \(the shop's time\)/)).toBeVisible();

    await page.goto("/counter/shop");
    await page.getByLabel("Time zone").fill("Pacific/Honolulu");
    await expect(page.getByText(/^Now there: .+ HST\.$/)).toBeVisible();
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect(page.getByRole("status").filter({ hasText: "Saved:" })).toHaveText("Saved: time zone America/New_York → Pacific/Honolulu.");

    await page.goto("/counter/audit");
    await expect(page.getByText(/times in Pacific\/Honolulu \(the shop's time\)/)).toBeVisible();
    const newest = page.getByRole("region", { name: "Audit entries" }).locator("tbody tr").first();
    await expect(newest).toContainText("Shop settings changed");
    await expect(newest).toContainText("Time zone America/New_York → Pacific/Honolulu");
    await expect(newest.locator("td").first()).toHaveText(/^\w{3} \d{1,2}, \d{4}, \d{1,2}:\d{2} [AP]M HST$/);
    await expectNoAxeViolations(page);
  });

  test("staff cannot reach the shop's settings", async ({ page }) => {
    await signIn(page, "staff@sidewise.test", "/counter/shop");
    await expect(page.getByRole("heading", { level: 1, name: "This Counter page is for admins" })).toBeVisible();
    await expect(page.getByText("Only an admin can change the shop's settings.")).toBeVisible();
    await expect(page.getByRole("navigation", { name: "Counter sections" }).getByRole("link", { name: "Shop" })).toHaveCount(0);
    await expect(page.getByLabel("Sales tax rate (%)")).toHaveCount(0);
  });
});
