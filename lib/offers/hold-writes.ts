import { and, asc, eq, inArray, isNull, lte, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { offer, offerLine, stockItem } from "@/db/schema";

/** An offer's tires, item by item (two lines of one item add up), in item order so that writers lock rows alike. */
async function heldPerItem(db: Database, offerIds: readonly number[]): Promise<{ stockItemId: number; quantity: number }[]> {
  if (offerIds.length === 0) return [];
  return db
    .select({ stockItemId: offerLine.stockItemId, quantity: sql<number>`sum(${offerLine.quantity})::int`.mapWith(Number) })
    .from(offerLine)
    .where(inArray(offerLine.offerId, [...offerIds]))
    .groupBy(offerLine.stockItemId)
    .orderBy(asc(offerLine.stockItemId));
}

/**
 * Holds an offer's tires: each item's held count rises by the offer's quantity. The database refuses
 * a held count above what is on hand (check stock_item_held), so two drivers racing for the last set
 * cannot both hold it: the loser's statement fails and its transaction rolls back. Call inside the
 * accepting transaction. Answers false when an item is retired (no longer sold).
 */
export async function holdOfferTires(tx: Database, offerId: number): Promise<boolean> {
  for (const { stockItemId, quantity } of await heldPerItem(tx, [offerId])) {
    const [held] = await tx
      .update(stockItem)
      .set({ heldQuantity: sql`${stockItem.heldQuantity} + ${quantity}` })
      .where(and(eq(stockItem.id, stockItemId), eq(stockItem.retired, false)))
      .returning({ id: stockItem.id });
    if (!held) return false;
  }
  return true;
}

/**
 * Gives back the tires of offers whose hold is still on, and marks each hold released; `sold` also
 * takes them off the shelf (a fitting done). Offers already released are skipped, so calling twice
 * changes nothing. Answers the ids released. Call inside a transaction.
 */
export async function releaseHolds(tx: Database, offerIds: readonly number[], { sold = false, at = new Date() } = {}): Promise<number[]> {
  if (offerIds.length === 0) return [];
  const released = await tx
    .update(offer)
    .set({ holdReleasedAt: at, updatedAt: at })
    .where(and(inArray(offer.id, [...offerIds]), isNull(offer.holdReleasedAt), sql`${offer.holdUntil} is not null`))
    .returning({ id: offer.id });
  const ids = released.map((row) => row.id);
  for (const { stockItemId, quantity } of await heldPerItem(tx, ids)) {
    await tx
      .update(stockItem)
      .set({
        heldQuantity: sql`${stockItem.heldQuantity} - ${quantity}`,
        ...(sold ? { quantityOnHand: sql`${stockItem.quantityOnHand} - ${quantity}`, updatedAt: at } : {}),
      })
      .where(eq(stockItem.id, stockItemId));
  }
  return ids;
}

/**
 * Releases every hold whose time is up (the end of its fitting's day in the shop's zone) and that no
 * one has marked: the tires go back on sale, the offer keeps its status for staff to mark. Runs on
 * each read of offers and fittings and on the server's schedule (lib/offers/schedule.ts).
 */
export async function releaseExpiredHolds(db: Database, now: Date = new Date()): Promise<number> {
  return db.transaction(async (tx) => {
    const due = await tx
      .select({ id: offer.id })
      .from(offer)
      .where(and(eq(offer.status, "accepted"), isNull(offer.holdReleasedAt), lte(offer.holdUntil, now)))
      .orderBy(asc(offer.id))
      .for("update", { skipLocked: true });
    return (await releaseHolds(tx, due.map((row) => row.id), { at: now })).length;
  });
}
