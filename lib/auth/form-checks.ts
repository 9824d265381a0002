import { CONTROL_CHARACTER_MESSAGE, hasControlCharacters } from "@/lib/validation/text-rules";

/**
 * The account forms' checks (sign-in, sign-up, forgot and reset password), run in the browser for a
 * quick answer beside each field; the sign-in service checks again. Plain functions rather than zod,
 * so the sign-in pages do not ship a validation library.
 */

/** The one password rule: sign-up, resets and accounts an admin creates. */
export const PASSWORD_LENGTH = { min: 8, max: 128 } as const;

export type FieldErrors = Partial<Record<string, string>>;

/** A field's check: the message to show beside it, or undefined when the value will do. */
type FieldCheck = (value: string, values: Readonly<Record<string, string>>) => string | undefined;

// The pattern zod 4's z.email() applies by default, which these forms used before.
const EMAIL_PATTERN = /^(?!\.)(?!.*\.\.)([A-Za-z0-9_'+\-.]*)[A-Za-z0-9_+-]@([A-Za-z0-9][A-Za-z0-9-]*\.)+[A-Za-z]{2,}$/;
const EMAIL_MAX_LENGTH = 254;

const email: FieldCheck = (value) => {
  if (!EMAIL_PATTERN.test(value)) return "Enter an e-mail address, like name@example.com.";
  if (value.length > EMAIL_MAX_LENGTH) return `An e-mail address has at most ${EMAIL_MAX_LENGTH} characters.`;
};

const newPassword: FieldCheck = (value) => {
  if (value.length < PASSWORD_LENGTH.min) return `Use at least ${PASSWORD_LENGTH.min} characters.`;
  if (value.length > PASSWORD_LENGTH.max) return `Use at most ${PASSWORD_LENGTH.max} characters.`;
};

const name: FieldCheck = (value) => {
  if (value.trim() === "") return "Enter your name.";
  if (value.trim().length > 100) return "Keep the name to 100 characters or fewer.";
  if (hasControlCharacters(value)) return CONTROL_CHARACTER_MESSAGE;
};

const formChecks = {
  signIn: { email, password: (value) => (value === "" ? "Enter your password." : undefined) },
  signUp: { name, email, password: newPassword },
  forgotPassword: { email },
  resetPassword: {
    newPassword,
    confirmPassword: (value, values) => {
      if (value === "") return "Type the new password again.";
      if (value !== values.newPassword) return "The two passwords differ. Type the same new password in both fields.";
    },
  },
} satisfies Record<string, Record<string, FieldCheck>>;

export type AccountForm = keyof typeof formChecks;

export type CheckedForm<Form extends AccountForm> = { ok: true; values: Record<keyof (typeof formChecks)[Form], string> } | { ok: false; errors: FieldErrors };

/** Checks a form's fields; the values come back with the name trimmed, as the service stores it. */
export function checkAccountForm<Form extends AccountForm>(form: Form, data: FormData): CheckedForm<Form> {
  const checks: Record<string, FieldCheck> = formChecks[form];
  const values: Record<string, string> = {};
  for (const field of Object.keys(checks)) values[field] = String(data.get(field) ?? "");
  const errors: FieldErrors = {};
  for (const [field, check] of Object.entries(checks)) {
    const message = check(values[field]!, values);
    if (message) errors[field] = message;
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  if (values.name !== undefined) values.name = values.name.trim();
  return { ok: true, values: values as Record<keyof (typeof formChecks)[Form], string> };
}
