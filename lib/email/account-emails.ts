import { type EmailMessage, paragraph } from "./email-message";

export const RESET_LINK_LIFETIME_SECONDS = 60 * 60;

const greeting = (name: string) => (name.trim() ? `Hello ${name.trim()},` : "Hello,");

/** The e-mail carrying a password-reset link, in plain words. */
export function passwordResetEmail({ name, link }: { name: string; link: string }): EmailMessage {
  return {
    subject: "Reset your Sidewise password",
    blocks: [
      paragraph(greeting(name)),
      paragraph("Someone asked to reset the password of your Sidewise account. To choose a new password, open this link:"),
      { kind: "button", label: "Choose a new password", href: link },
      paragraph(`The link works once, for ${RESET_LINK_LIFETIME_SECONDS / 60} minutes.`),
      paragraph("If you didn't ask for this, ignore this e-mail: your password stays as it is."),
      paragraph("Sidewise"),
    ],
  };
}

/**
 * To the owner of an address someone tried to sign up with: the sign-up page answers the same as
 * for a new address, so that it never tells a stranger who has an account; the owner hears it here.
 * It carries no link that signs anyone in.
 */
export function accountExistsEmail({ name, signInUrl, forgotPasswordUrl }: { name: string; signInUrl: string; forgotPasswordUrl: string }): EmailMessage {
  return {
    subject: "Your Sidewise account already exists",
    blocks: [
      paragraph(greeting(name)),
      paragraph("Someone tried to create a Sidewise account with this e-mail address, which already has one. Nothing was changed."),
      paragraph(`If it was you, sign in: ${signInUrl}`, `Forgotten the password? Ask for a new one: ${forgotPasswordUrl}`),
      paragraph("If it wasn't you, ignore this e-mail."),
      paragraph("Sidewise"),
    ],
  };
}
