import { escapeHtml } from "./escape-html";

export const RESET_LINK_LIFETIME_SECONDS = 60 * 60;

/** The e-mail carrying a password-reset link, in plain words, as text and as simple HTML. */
export function passwordResetEmail({ name, link }: { name: string; link: string }) {
  const minutes = RESET_LINK_LIFETIME_SECONDS / 60;
  const greeting = name.trim() ? `Hello ${name.trim()},` : "Hello,";
  const lines = [
    greeting,
    "",
    "Someone asked to reset the password of your Sidewise account. To choose a new password, open this link:",
    "",
    link,
    "",
    `The link works once, for ${minutes} minutes.`,
    "",
    "If you didn't ask for this, ignore this e-mail: your password stays as it is.",
    "",
    "Sidewise",
  ];
  const html = [
    `<p>${escapeHtml(greeting)}</p>`,
    "<p>Someone asked to reset the password of your Sidewise account. To choose a new password, open this link:</p>",
    `<p><a href="${escapeHtml(link)}">Choose a new password</a></p>`,
    `<p>The link works once, for ${minutes} minutes.</p>`,
    "<p>If you didn't ask for this, ignore this e-mail: your password stays as it is.</p>",
    "<p>Sidewise</p>",
  ].join("\n");
  return { subject: "Reset your Sidewise password", text: lines.join("\n"), html };
}
