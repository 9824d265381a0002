import { z } from "zod";

const email = z.email("Enter an e-mail address, like name@example.com.").max(254);
const password = z.string().min(8, "Use at least 8 characters.").max(128, "Use at most 128 characters.");

export const signInSchema = z.object({ email, password: z.string().min(1, "Enter your password.") });
export const signUpSchema = z.object({ name: z.string().trim().min(1, "Enter your name.").max(100), email, password });

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
