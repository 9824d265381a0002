import { type EmailBlock, type EmailMessage, paragraph } from "@/lib/email/email-message";
import { breakdownBlock, cautionBlock, lineWords, localDateWords, shopBlock } from "./email-parts";
import type { OfferFacts } from "./offer-facts";

/**
 * To the driver: the shop's priced offer, the tires line by line, the frozen breakdown, how long it
 * holds, the staff's note and the link to the offer page, where a fitting time is picked.
 */
export function offerEmail(facts: OfferFacts): EmailMessage {
  const note: EmailBlock[] = facts.message.trim() ? [{ kind: "note", title: `A note from ${facts.shop.name}`, text: facts.message.trim() }] : [];
  return {
    subject: `Your tire price from ${facts.shop.name} (request #${facts.requestId})`,
    blocks: [
      { kind: "eyebrow", text: facts.shop.name },
      { kind: "title", text: "Your price, ready to book" },
      paragraph(`Hello ${facts.driver.name},`),
      paragraph(`${facts.shop.name} offers these tires for your ${facts.driver.vehicle}:`),
      { kind: "list", items: facts.lines.map(lineWords) },
      { kind: "heading", text: "Out the door" },
      breakdownBlock(facts.estimate),
      paragraph(
        `This price holds until the end of ${localDateWords(facts.validUntilDate)} (the shop's time, ${facts.timeZone}).`,
        "To accept it, pick a fitting time on the offer page; the tires are then held for you until your fitting.",
      ),
      ...note,
      { kind: "button", label: "See the offer and pick a time", href: facts.offerUrl },
      paragraph("Anyone with this link can open the offer: keep the e-mail to yourself."),
      shopBlock(facts.shop),
      cautionBlock,
    ],
  };
}
