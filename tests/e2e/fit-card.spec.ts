import { expect, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

const inboxUrl = `${process.env.E2E_FAKE_RESEND_URL ?? "http://127.0.0.1:3226"}/emails`;

interface ReceivedEmail {
  id: string;
  to: string | string[];
  subject: string;
  text?: string;
  html?: string;
}

async function emailTo(address: string): Promise<ReceivedEmail | null> {
  const response = await fetch(inboxUrl);
  const { data } = (await response.json()) as { data: ReceivedEmail[] };
  return data.find((received) => received.to === address) ?? null;
}

test.describe("Fit card", () => {
  test("staff save a comparison as a card, e-mail it, and the link shows the same sizes to anyone", async ({ page, browser, request }, testInfo) => {
    test.slow(); // sign-in, a saved card, an e-mail, a second browser context and three accessibility scans
    const address = `card.${testInfo.project.name}.${Date.now()}@example.test`;

    await page.goto(`/sign-in?next=${encodeURIComponent("/compare?sizes=225-45R17,225-40R18")}`);
    await page.getByLabel("E-mail").fill("staff@sidewise.test");
    await page.getByLabel("Password").fill("sidewise-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page).toHaveURL(/\/compare\?sizes=/);

    await page.getByRole("button", { name: "Save as Fit card" }).click();
    await page.getByRole("button", { name: "Save the card" }).click();
    await expect(page.getByText("Type the load index from the sidewall, 0–279.")).toBeVisible();
    await page.getByLabel("Load index on the car").fill("91");
    await page.getByLabel("Speed symbol on the car").fill("V");
    await page.getByRole("button", { name: "Save the card" }).click();
    const saved = page.getByRole("status").filter({ hasText: "Fit card saved." });
    await expect(saved).toBeVisible();
    const cardUrl = (await saved.getByRole("link").getAttribute("href"))!;
    const slug = new URL(cardUrl).pathname.split("/").pop()!;

    await page.goto(`/s/${slug}`);
    await expect(page.getByRole("heading", { level: 1, name: "Tires for 225/45R17" })).toBeVisible();
    const panel = page.getByRole("region", { name: "E-mail this card" });
    await expect(panel).toBeVisible();
    await expect(panel.getByText("Nobody has e-mailed this card yet.")).toBeVisible();
    await expectNoAxeViolations(page);

    await panel.getByLabel("Send to").fill("not-an-address");
    await panel.getByRole("button", { name: "Send" }).click();
    await expect(panel.getByText("Enter an e-mail address such as name@example.com.")).toBeVisible();
    await panel.getByLabel("Send to").fill(address);
    await panel.getByLabel(/^Message/).fill("Ask for Ollie at the counter.");
    await panel.getByRole("button", { name: "Send" }).click();
    await expect(panel.getByRole("status")).toContainText(`Sent to ${address}`);
    await expect(panel.getByRole("cell", { name: address })).toBeVisible();

    await expect.poll(() => emailTo(address), { message: "the card reaches the fake inbox" }).not.toBeNull();
    const email = (await emailTo(address))!;
    expect(email.subject).toBe("Your Fit card: tires for 225/45R17");
    expect(email.text).toContain(cardUrl);
    expect(email.text).toContain("Ask for Ollie at the counter.");
    expect(email.html).toContain(`href="${cardUrl}"`);

    const visitor = await browser.newContext();
    const visitorPage = await visitor.newPage();
    await visitorPage.goto(cardUrl);
    await expect(visitorPage.getByRole("heading", { level: 1, name: "Tires for 225/45R17" })).toBeVisible();
    await expect(visitorPage.locator("main")).toContainText("225/40R18");
    await expect(visitorPage.getByText("E-mail this card")).toHaveCount(0);
    await expect(visitorPage.getByText(address)).toHaveCount(0);
    await expectNoAxeViolations(visitorPage);
    // The print view fits on one US Letter sheet: count the page objects of the PDF Chromium prints.
    const printed = (await visitorPage.pdf({ format: "Letter" })).toString("latin1");
    expect(printed.match(/\/Type\s*\/Page[^s]/g)).toHaveLength(1);
    await visitor.close();

    const image = await request.get(`/s/${slug}/opengraph-image`);
    expect(image.status()).toBe(200);
    expect(image.headers()["content-type"]).toBe("image/png");
    const bytes = await image.body();
    // PNG signature, then the IHDR chunk holding width and height as big-endian integers (PNG specification, 5.2 and 11.2.2).
    expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(bytes.subarray(12, 16).toString("ascii")).toBe("IHDR");
    expect([bytes.readUInt32BE(16), bytes.readUInt32BE(20)]).toEqual([1200, 630]);
  });

  test("the Counter's outbox lists what the local e-mail service received", async ({ page }, testInfo) => {
    await page.goto("/counter/outbox");
    await page.getByLabel("E-mail").fill("staff@sidewise.test");
    await page.getByLabel("Password").fill("sidewise-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByRole("heading", { level: 1, name: "Outbox" })).toBeVisible();
    await expect(page.getByRole("heading", { name: "Received by the local e-mail service" })).toBeVisible();
    await expect(page.getByRole("table", { name: /e-mail.*\(times in America\/New_York \(the shop.s time\)\)/ })).toBeVisible();
    // The first test of this project sent a card just before.
    await expect(page.getByText(new RegExp(`card\\.${testInfo.project.name}\\.\\d+@example\\.test`)).first()).toBeVisible();
    await expectNoAxeViolations(page);
  });
});
