import type { EmailBlock, EmailMessage } from "./email-message";
import { paragraph } from "./email-message";
import type { FitCardEmailContent } from "./fit-card-email-content";

/** The Fit card e-mail: the card's link first, then the shop's note, the sizes, the tires, the shop and the caution. */
export function fitCardEmail(content: FitCardEmailContent): EmailMessage {
  const blocks: EmailBlock[] = [
    { kind: "eyebrow", text: "Fit card" },
    { kind: "title", text: `Tires for ${content.original}` },
    paragraph("Hello,", "Here is the Fit card the shop saved for you. Open it to see the sizes drawn to scale:"),
    { kind: "button", label: "Open your Fit card", href: content.link },
  ];
  if (content.message) blocks.push({ kind: "note", title: "A note from the shop", text: content.message });
  blocks.push(
    { kind: "heading", text: "The sizes" },
    { kind: "list", items: [`The tire on the car: ${content.original}`, ...content.otherSizes.map((size) => `Also compared: ${size.designation} (${size.diameterChange})`)] },
  );
  if (content.tires.length > 0) {
    blocks.push({ kind: "heading", text: "Tires picked for you" }, { kind: "list", items: content.tires.map((tire) => `${tire.name}, ${tire.marking}: ${tire.price}`) });
  }
  if (content.shop) {
    blocks.push({ kind: "heading", text: content.shop.name }, paragraph(content.shop.address, `${content.shop.phone} · ${content.shop.email}`, content.shop.hours));
  }
  blocks.push({ kind: "caution", text: content.caution });
  return { subject: content.subject, blocks };
}
