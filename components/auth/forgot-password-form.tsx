"use client";

import { useState, type FormEvent } from "react";
import { checkAccountForm, type FieldErrors } from "@/lib/auth/form-checks";
import { RESET_LINK_LIFETIME_SECONDS } from "@/lib/email/account-emails";
import { postAuth } from "./post-auth";
import { fieldClass, FormField } from "@/components/ui/form-field";

/** Asks for a reset link. The answer is the same whether or not an account uses the address. */
export function ForgotPasswordForm() {
  const [errors, setErrors] = useState<FieldErrors>({});
  const [busy, setBusy] = useState(false);
  const [sentTo, setSentTo] = useState<string | null>(null);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const checked = checkAccountForm("forgotPassword", new FormData(event.currentTarget));
    if (!checked.ok) {
      setErrors(checked.errors);
      return;
    }
    setErrors({});
    setBusy(true);
    const result = await postAuth("request-password-reset", { email: checked.values.email, redirectTo: "/reset-password" });
    setBusy(false);
    if (result.ok) setSentTo(checked.values.email);
    else setErrors({ form: result.message });
  }

  return (
    <form noValidate onSubmit={submit} className="flex max-w-md flex-col gap-4">
      <FormField id="email" label="E-mail" error={errors.email}>
        {(control) => <input {...control} name="email" type="email" autoComplete="email" required className={fieldClass} />}
      </FormField>
      <div role="status" className={sentTo ? "rounded border border-accent bg-accent-soft px-4 py-3" : undefined}>
        {sentTo ? (
          <>
            <p className="font-semibold">If an account uses {sentTo}, we&apos;ve sent a link to it.</p>
            <p className="mt-1">The link works for {RESET_LINK_LIFETIME_SECONDS / 60} minutes. Nothing there? Check the spam folder, or the address, and ask again.</p>
          </>
        ) : null}
      </div>
      <div role="alert" className="min-h-6 text-danger">
        {errors.form ?? ""}
      </div>
      <button type="submit" disabled={busy} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
        {busy ? "Please wait…" : sentTo ? "Send the link again" : "Send me a link"}
      </button>
    </form>
  );
}
