import { describe, expect, it } from "vitest";
import { passwordResetEmail } from "@/lib/email/account-emails";
import { renderEmail } from "@/lib/email/render-email";

describe("the password-reset e-mail", () => {
  const link = "http://localhost:3000/api/auth/reset-password/abc?callbackURL=%2Freset-password";

  it("says in plain words what the link does, how long it works and what to do if unasked", async () => {
    const email = await renderEmail(passwordResetEmail({ name: "Ada Quill", link }));
    expect(email.subject).toBe("Reset your Sidewise password");
    expect(email.text).toContain("Hello Ada Quill,");
    expect(email.text).toContain(link);
    expect(email.text).toContain("for 60 minutes");
    expect(email.text).toContain("If you didn't ask for this, ignore this e-mail");
  });

  it("escapes the name and the link in the HTML part", async () => {
    const email = await renderEmail(passwordResetEmail({ name: "<b>Ada</b>", link: `${link}&x="y"` }));
    expect(email.html).toContain("&lt;b&gt;Ada&lt;/b&gt;");
    expect(email.html).toContain('href="http://localhost:3000/api/auth/reset-password/abc?callbackURL=%2Freset-password&amp;x=&quot;y&quot;"');
  });
});
