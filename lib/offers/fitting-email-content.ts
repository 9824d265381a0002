import { type EmailMessage, paragraph } from "@/lib/email/email-message";
import { formatPrice } from "@/lib/money/money";
import { addressLine } from "@/lib/shop/address";
import { cancelWords, cautionBlock, fittingWhen, lineWords, shopBlock, whatToBringBlocks } from "./email-parts";
import type { BookedOfferFacts } from "./offer-facts";

/** The fitting e-mails: booked and reminded to the driver, booked to the shop. Pure. */

const CALENDAR_NOTE = "The attached calendar file (fitting.ics) puts the fitting in your calendar.";

function placeRows(facts: BookedOfferFacts): [string, string][] {
  return [
    ["When", fittingWhen(facts.fitting, facts.timeZone)],
    ["Where", `${facts.shop.name}, ${addressLine(facts.shop)}`],
    ["Total", formatPrice(facts.estimate.totalCents)],
  ];
}

/** To the driver, when they accept the offer with a fitting time. */
export function fittingBookedEmail(facts: BookedOfferFacts, now: Date): EmailMessage {
  return {
    subject: `Your tire fitting at ${facts.shop.name}: ${fittingWhen(facts.fitting, facts.timeZone)}`,
    blocks: [
      { kind: "eyebrow", text: facts.shop.name },
      { kind: "title", text: "Your fitting is booked" },
      paragraph(`Hello ${facts.driver.name},`, "the tires below are held for you until your fitting."),
      { kind: "fields", rows: placeRows(facts) },
      { kind: "list", items: facts.lines.map(lineWords) },
      ...whatToBringBlocks(facts.fitting),
      { kind: "heading", text: "If your plans change" },
      paragraph(cancelWords(facts, facts.fitting, now)),
      { kind: "button", label: "Your offer and fitting", href: facts.offerUrl },
      paragraph(CALENDAR_NOTE),
      shopBlock(facts.shop),
      cautionBlock,
    ],
  };
}

/** To the driver, the day before the fitting. */
export function fittingReminderEmail(facts: BookedOfferFacts, now: Date): EmailMessage {
  return {
    subject: `Reminder: your tire fitting tomorrow, ${fittingWhen(facts.fitting, facts.timeZone)}`,
    blocks: [
      { kind: "eyebrow", text: facts.shop.name },
      { kind: "title", text: "Your fitting is tomorrow" },
      paragraph(`Hello ${facts.driver.name},`, `${facts.shop.name} expects you and your ${facts.driver.vehicle} tomorrow.`),
      { kind: "fields", rows: placeRows(facts) },
      { kind: "list", items: facts.lines.map(lineWords) },
      ...whatToBringBlocks(facts.fitting),
      { kind: "heading", text: "If your plans change" },
      paragraph(cancelWords(facts, facts.fitting, now)),
      { kind: "button", label: "Your offer and fitting", href: facts.offerUrl },
      shopBlock(facts.shop),
      cautionBlock,
    ],
  };
}

function driverRows(facts: BookedOfferFacts): [string, string][] {
  return [
    ["Driver", facts.driver.name],
    ["E-mail", facts.driver.email],
    ["Phone", facts.driver.phone ?? "not given"],
    ["Vehicle", facts.driver.vehicle],
    ["When", fittingWhen(facts.fitting, facts.timeZone)],
    ["Bay", String(facts.fitting.bay)],
    ["Total", formatPrice(facts.estimate.totalCents)],
  ];
}

/** To the shop, when a driver books: who, when, which bay and which tires are now held. */
export function fittingBookedShopEmail(facts: BookedOfferFacts): EmailMessage {
  return {
    subject: `Fitting booked: ${facts.driver.name}, ${fittingWhen(facts.fitting, facts.timeZone)} (request #${facts.requestId})`,
    blocks: [
      paragraph(`${facts.driver.name} accepted the offer for request #${facts.requestId} and booked a fitting.`),
      { kind: "fields", rows: driverRows(facts) },
      { kind: "list", items: facts.lines.map(lineWords) },
      paragraph("These tires are held until the end of the fitting's day, unless released sooner.", "Replying to this e-mail writes to the driver."),
      { kind: "button", label: "Open the request in the Counter", href: facts.counterUrl },
      paragraph(CALENDAR_NOTE),
    ],
  };
}

/** To the driver, when the fitting is cancelled (by them or by the shop). */
export function fittingCancelledEmail(facts: BookedOfferFacts): EmailMessage {
  return {
    subject: `Your tire fitting at ${facts.shop.name} is cancelled`,
    blocks: [
      { kind: "eyebrow", text: facts.shop.name },
      { kind: "title", text: "Your fitting is cancelled" },
      paragraph(
        `Hello ${facts.driver.name},`,
        `your tire fitting on ${fittingWhen(facts.fitting, facts.timeZone)} is cancelled, and the tires are no longer held for you.`,
      ),
      paragraph(`To book again or ask about it, phone ${facts.shop.name} at ${facts.shop.phone} or reply to this e-mail.`),
      paragraph("The attached calendar file (fitting.ics) takes the fitting out of your calendar."),
      shopBlock(facts.shop),
    ],
  };
}

/** To the shop, when a fitting is cancelled: the bay and the tires are free again. */
export function fittingCancelledShopEmail(facts: BookedOfferFacts): EmailMessage {
  return {
    subject: `Fitting cancelled: ${facts.driver.name}, ${fittingWhen(facts.fitting, facts.timeZone)} (request #${facts.requestId})`,
    blocks: [
      paragraph(`The fitting for request #${facts.requestId} is cancelled: bay ${facts.fitting.bay} is free at that time, and the tires are no longer held.`),
      { kind: "fields", rows: driverRows(facts) },
      { kind: "list", items: facts.lines.map(lineWords) },
      { kind: "button", label: "Open the request in the Counter", href: facts.counterUrl },
      paragraph("The attached calendar file (fitting.ics) takes the fitting out of a calendar it was added to."),
    ],
  };
}
