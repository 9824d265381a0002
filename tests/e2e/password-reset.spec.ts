import { expect, test } from "./helpers/test";
import { expectNoAxeViolations } from "./helpers/axe";

const inboxUrl = `${process.env.E2E_FAKE_RESEND_URL ?? "http://127.0.0.1:3226"}/emails`;

interface ReceivedEmail {
  to: string | string[];
  subject: string;
  text?: string;
}

/** The reset link of the newest e-mail the fake e-mail service received for that address. */
async function resetLinkFor(address: string): Promise<string | null> {
  const response = await fetch(inboxUrl);
  const { data } = (await response.json()) as { data: ReceivedEmail[] };
  const email = data.find((received) => received.to === address && received.subject === "Reset your Sidewise password");
  return /https?:\/\/\S+\/api\/auth\/reset-password\/\S+/.exec(email?.text ?? "")?.[0] ?? null;
}

test.describe("password reset", () => {
  test("a person who forgot their password gets a link by e-mail, sets a new one and signs in with it", async ({ page, playwright, baseURL }, testInfo) => {
    test.slow(); // six pages, two accessibility scans and two password hashes in one journey
    const address = `reset.${testInfo.project.name}.${Date.now()}@example.test`;
    const api = await playwright.request.newContext({ baseURL, extraHTTPHeaders: { origin: baseURL! } });
    const signUp = await api.post("/api/auth/sign-up/email", { data: { name: "Tova Reyes", email: address, password: "forgotten-password" } });
    expect(signUp.status()).toBe(200);
    await api.dispose();

    await page.goto("/sign-in");
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await expect(page.getByRole("heading", { level: 1, name: "Forgot your password?" })).toBeVisible();
    await expectNoAxeViolations(page);
    await page.getByRole("button", { name: "Send me a link" }).click();
    await expect(page.getByText("Enter an e-mail address")).toBeVisible();
    await page.getByLabel("E-mail").fill(address);
    await page.getByRole("button", { name: "Send me a link" }).click();
    await expect(page.getByRole("status")).toContainText(`If an account uses ${address}, we've sent a link to it.`);

    await expect.poll(() => resetLinkFor(address), { message: "the reset e-mail reaches the fake inbox" }).not.toBeNull();
    await page.goto((await resetLinkFor(address))!);
    await expect(page).toHaveURL(/\/reset-password\?token=/);
    await expect(page.getByRole("heading", { level: 1, name: "Choose a new password" })).toBeVisible();
    await expectNoAxeViolations(page);

    await page.getByLabel("New password (at least 8 characters)").fill("remembered-password");
    await page.getByLabel("New password again").fill("remembered-passwort");
    await page.getByRole("button", { name: "Set the new password" }).click();
    await expect(page.getByText("The two passwords differ.")).toBeVisible();
    await page.getByLabel("New password again").fill("remembered-password");
    await page.getByRole("button", { name: "Set the new password" }).click();

    await expect(page).toHaveURL(/\/sign-in\?reset=done$/);
    await expect(page.getByRole("status")).toHaveText("Your password is changed. Sign in with the new one.");
    await page.getByLabel("E-mail").fill(address);
    await page.getByLabel("Password").fill("remembered-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page).toHaveURL(/\/account$/);
    await expect(page.getByText(address)).toBeVisible();
  });

  test("a used or expired link says so and offers a new one", async ({ page }) => {
    await page.goto("/reset-password?error=INVALID_TOKEN");
    await expect(page.getByRole("heading", { level: 1, name: "This link no longer works" })).toBeVisible();
    await expectNoAxeViolations(page);
    await page.getByRole("link", { name: "Ask for a new link" }).click();
    await expect(page).toHaveURL(/\/forgot-password$/);
  });
});
