import { escapeHtml } from "./escape-html";

/**
 * To the owner of an address someone tried to sign up with: the sign-up page answers the same as
 * for a new address, so that it never tells a stranger who has an account; the owner hears it here.
 * It carries no link that signs anyone in.
 */
export function accountExistsEmail({ name, signInUrl, forgotPasswordUrl }: { name: string; signInUrl: string; forgotPasswordUrl: string }) {
  const greeting = name.trim() ? `Hello ${name.trim()},` : "Hello,";
  const lines = [
    greeting,
    "",
    "Someone tried to create a Sidewise account with this e-mail address, which already has one. Nothing was changed.",
    "",
    `If it was you, sign in: ${signInUrl}`,
    `Forgotten the password? Ask for a new one: ${forgotPasswordUrl}`,
    "",
    "If it wasn't you, ignore this e-mail.",
    "",
    "Sidewise",
  ];
  const html = [
    `<p>${escapeHtml(greeting)}</p>`,
    "<p>Someone tried to create a Sidewise account with this e-mail address, which already has one. Nothing was changed.</p>",
    `<p>If it was you, <a href="${escapeHtml(signInUrl)}">sign in</a>. Forgotten the password? <a href="${escapeHtml(forgotPasswordUrl)}">Ask for a new one</a>.</p>`,
    "<p>If it wasn't you, ignore this e-mail.</p>",
    "<p>Sidewise</p>",
  ].join("\n");
  return { subject: "Your Sidewise account already exists", text: lines.join("\n"), html };
}
