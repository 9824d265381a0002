import { describe, expect, it } from "vitest";
import { checkAccountForm, PASSWORD_LENGTH } from "@/lib/auth/form-checks";

const form = (fields: Record<string, string>) => {
  const data = new FormData();
  for (const [name, value] of Object.entries(fields)) data.set(name, value);
  return data;
};

describe("the account forms' checks in the browser", () => {
  it("passes a good sign-up, trimming the name", () => {
    expect(checkAccountForm("signUp", form({ name: "  Rosa Iverley ", email: "rosa@example.test", password: "long enough" }))).toEqual({
      ok: true,
      values: { name: "Rosa Iverley", email: "rosa@example.test", password: "long enough" },
    });
  });

  it("names each wrong field once, with what to do", () => {
    const checked = checkAccountForm("signUp", form({ name: " ", email: "rosa@", password: "short" }));
    expect(checked).toEqual({
      ok: false,
      errors: { name: "Enter your name.", email: "Enter an e-mail address, like name@example.com.", password: `Use at least ${PASSWORD_LENGTH.min} characters.` },
    });
  });

  it("asks for a password at sign-in without judging its length, and for the fields a form lacks", () => {
    expect(checkAccountForm("signIn", form({ email: "rosa@example.test", password: "x" })).ok).toBe(true);
    expect(checkAccountForm("signIn", form({}))).toEqual({
      ok: false,
      errors: { email: "Enter an e-mail address, like name@example.com.", password: "Enter your password." },
    });
  });

  it("refuses a name with a control character and an over-long password", () => {
    const checked = checkAccountForm("signUp", form({ name: "Rosa\u0000", email: "rosa@example.test", password: "p".repeat(PASSWORD_LENGTH.max + 1) }));
    expect(checked.ok ? {} : checked.errors).toEqual({
      name: "Remove the control characters (such as NUL) from this text",
      password: `Use at most ${PASSWORD_LENGTH.max} characters.`,
    });
  });

  it("wants the same new password twice when resetting", () => {
    expect(checkAccountForm("resetPassword", form({ newPassword: "new password", confirmPassword: "new passwort" }))).toEqual({
      ok: false,
      errors: { confirmPassword: "The two passwords differ. Type the same new password in both fields." },
    });
    expect(checkAccountForm("resetPassword", form({ newPassword: "new password", confirmPassword: "new password" })).ok).toBe(true);
  });
});
