/** What the Outbox shows instead of a link that would let its reader in. */
export const HIDDEN_LINK = "[link hidden: it signs its reader in or sets a password, so only the recipient may see it]";

const LINK_PATTERN = /https?:\/\/[^\s<>"')]+/g;
const SECRET_PARAMETERS = new Set(["token", "code", "otp", "key", "secret", "signature", "sig", "session"]);

/**
 * Whether a link carries something that acts for its recipient: a sign-in service address
 * (/api/auth/…, such as a password-reset link), a reset page, or a token-like query parameter.
 * An unreadable link counts as secret: hiding one too many is the safe mistake.
 */
export function isSecretLink(link: string): boolean {
  let url: URL;
  try {
    url = new URL(link);
  } catch {
    return true;
  }
  const path = url.pathname.toLowerCase();
  if (path.startsWith("/api/auth/") || path.includes("reset-password")) return true;
  return [...url.searchParams.keys()].some((name) => SECRET_PARAMETERS.has(name.toLowerCase()));
}

/** The text with every secret link replaced by HIDDEN_LINK. */
export function redactSecretLinks(text: string): string {
  return text.replace(LINK_PATTERN, (link) => (isSecretLink(link) ? HIDDEN_LINK : link));
}

/** The links of a text worth showing staff: those that are not secret, each once. */
export function visibleLinks(text: string): string[] {
  return [...new Set((text.match(LINK_PATTERN) ?? []).filter((link) => !isSecretLink(link)))];
}
