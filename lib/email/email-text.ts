import type { EmailBlock, EmailMessage } from "./email-message";

function blockText(block: EmailBlock): string | null {
  switch (block.kind) {
    case "eyebrow":
      return null;
    case "title":
    case "heading":
    case "caution":
      return block.text;
    case "paragraph":
      return block.lines.join("\n");
    case "button":
      return block.href;
    case "list":
      return block.items.map((item) => `- ${item}`).join("\n");
    case "fields":
      return block.rows.map(([label, value]) => `${label}: ${value}`).join("\n");
    case "note":
      return `${block.title}:\n${block.text}`;
  }
}

/** The plain-text version of an e-mail, for mail programs that show no HTML: one paragraph a block. */
export function emailText(message: EmailMessage): string {
  return message.blocks
    .map(blockText)
    .filter((text): text is string => text !== null && text !== "")
    .join("\n\n");
}
