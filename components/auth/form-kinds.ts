import { signInSchema, signUpSchema } from "@/lib/auth/form-schemas";

/** The two account forms: their fields, their checks and the sign-in service's endpoint each posts to. */
export const authForms = {
  "sign-in": {
    schema: signInSchema,
    endpoint: "sign-in/email",
    submitLabel: "Sign in",
    fields: [
      { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
      { name: "password", label: "Password", type: "password", autoComplete: "current-password" },
    ],
  },
  "sign-up": {
    schema: signUpSchema,
    endpoint: "sign-up/email",
    submitLabel: "Create account",
    fields: [
      { name: "name", label: "Name", type: "text", autoComplete: "name" },
      { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
      { name: "password", label: "Password (at least 8 characters)", type: "password", autoComplete: "new-password" },
    ],
  },
} as const;

export type AuthFormKind = keyof typeof authForms;
