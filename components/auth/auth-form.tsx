"use client";

import { useState, type FormEvent, type ReactNode } from "react";
import { checkAccountForm, type FieldErrors } from "@/lib/auth/form-checks";
import { authForms, type AuthFormKind } from "./form-kinds";
import { postAuth } from "./post-auth";
import { fieldClass, FormField } from "@/components/ui/form-field";

/**
 * A sign-in or sign-up form: checked in the browser for a quick answer next to each field, then sent
 * to the sign-in service, which checks again. On success the whole page reloads at `next` (after
 * signing up: at sign-in, which then leads to `next`).
 */
export function AuthForm({ kind, next, children }: { kind: AuthFormKind; next: string; children?: ReactNode }) {
  const { fields, check, endpoint, submitLabel, after } = authForms[kind];
  const [errors, setErrors] = useState<FieldErrors>({});
  const [busy, setBusy] = useState(false);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const checked = checkAccountForm(check, new FormData(event.currentTarget));
    if (!checked.ok) {
      setErrors(checked.errors);
      return;
    }
    setErrors({});
    setBusy(true);
    const result = await postAuth(endpoint, checked.values);
    if (result.ok) {
      window.location.assign(after(next));
      return;
    }
    setBusy(false);
    setErrors({ form: result.message });
  }

  return (
    <form noValidate onSubmit={submit} className="flex max-w-md flex-col gap-4">
      {fields.map((field) => (
        <FormField key={field.name} id={field.name} label={field.label} error={errors[field.name]}>
          {(control) => <input {...control} name={field.name} type={field.type} autoComplete={field.autoComplete} required className={fieldClass} />}
        </FormField>
      ))}
      <div role="alert" className="min-h-6 text-danger">
        {errors.form ?? ""}
      </div>
      <button type="submit" disabled={busy} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
        {busy ? "Please wait…" : submitLabel}
      </button>
      {children}
    </form>
  );
}
