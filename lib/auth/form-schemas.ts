import { z } from "zod";
import { lineText } from "@/lib/validation/text";

/** The one password rule: sign-up, resets and accounts an admin creates. */
export const PASSWORD_LENGTH = { min: 8, max: 128 } as const;

const email = z.email("Enter an e-mail address, like name@example.com.").max(254);
const password = z
  .string()
  .min(PASSWORD_LENGTH.min, `Use at least ${PASSWORD_LENGTH.min} characters.`)
  .max(PASSWORD_LENGTH.max, `Use at most ${PASSWORD_LENGTH.max} characters.`);

export const signInSchema = z.object({ email, password: z.string().min(1, "Enter your password.") });
export const signUpSchema = z.object({ name: lineText().trim().min(1, "Enter your name.").max(100), email, password });

export type FieldErrors = Partial<Record<string, string>>;

/** The first problem of each field, for showing next to it. */
export function fieldErrors(error: z.ZodError): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of error.issues) {
    const field = String(issue.path[0] ?? "form");
    errors[field] ??= issue.message;
  }
  return errors;
}
