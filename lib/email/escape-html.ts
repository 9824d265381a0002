const replacements: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

/** Makes text safe to place inside HTML, in an element or an attribute. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (character) => replacements[character] ?? character);
}
