import { expect, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";
import { emailsTo } from "./helpers/inbox";
import { waitUntilTheFormIsOldEnough } from "./helpers/quote-form";

test.describe("Ask the shop", () => {
  test("a driver asks from a Size sheet; staff answer from the Counter inbox and the reply is e-mailed", async ({ page }, testInfo) => {
    test.slow(); // two roles, four accessibility scans and three e-mails in one journey
    const stamp = `${testInfo.project.name}.${Date.now()}`;
    const driver = `driver.${stamp}@example.test`;

    await page.goto("/size/235-65R17");
    await page.getByRole("button", { name: "Ask the shop for a price" }).click();
    const tires = page.getByLabel("Tires or size");
    await expect(tires).toHaveValue("235/65R17");
    await expectNoAxeViolations(page);

    await page.getByRole("button", { name: "Send the request" }).click();
    await expect(page.getByLabel("Your name")).toBeFocused();
    await expect(page.getByLabel("Your name")).toHaveAttribute("aria-invalid", "true");
    await expect(page.getByText("Type your name so the shop knows who is asking")).toBeVisible();
    await expect(page.getByText("Check the e-mail address", { exact: false })).toHaveCount(0);
    await expectNoAxeViolations(page);

    await page.getByLabel("Your name").fill(`Tova Reyes ${stamp}`);
    await page.getByLabel("E-mail (the answer goes here)").fill(driver);
    await page.getByLabel("Vehicle").fill("2019 family SUV");
    await page.getByLabel(/How many tires/).fill("4");
    await waitUntilTheFormIsOldEnough(page);
    await page.getByRole("button", { name: "Send the request" }).click();
    const done = page.getByRole("status").filter({ hasText: "Your request is with the shop" });
    await expect(done).toContainText(driver);
    const number = /number (\d+)/.exec(await done.innerText())?.[1];
    expect(number).toBeDefined();
    await expect.poll(async () => (await emailsTo(driver)).map((email) => email.subject)).toContain(`We have your price request (#${number})`);

    await page.goto("/counter/requests");
    await page.getByLabel("E-mail").fill("staff@sidewise.test");
    await page.getByLabel("Password").fill("sidewise-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByRole("heading", { level: 1, name: "Price requests" })).toBeVisible();
    await page.getByRole("link", { name: /^New \d+$/ }).click();
    await expect(page).toHaveURL(/\/counter\/requests\?status=new$/);
    await expectNoAxeViolations(page);

    await page.getByRole("link", { name: `#${number} · Tova Reyes ${stamp}` }).click();
    await expect(page.getByRole("heading", { level: 1, name: `Tova Reyes ${stamp} asks for a price` })).toBeVisible();
    await expect(page.getByText("No reply yet.")).toBeVisible();
    await expectNoAxeViolations(page);

    await page.getByRole("button", { name: "Send the reply" }).click();
    await expect(page.getByText("Write the reply before sending it.")).toBeVisible();
    await page.getByLabel(`Reply to ${driver}`).fill("We have four in stock at $129 each.\nThursday at 10 works for fitting.");
    await page.getByRole("button", { name: "Send the reply" }).click();
    await expect(page.getByText("Reply sent by e-mail and kept with the request.")).toBeVisible();
    await expect(page.getByRole("listitem").filter({ hasText: "Thursday at 10 works for fitting." })).toContainText("e-mailed");
    await expect(page.getByText("Answered", { exact: true })).toBeVisible();

    await expect
      .poll(async () => (await emailsTo(driver)).find((email) => email.subject === `About your price request (#${number})`)?.text ?? "")
      .toContain("Thursday at 10 works for fitting.");

    await page.getByRole("button", { name: "Close" }).click();
    await expect(page.getByText("Request marked closed.")).toBeVisible();
    await expect(page.getByRole("button", { name: "Reopen" })).toBeVisible();
  });
});
