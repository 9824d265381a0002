import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { readDevOutbox } from "@/lib/email/dev-outbox";
import { HIDDEN_LINK, isSecretLink, redactSecretLinks } from "@/lib/email/redact-links";
import { sendEmail } from "@/lib/email/send-email";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { APP_ORIGIN } from "../integration/helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

describe("which links the Outbox hides", () => {
  it("hides the sign-in service's links, reset pages and any link with a token-like parameter", () => {
    for (const link of [
      "http://localhost:3000/api/auth/reset-password/AbC123xyz?callbackURL=%2Freset-password",
      "http://localhost:3000/reset-password?token=AbC123xyz",
      "https://shop.example/api/auth/verify-email?token=abc",
      "https://shop.example/welcome?Token=abc",
      "https://shop.example/welcome?code=abc",
      "https://shop.example/magic?otp=123456",
    ]) {
      expect(isSecretLink(link), link).toBe(true);
    }
  });

  it("keeps what customers were sent to look at: Fit cards, size sheets, the shop's pages", () => {
    for (const link of ["http://localhost:3000/s/AbCdEfGhIjKlMnOpQrStUvWx", "http://localhost:3000/size/285-50R20", "http://localhost:3000/counter/requests/12", "http://localhost:3000/sign-in"]) {
      expect(isSecretLink(link), link).toBe(false);
    }
  });

  it("replaces each hidden link inside the text and leaves the rest as it was", () => {
    const text = "Open http://localhost:3000/api/auth/reset-password/SECRET1?callbackURL=%2F\nor see http://localhost:3000/s/AbCdEfGhIjKlMnOpQrStUvWx";
    expect(redactSecretLinks(text)).toBe(`Open ${HIDDEN_LINK}\nor see http://localhost:3000/s/AbCdEfGhIjKlMnOpQrStUvWx`);
  });
});

describe("the Outbox in local e-mail mode", () => {
  let fake: FakeResend;
  beforeAll(async () => {
    fake = await startFakeResend({ port: 0 });
    vi.stubEnv("RESEND_BASE_URL", fake.url);
    vi.stubEnv("RESEND_API_KEY", "");
    vi.stubEnv("DATABASE_URL", "");
    vi.stubEnv("PGLITE_DATA_DIR", "memory://");
    vi.stubEnv("DEMO_SEED", "off");
    await seedDemoAccounts(await getDb());
  });
  afterAll(async () => {
    await (await getDatabaseHandle()).close();
    await fake.close();
    vi.unstubAllEnvs();
  });

  it("shows staff that the admin was sent a reset e-mail, never the link that would let them take the account", async () => {
    const asked = await authPost(
      new NextRequest(`${APP_ORIGIN}/api/auth/request-password-reset`, {
        method: "POST",
        headers: { origin: APP_ORIGIN, "content-type": "application/json" },
        body: JSON.stringify({ email: "admin@sidewise.test", redirectTo: "/reset-password" }),
      }),
    );
    expect(asked.status).toBe(200);
    await sendEmail({ to: "rosa@example.test", subject: "Your Fit card", text: "Open http://localhost:3000/s/AbCdEfGhIjKlMnOpQrStUvWx" });
    let token: string | undefined;
    for (let attempt = 0; attempt < 200 && !token; attempt += 1) {
      token = /\/api\/auth\/reset-password\/([A-Za-z0-9_-]+)/.exec(fake.received().map((email) => String(email.text)).join("\n"))?.[1];
      if (!token) await new Promise((resolve) => setTimeout(resolve, 20));
    }
    expect(token).toBeTruthy();

    const outbox = await readDevOutbox();
    if (outbox.status !== "ok") throw new Error(`the outbox did not read the fake: ${outbox.status}`);
    expect(JSON.stringify(outbox)).not.toContain(token);
    const reset = outbox.emails.find((email) => email.subject === "Reset your Sidewise password")!;
    expect(reset.to).toBe("admin@sidewise.test");
    expect(reset.text).toContain(HIDDEN_LINK);
    expect(reset.links).toEqual([]);
    expect(outbox.emails.find((email) => email.subject === "Your Fit card")!.links).toEqual(["http://localhost:3000/s/AbCdEfGhIjKlMnOpQrStUvWx"]);
  });

  it("names an e-mail's attachments without showing their content", async () => {
    const content = Buffer.from("BEGIN:VCALENDAR\r\nEND:VCALENDAR\r\n");
    await sendEmail({ to: "rosa@example.test", subject: "Your tire fitting", text: "See you then.", attachments: [{ filename: "fitting.ics", content, contentType: "text/calendar" }] });
    const outbox = await readDevOutbox();
    if (outbox.status !== "ok") throw new Error(`the outbox did not read the fake: ${outbox.status}`);
    const fitting = outbox.emails.find((email) => email.subject === "Your tire fitting")!;
    expect(fitting.attachments).toEqual(["fitting.ics"]);
    expect(JSON.stringify(outbox)).not.toContain(content.toString("base64"));
  });
});
