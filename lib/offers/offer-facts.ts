import { eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { offer, quoteRequest, type FrozenEstimate } from "@/db/schema";
import { siteUrl } from "@/lib/env/site-url";
import { readOfferLines } from "./queries";
import { getShopContact, readShopTimeZone, type ShopContact } from "@/lib/shop/queries";
import { readShopSettings } from "@/lib/shop/settings";
import { describeTire, type StoredOfferStatus } from "@/lib/tire";

/** One tire of an offer as the e-mails name it: "Brand Line 225/65R17 102H", how many, the price each as sent. */
export interface OfferLineFacts {
  label: string;
  quantity: number;
  priceCents: number;
}

/** A booked fitting: when, on which bay, and the SEQUENCE its calendar objects carry. */
export interface FittingFacts {
  bay: number;
  start: Date;
  end: Date;
  calendarSequence: number;
}

/** Everything the offer and fitting e-mails say, read in one place so the content builders stay pure. */
export interface OfferFacts {
  offerId: number;
  requestId: number;
  status: StoredOfferStatus;
  senderId: string | null;
  driver: { name: string; email: string; phone: string | null; vehicle: string };
  lines: OfferLineFacts[];
  estimate: FrozenEstimate;
  validUntilDate: string;
  message: string;
  fitting: FittingFacts | null;
  shop: ShopContact;
  timeZone: string;
  cancelCutoffHours: number;
  /** The driver's page for the offer (its token is the only key to it). */
  offerUrl: string;
  /** The request in the Counter, for the shop's copies. */
  counterUrl: string;
  /** The host of the public address, for calendar UIDs. */
  host: string;
}

/** The facts of an offer with a fitting booked (or once booked, for a cancellation). */
export type BookedOfferFacts = OfferFacts & { fitting: FittingFacts };

export const hasFitting = (facts: OfferFacts): facts is BookedOfferFacts => facts.fitting !== null;

/** An offer's facts for its e-mails; null when there is no such offer or the shop is not set up. */
export async function readOfferFacts(db: Database, offerId: number): Promise<OfferFacts | null> {
  const [row] = await db
    .select({
      offer,
      driver: { name: quoteRequest.name, email: quoteRequest.email, phone: quoteRequest.phone, vehicle: quoteRequest.vehicle },
    })
    .from(offer)
    .innerJoin(quoteRequest, eq(offer.requestId, quoteRequest.id))
    .where(eq(offer.id, offerId));
  if (!row) return null;
  const [shop, settings, timeZone, lines] = await Promise.all([getShopContact(db), readShopSettings(db), readShopTimeZone(db), readLines(db, offerId)]);
  if (!shop || !settings) return null;
  const { offer: found } = row;
  const site = siteUrl();
  return {
    offerId: found.id,
    requestId: found.requestId,
    status: found.status,
    senderId: found.senderId,
    driver: row.driver,
    lines,
    estimate: found.estimate,
    validUntilDate: found.validUntilDate,
    message: found.message,
    fitting:
      found.fittingStart && found.fittingEnd && found.fittingBay !== null
        ? { bay: found.fittingBay, start: found.fittingStart, end: found.fittingEnd, calendarSequence: found.calendarSequence }
        : null,
    shop,
    timeZone,
    cancelCutoffHours: settings.cancelCutoffHours,
    offerUrl: new URL(`/o/${found.token}`, site).toString(),
    counterUrl: new URL(`/counter/requests/${found.requestId}`, site).toString(),
    host: site.hostname,
  };
}

async function readLines(db: Database, offerId: number): Promise<OfferLineFacts[]> {
  const lines = await readOfferLines(db, [offerId]);
  return lines.map((line) => ({ label: `${line.brand} ${line.line} ${describeTire(line)}`, quantity: line.quantity, priceCents: line.priceCents }));
}
