import { and, asc, desc, eq, gte, inArray, isNull, lt } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, offer, offerLine, quoteRequest, stockItem, tireLine, type FrozenEstimate } from "@/db/schema";
import { ofBrand, ofLine } from "@/lib/catalog/columns";
import type { OfferStatus } from "@/lib/tire";
import { releaseExpiredHolds } from "./hold-writes";
import { offerStatusAt } from "./public-offer";

export interface OfferLineSummary {
  offerId: number;
  sku: string;
  brand: string;
  line: string;
  designation: string;
  loadIndex: number;
  loadIndexDual: number | null;
  speedSymbol: string;
  loadRange: string | null;
  quantity: number;
  priceCents: number;
}

/** An offer as the Counter lists it. */
export interface OfferSummary {
  id: number;
  requestId: number;
  token: string;
  status: OfferStatus;
  createdAt: Date;
  validUntilDate: string;
  message: string;
  estimate: FrozenEstimate;
  fitting: { bay: number; start: Date; end: Date; held: boolean } | null;
  lines: OfferLineSummary[];
}

const offerLineColumns = {
  offerId: offerLine.offerId,
  sku: stockItem.sku,
  brand: brand.name,
  line: tireLine.name,
  designation: stockItem.designation,
  loadIndex: stockItem.loadIndex,
  loadIndexDual: stockItem.loadIndexDual,
  speedSymbol: stockItem.speedSymbol,
  loadRange: stockItem.loadRange,
  quantity: offerLine.quantity,
  priceCents: offerLine.priceCents,
};

/** The lines of some offers with their tires named, offer by offer in their order. */
export function readOfferLines(db: Database, offerIds: readonly number[]): Promise<OfferLineSummary[]> {
  return db
    .select(offerLineColumns)
    .from(offerLine)
    .innerJoin(stockItem, eq(offerLine.stockItemId, stockItem.id))
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(inArray(offerLine.offerId, [...offerIds]))
    .orderBy(asc(offerLine.offerId), asc(offerLine.position));
}

async function summaries(db: Database, rows: (typeof offer.$inferSelect)[], now: Date): Promise<OfferSummary[]> {
  if (rows.length === 0) return [];
  const lines = await readOfferLines(db, rows.map((row) => row.id));
  return rows.map((row) => ({
    id: row.id,
    requestId: row.requestId,
    token: row.token,
    status: offerStatusAt(row, now),
    createdAt: row.createdAt,
    validUntilDate: row.validUntilDate,
    message: row.message,
    estimate: row.estimate,
    fitting:
      row.fittingBay !== null && row.fittingStart && row.fittingEnd
        ? { bay: row.fittingBay, start: row.fittingStart, end: row.fittingEnd, held: row.status === "accepted" && row.holdReleasedAt === null }
        : null,
    lines: lines.filter((line) => line.offerId === row.id),
  }));
}

/** A request's offers, newest first. */
export async function listRequestOffers(db: Database, requestId: number, now = new Date()): Promise<OfferSummary[]> {
  await releaseExpiredHolds(db, now);
  const rows = await db.select().from(offer).where(eq(offer.requestId, requestId)).orderBy(desc(offer.createdAt), desc(offer.id));
  return summaries(db, rows, now);
}

/** The latest offer's status for each of some requests, for the inbox. */
export async function latestOfferStatuses(db: Database, requestIds: readonly number[], now = new Date()): Promise<Map<number, OfferStatus>> {
  if (requestIds.length === 0) return new Map();
  const rows = await db
    .select({ requestId: offer.requestId, status: offer.status, validUntil: offer.validUntil })
    .from(offer)
    .where(inArray(offer.requestId, [...requestIds]))
    .orderBy(asc(offer.requestId), desc(offer.createdAt), desc(offer.id));
  const latest = new Map<number, OfferStatus>();
  for (const row of rows) if (!latest.has(row.requestId)) latest.set(row.requestId, offerStatusAt(row, now));
  return latest;
}

/** A fitting in the Counter's day view: the offer, who it is for and what car. */
export interface FittingListing extends OfferSummary {
  customer: { name: string; email: string; phone: string | null; vehicle: string };
}

/** Fittings (booked, done, missed or cancelled) starting in [from, to), by start then bay. */
export async function listFittings(db: Database, from: Date, to: Date, now = new Date()): Promise<FittingListing[]> {
  await releaseExpiredHolds(db, now);
  const rows = await db
    .select({ offer, name: quoteRequest.name, email: quoteRequest.email, phone: quoteRequest.phone, vehicle: quoteRequest.vehicle })
    .from(offer)
    .innerJoin(quoteRequest, eq(offer.requestId, quoteRequest.id))
    .where(and(gte(offer.fittingStart, from), lt(offer.fittingStart, to)))
    .orderBy(asc(offer.fittingStart), asc(offer.fittingBay));
  const listed = await summaries(db, rows.map((row) => row.offer), now);
  return listed.map((summary, index) => {
    const { name, email, phone, vehicle } = rows[index]!;
    return { ...summary, customer: { name, email, phone, vehicle } };
  });
}

/** The offers whose booked fittings hold some of an item now, for a refusal that names them. */
export async function offersHoldingItem(db: Database, stockItemId: number): Promise<{ offerId: number; requestId: number; quantity: number; start: Date | null }[]> {
  return db
    .select({ offerId: offer.id, requestId: offer.requestId, quantity: offerLine.quantity, start: offer.fittingStart })
    .from(offerLine)
    .innerJoin(offer, eq(offerLine.offerId, offer.id))
    .where(and(eq(offerLine.stockItemId, stockItemId), eq(offer.status, "accepted"), isNull(offer.holdReleasedAt)))
    .orderBy(asc(offer.fittingStart));
}
