import type { Database } from "@/db/client";
import type { EmailKind } from "@/db/schema";
import type { EmailMessage } from "@/lib/email/email-message";
import { sendRecordedEmail } from "@/lib/email/recorded-send";
import type { EmailAttachment } from "@/lib/email/send-email";
import { fittingCalendarAttachment } from "./fitting-calendar-file";
import { fittingBookedEmail, fittingBookedShopEmail, fittingCancelledEmail, fittingCancelledShopEmail } from "./fitting-email-content";
import { offerEmail } from "./offer-email-content";
import { hasFitting, readOfferFacts, type BookedOfferFacts, type OfferFacts } from "./offer-facts";

/**
 * The senders of the offer and fitting e-mails: each reads what it needs, sends through
 * sendRecordedEmail under a key that makes a repeat deliver nothing twice, and never throws (a
 * failure is logged and recorded in the Outbox, and answered as ok: false).
 */

export type SendOutcome = { ok: boolean };

interface Send {
  kind: EmailKind;
  to: string;
  replyTo: string;
  message: EmailMessage;
  key: string;
  attachments?: EmailAttachment[];
}

async function sendAll(db: Database, facts: OfferFacts, sends: Send[]): Promise<SendOutcome> {
  let ok = true;
  for (const send of sends) {
    const result = await sendRecordedEmail(db, {
      senderId: send.kind === "offer" ? facts.senderId : null,
      kind: send.kind,
      reference: String(facts.offerId),
      to: send.to,
      replyTo: send.replyTo,
      message: send.message,
      attachments: send.attachments,
      idempotencyKey: send.key,
    });
    ok &&= result.ok;
  }
  return { ok };
}

/** Reads the offer's facts and sends what `build` makes of them; ok: false when there is nothing to send or a send fails. */
async function withFacts(db: Database, offerId: number, what: string, build: (facts: OfferFacts) => Send[] | null): Promise<SendOutcome> {
  try {
    const facts = await readOfferFacts(db, offerId);
    const sends = facts && build(facts);
    if (!facts || !sends) {
      console.error(`E-mail not sent: ${what} for offer ${offerId}: no such offer in that state, or the shop is not set up.`);
      return { ok: false };
    }
    return await sendAll(db, facts, sends);
  } catch (error) {
    console.error(`E-mail not sent: ${what} for offer ${offerId}: ${error instanceof Error ? error.message : String(error)}`);
    return { ok: false };
  }
}

/** The priced offer to the driver, replies going to the shop. Only an open offer is sent. */
export function sendOfferEmail(db: Database, offerId: number): Promise<SendOutcome> {
  return withFacts(db, offerId, "the offer", (facts) =>
    facts.status === "open" ? [{ kind: "offer", to: facts.driver.email, replyTo: facts.shop.email, message: offerEmail(facts), key: `offer-${offerId}` }] : null,
  );
}

function bookedSends(facts: BookedOfferFacts, now: Date): Send[] {
  const calendar = [fittingCalendarAttachment(facts, "PUBLISH", now)];
  const sequence = facts.fitting.calendarSequence;
  return [
    { kind: "fitting_booked", to: facts.driver.email, replyTo: facts.shop.email, message: fittingBookedEmail(facts, now), key: `fitting-booked-${facts.offerId}-${sequence}`, attachments: calendar },
    { kind: "fitting_booked_shop", to: facts.shop.email, replyTo: facts.driver.email, message: fittingBookedShopEmail(facts), key: `fitting-booked-shop-${facts.offerId}-${sequence}`, attachments: calendar },
  ];
}

/** The booked fitting to the driver and to the shop, each with the calendar entry (METHOD:PUBLISH). Only an accepted offer. */
export function sendFittingBookedEmails(db: Database, offerId: number, now: Date = new Date()): Promise<SendOutcome> {
  return withFacts(db, offerId, "the booked fitting", (facts) => (hasFitting(facts) && facts.status === "accepted" ? bookedSends(facts, now) : null));
}

function cancelledSends(facts: BookedOfferFacts, now: Date): Send[] {
  const calendar = [fittingCalendarAttachment(facts, "CANCEL", now)];
  const sequence = facts.fitting.calendarSequence;
  return [
    { kind: "fitting_cancelled", to: facts.driver.email, replyTo: facts.shop.email, message: fittingCancelledEmail(facts), key: `fitting-cancelled-${facts.offerId}-${sequence}`, attachments: calendar },
    { kind: "fitting_cancelled_shop", to: facts.shop.email, replyTo: facts.driver.email, message: fittingCancelledShopEmail(facts), key: `fitting-cancelled-shop-${facts.offerId}-${sequence}`, attachments: calendar },
  ];
}

/**
 * The cancelled fitting to the driver and to the shop, each with METHOD:CANCEL under the fitting's
 * UID and the offer's calendarSequence, which the caller raises (in the cancelling write) before
 * calling, so calendars take the entry out. Only an offer no longer accepted that had a fitting.
 */
export function sendFittingCancelledEmails(db: Database, offerId: number, now: Date = new Date()): Promise<SendOutcome> {
  return withFacts(db, offerId, "the cancelled fitting", (facts) => (hasFitting(facts) && facts.status !== "accepted" && facts.status !== "fitted" ? cancelledSends(facts, now) : null));
}
