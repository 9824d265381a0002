import type { EmailAttachment } from "@/lib/email/send-email";
import { fittingCalendar } from "@/lib/fittings";
import { addressLine } from "@/lib/shop/address";
import { lineWords } from "./email-parts";
import type { BookedOfferFacts } from "./offer-facts";

export const CALENDAR_FILENAME = "fitting.ics";

/** One UID for a fitting across every calendar object sent for it, so a CANCEL or an update replaces the entry. */
export const fittingUid = (facts: Pick<BookedOfferFacts, "offerId" | "host">): string => `fitting-${facts.offerId}@${facts.host}`;

/**
 * The fitting as an iCalendar attachment: PUBLISH puts it in a calendar, CANCEL takes it out. Both
 * carry the offer's calendarSequence, which the caller raises before sending a change. Pure.
 */
export function fittingCalendarAttachment(facts: BookedOfferFacts, method: "PUBLISH" | "CANCEL", stamp: Date): EmailAttachment {
  const text = fittingCalendar({
    method,
    uid: fittingUid(facts),
    sequence: facts.fitting.calendarSequence,
    stamp,
    start: facts.fitting.start,
    end: facts.fitting.end,
    summary: `Tire fitting at ${facts.shop.name}`,
    description: [...facts.lines.map(lineWords), "", `Your offer: ${facts.offerUrl}`, `Phone ${facts.shop.phone}`].join("\n"),
    location: `${facts.shop.name}, ${addressLine(facts.shop)}`,
    organizer: { name: facts.shop.name, email: facts.shop.email },
  });
  return { filename: CALENDAR_FILENAME, content: Buffer.from(text, "utf8"), contentType: `text/calendar; charset=utf-8; method=${method}` };
}
