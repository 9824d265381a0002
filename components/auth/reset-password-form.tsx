"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { checkAccountForm, type FieldErrors } from "@/lib/auth/form-checks";
import { postAuth } from "./post-auth";
import { fieldClass, FormField } from "@/components/ui/form-field";

/** Sets a new password with the token from a reset link, then sends the person to sign in with it. */
export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const [errors, setErrors] = useState<FieldErrors>({});
  const [busy, setBusy] = useState(false);
  const [linkRefused, setLinkRefused] = useState(false);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const checked = checkAccountForm("resetPassword", new FormData(event.currentTarget));
    if (!checked.ok) {
      setErrors(checked.errors);
      return;
    }
    setErrors({});
    setBusy(true);
    const result = await postAuth("reset-password", { newPassword: checked.values.newPassword, token });
    if (result.ok) {
      router.push("/sign-in?reset=done");
      return;
    }
    setBusy(false);
    if (result.code === "INVALID_TOKEN") setLinkRefused(true);
    else setErrors({ form: result.message });
  }

  return (
    <form noValidate onSubmit={submit} className="flex max-w-md flex-col gap-4">
      <FormField id="newPassword" label="New password (at least 8 characters)" error={errors.newPassword}>
        {(control) => <input {...control} name="newPassword" type="password" autoComplete="new-password" required className={fieldClass} />}
      </FormField>
      <FormField id="confirmPassword" label="New password again" error={errors.confirmPassword}>
        {(control) => <input {...control} name="confirmPassword" type="password" autoComplete="new-password" required className={fieldClass} />}
      </FormField>
      <div role="alert" className="min-h-6 text-danger">
        {linkRefused ? (
          <>
            This link has expired or was already used.{" "}
            <Link href="/forgot-password" className="inline-flex min-h-11 items-center font-semibold underline underline-offset-4">
              Ask for a new link
            </Link>
            .
          </>
        ) : (
          (errors.form ?? "")
        )}
      </div>
      <button type="submit" disabled={busy} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
        {busy ? "Please wait…" : "Set the new password"}
      </button>
    </form>
  );
}
