import { asc, eq } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { brand, offer, offerLine, quoteRequest, stockItem, tireLine, type Offer } from "@/db/schema";
import { tireColumns, tireSchema, toTire } from "@/lib/catalog/catalog-tire";
import { ofBrand, ofLine, ruleFactColumns } from "@/lib/catalog/columns";
import { cardTireVerdict, tireVerdictSchema } from "@/lib/fit-cards/tire-verdict";
import { offsetDateTime } from "@/lib/fittings/local-time";
import { estimateSchema } from "@/lib/shop/charges";
import { readShopSettings } from "@/lib/shop/settings";
import { readShopTolerance } from "@/lib/shop/tolerance";
import { OFFER_STATUSES, type OfferStatus } from "@/lib/tire";
import { releaseExpiredHolds } from "./hold-writes";
import { readRequestOriginal } from "./request-original";

const HOUR_MS = 3_600_000;

export const publicOfferSchema = z
  .object({
    status: z.enum(OFFER_STATUSES).describe("open until validUntil passes (then expired); accepted once a fitting is booked; then fitted, no-show or cancelled."),
    createdAt: z.string().describe("When the shop sent the offer, ISO 8601."),
    validUntil: z.string().describe("The instant the offer stops holding: the end of validUntilDate in the shop's time zone, ISO 8601 with its offset."),
    validUntilDate: z.string().describe("The last day the offer holds, YYYY-MM-DD in the shop's time zone."),
    message: z.string().describe("The shop's note to the driver; empty when there is none."),
    vehicle: z.string(),
    original: z.string().nullable().describe("The tire on the car the lines are measured against, when the request names one."),
    lines: z.array(
      z.object({
        tire: tireSchema,
        quantity: z.number().int().min(1),
        priceCents: z.number().int().describe("The price of one tire when the offer was sent, in US cents."),
        verdict: tireVerdictSchema.nullable().describe("The tire against the original, by the rules of equal-or-better; null when no original is known."),
      }),
    ),
    estimate: estimateSchema.describe("The whole package out the door, as priced when the offer was sent."),
    appointment: z
      .object({ start: z.string(), end: z.string() })
      .nullable()
      .describe("The booked fitting, ISO 8601 with the shop's offset; null before one is booked."),
    cancelUntil: z.string().nullable().describe("Until when the driver can cancel the fitting online; null when there is nothing to cancel."),
    timeZone: z.string().describe("The shop's IANA time zone."),
    shop: z.object({ name: z.string(), phone: z.string(), email: z.string(), address: z.string() }),
  })
  .describe("A priced offer as its driver sees it: never staff names or internal notes.");

export type PublicOffer = z.infer<typeof publicOfferSchema>;

/** The status a driver and staff see: an open offer past its instant reads as expired. */
export function offerStatusAt(row: Pick<Offer, "status" | "validUntil">, now: Date): OfferStatus {
  return row.status === "open" && row.validUntil.getTime() <= now.getTime() ? "expired" : row.status;
}

/** The offer behind a token, or null. Holds whose day has ended are released first, so quantities read true. */
export async function readPublicOffer(db: Database, token: string, now = new Date()): Promise<PublicOffer | null> {
  await releaseExpiredHolds(db, now);
  const [row] = await db
    .select({ offer, vehicle: quoteRequest.vehicle, source: quoteRequest.source, reference: quoteRequest.reference, tires: quoteRequest.tires })
    .from(offer)
    .innerJoin(quoteRequest, eq(offer.requestId, quoteRequest.id))
    .where(eq(offer.token, token));
  if (!row) return null;
  const [settings, lines, original, tolerancePct] = await Promise.all([
    readShopSettings(db),
    db
      .select({ ...tireColumns, ...ruleFactColumns, retired: stockItem.retired, quantityOffered: offerLine.quantity, priceOffered: offerLine.priceCents })
      .from(offerLine)
      .innerJoin(stockItem, eq(offerLine.stockItemId, stockItem.id))
      .innerJoin(tireLine, ofLine)
      .innerJoin(brand, ofBrand)
      .where(eq(offerLine.offerId, row.offer.id))
      .orderBy(asc(offerLine.position)),
    readRequestOriginal(db, row),
    readShopTolerance(db),
  ]);
  if (!settings) return null;
  const { offer: stored } = row;
  const timeZone = settings.timeZone;
  const zoned = (at: Date) => offsetDateTime(at.getTime(), timeZone);
  const booked = stored.status === "accepted" && stored.fittingStart !== null;
  const { streetAddress, town, region, postalCode } = settings.address;
  return {
    status: offerStatusAt(stored, now),
    createdAt: stored.createdAt.toISOString(),
    validUntil: zoned(stored.validUntil),
    validUntilDate: stored.validUntilDate,
    message: stored.message,
    vehicle: row.vehicle,
    original: original ? original.designation + (original.loadIndex ? ` ${original.loadIndex}${original.speedSymbol ?? ""}` : "") : null,
    lines: lines.map(({ retired, quantityOffered, priceOffered, ...tire }) => ({
      tire: toTire({ ...tire, quantity: retired ? 0 : tire.quantity }),
      quantity: quantityOffered,
      priceCents: priceOffered,
      verdict: original ? cardTireVerdict(original, tire, tolerancePct) : null,
    })),
    estimate: stored.estimate,
    appointment: stored.fittingStart && stored.fittingEnd ? { start: zoned(stored.fittingStart), end: zoned(stored.fittingEnd) } : null,
    cancelUntil: booked ? zoned(new Date(stored.fittingStart!.getTime() - settings.cancelCutoffHours * HOUR_MS)) : null,
    timeZone,
    shop: { name: settings.name, phone: settings.phone, email: settings.email, address: `${streetAddress}, ${town}, ${region} ${postalCode}` },
  };
}
