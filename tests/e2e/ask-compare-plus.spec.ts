import { expect, type Page, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { emailsTo } from "./helpers/inbox";
import { waitUntilTheFormIsOldEnough } from "./helpers/quote-form";

const COMPARE = "/compare?sizes=225-45R17,235-40R18";
const PLUS = "/plus?size=225/45R17";

async function signIn(page: Page, next: string) {
  await page.goto(`/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel("E-mail").fill("staff@sidewise.test");
  await page.getByLabel("Password").fill("sidewise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
}

/** Opens Ask the shop, checks what the page filled in, sends the request and waits for the driver's confirmation e-mail. */
async function askTheShop(page: Page, stamp: string, filledIn: string) {
  await page.getByRole("button", { name: "Ask the shop for a price" }).click();
  const form = page.locator("form").filter({ has: page.getByLabel("Tires or size") });
  await expect(form.getByLabel("Tires or size")).toHaveValue(filledIn);
  const driver = `asks.${stamp}@example.test`;
  await form.getByLabel("Your name").fill(`Maren Quill ${stamp}`);
  await form.getByLabel("E-mail (the answer goes here)").fill(driver);
  await form.getByLabel("Vehicle").fill("2018 compact hatchback");
  await waitUntilTheFormIsOldEnough(form);
  await form.getByRole("button", { name: "Send the request" }).click();
  const done = page.getByRole("status").filter({ hasText: "Your request is with the shop" });
  await expect(done).toContainText(driver);
  const number = /number (\d+)/.exec(await done.innerText())?.[1];
  await expect.poll(async () => (await emailsTo(driver)).map((email) => email.subject)).toContain(`We have your price request (#${number})`);
}

/** Signed out, the page offers its link and a way to sign in, and no save form at all. */
async function expectCopyLinkAndSignIn(page: Page, signInHref: RegExp) {
  await expect(page.getByRole("button", { name: "Copy link" })).toBeVisible();
  await expect(page.getByRole("link", { name: "Sign in to save a Fit card" })).toHaveAttribute("href", signInHref);
  await expect(page.getByRole("button", { name: "Save as Fit card" })).toHaveCount(0);
  await expect(page.getByRole("button", { name: "Save the card" })).toHaveCount(0);
  await expect(page.getByLabel("Load index on the car")).toHaveCount(0);
}

async function screenshots(page: Page, name: string, outputPath: (name: string) => string) {
  for (const width of [390, 1280]) {
    await page.setViewportSize({ width, height: 900 });
    // Nothing scrolls sideways.
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await page.screenshot({ path: outputPath(`${name}-${width}.png`), fullPage: true });
  }
}

test.describe("Ask the shop and Fit cards on Side-by-side and the Plus planner", () => {
  test("Side-by-side: a signed-out visitor copies the link, and asks the shop about the sizes entered", async ({ page, context }, testInfo) => {
    test.slow(); // an e-mail round trip and an accessibility scan with the form open
    await context.grantPermissions(["clipboard-read", "clipboard-write"]);
    await page.goto(COMPARE);
    // A table row on a wide screen, a block per size on a phone.
    await expect(page.getByText("Diameter change").filter({ visible: true }).first()).toBeVisible();
    // Side-by-side is about changing size: its cautions speak of a new wheel, not of keeping the rim diameter.
    const cautions = page.getByRole("complementary", { name: "Before you choose" });
    await expect(cautions).toContainText("bolt pattern");
    await expect(cautions).not.toContainText(/keep the same rim diameter/i);
    // The page writes its sizes back to the address (the comma percent-encoded); the link returns to them either way.
    await expectCopyLinkAndSignIn(page, /^\/sign-in\?next=%2Fcompare%3Fsizes%3D225-45R17(%2C|%252C)235-40R18$/);
    await page.getByRole("button", { name: "Copy link" }).click();
    await expect(page.getByRole("status").filter({ hasText: "Link copied." })).toBeVisible();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(page.url());
    await screenshots(page, "compare-signed-out", (name) => testInfo.outputPath(name));

    // Only the sizes that read go to the shop.
    await page.getByRole("button", { name: "Add a size" }).click();
    await page.getByRole("textbox", { name: "Size 3", exact: true }).fill("not a size");
    await askTheShop(page, `${testInfo.project.name}.compare.${Date.now()}`, "225/45R17, 235/40R18");
    await expectNoAxeViolations(page);
  });

  test("Plus planner: stocked sizes first, its own cautions, and Ask the shop with the picked size", async ({ page }, testInfo) => {
    test.slow(); // the scan walks every row of a long page, and a request goes out by e-mail
    // A browser that refuses the clipboard: the link is shown to copy by hand.
    await page.addInitScript(() => {
      Object.defineProperty(navigator, "clipboard", { value: { writeText: () => Promise.reject(new Error("refused")) } });
    });
    await page.goto(PLUS);
    await expect(page.getByRole("heading", { level: 2, name: /Plus 1: 18-inch wheels/ })).toBeVisible();

    // In every group, the sizes with tires in the catalog come before those with none.
    const groups = await page.locator("table tbody").evaluateAll((bodies) =>
      bodies.map((body) => [...body.querySelectorAll("tr")].map((row) => (row.querySelectorAll("td")[4]?.querySelector("a") ? "stocked" : "none"))),
    );
    expect(groups.length).toBeGreaterThan(1);
    for (const rows of groups) expect(rows).toEqual([...rows].sort((a, b) => (a === b ? 0 : a === "stocked" ? -1 : 1)));
    expect(groups.some((rows) => rows.includes("stocked") && rows.includes("none")), "a group mixes stocked and unstocked sizes").toBe(true);

    // The cautions are about a new wheel, not about keeping the old one.
    const cautions = page.getByRole("complementary", { name: "Before you choose" });
    await expect(cautions).toContainText("bolt pattern");
    await expect(cautions).toContainText("TPMS");
    await expect(cautions).toContainText("load index");
    await expect(cautions).toContainText("16- and 16.5-inch");
    await expect(cautions).not.toContainText(/keep the same rim diameter/i);
    await expect(page.locator("body")).not.toContainText(/keep the same rim diameter/i);

    await expectCopyLinkAndSignIn(page, /^\/sign-in\?next=%2Fplus%3Fsize%3D225%2F45R17$/);
    await page.getByRole("button", { name: "Copy link" }).click();
    await expect(page.getByRole("status").filter({ hasText: "The browser did not allow copying" })).toContainText(page.url());

    await page.getByRole("checkbox", { name: "Pick 225/40R18 to compare and ask about" }).check();
    await expect(page.getByText("Picked to compare: 225/45R17, 225/40R18.")).toBeVisible();
    await screenshots(page, "plus-signed-out", (name) => testInfo.outputPath(name));
    await askTheShop(
      page,
      `${testInfo.project.name}.plus.${Date.now()}`,
      "On the car now: 225/45R17\nOn new wheels (load index and speed symbol at least the vehicle's placard): 225/40R18",
    );
    await expectNoAxeViolations(page);
  });

  test("signing in from Side-by-side comes back to the same sizes, where staff save a Fit card", async ({ page }, testInfo) => {
    test.slow(); // a sign-in and four full-page screenshots
    await page.goto(COMPARE);
    await page.getByRole("link", { name: "Sign in to save a Fit card" }).click();
    await page.getByLabel("E-mail").fill("staff@sidewise.test");
    await page.getByLabel("Password").fill("sidewise-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page).toHaveURL(/\/compare\?sizes=225-45R17(%2C|,)235-40R18$/);
    await expect(page.getByRole("button", { name: "Save as Fit card" })).toBeVisible();
    await expect(page.getByRole("link", { name: "Sign in to save a Fit card" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Ask the shop for a price" })).toBeVisible();
    await screenshots(page, "compare-signed-in", (name) => testInfo.outputPath(name));
  });

  test("the Plus planner shows staff Save as Fit card and no accessibility violations", async ({ page }, testInfo) => {
    test.slow(); // the scan walks every row of a long page
    await signIn(page, PLUS);
    await expect(page.getByRole("heading", { level: 2, name: /Plus 1: 18-inch wheels/ })).toBeVisible();
    await expect(page.getByRole("button", { name: "Save as Fit card" })).toBeVisible();
    await expect(page.getByRole("button", { name: "Copy link" })).toHaveCount(0);
    await screenshots(page, "plus-signed-in", (name) => testInfo.outputPath(name));
    await expectNoAxeViolations(page);
  });
});
