/** The two account forms: their fields, their checks, the sign-in service's endpoint each posts to and where each goes next. */
export const authForms = {
  "sign-in": {
    check: "signIn",
    endpoint: "sign-in/email",
    submitLabel: "Sign in",
    after: (next: string) => next,
    fields: [
      { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
      { name: "password", label: "Password", type: "password", autoComplete: "current-password" },
    ],
  },
  "sign-up": {
    check: "signUp",
    endpoint: "sign-up/email",
    submitLabel: "Create account",
    // Sign-up signs no one in and answers a taken address like a new one, so it continues at sign-in.
    after: (next: string) => `/sign-in?signedUp=1&next=${encodeURIComponent(next)}`,
    fields: [
      { name: "name", label: "Name", type: "text", autoComplete: "name" },
      { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
      { name: "password", label: "Password (at least 8 characters)", type: "password", autoComplete: "new-password" },
    ],
  },
} as const;

export type AuthFormKind = keyof typeof authForms;
