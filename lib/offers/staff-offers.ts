import { and, eq, inArray, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { offer, offerLine, stockItem } from "@/db/schema";
import { recordAudit, type Actor } from "@/lib/audit/record";
import { isCheckViolation } from "@/lib/database/unique-violation";
import type { FittingOutcome } from "@/lib/tire";
import { releaseHolds } from "./hold-writes";

export type StaffOfferChange =
  | { ok: true }
  | { ok: false; status: 404 | 409; message: string };

const NOT_FOUND = { ok: false, status: 404, message: "There is no such offer." } as const;

/** Staff withdraw an offer the driver has not accepted: its link then says so. */
export async function withdrawOffer(db: Database, actor: Actor, offerId: number, now = new Date()): Promise<StaffOfferChange> {
  return db.transaction(async (tx) => {
    const [changed] = await tx
      .update(offer)
      .set({ status: "withdrawn", updatedAt: now })
      .where(and(eq(offer.id, offerId), eq(offer.status, "open")))
      .returning({ id: offer.id, requestId: offer.requestId });
    if (!changed) {
      const [exists] = await tx.select({ status: offer.status }).from(offer).where(eq(offer.id, offerId));
      return exists ? { ok: false, status: 409, message: `This offer is ${exists.status}, so it can no longer be withdrawn.` } : NOT_FOUND;
    }
    await recordAudit(tx, actor, [
      { action: "offer_withdrawn", subject: `request ${changed.requestId}`, summary: `Offer ${offerId} withdrawn`, changes: { status: { from: "open", to: "withdrawn" } } },
    ]);
    return { ok: true };
  });
}

const OUTCOME_ACTIONS = { fitted: "fitting_fitted", "no-show": "fitting_no_show", cancelled: "fitting_cancelled" } as const;

/**
 * Staff mark a booked fitting: fitted turns the hold into a sale (the tires leave the shelf for
 * good), no-show and cancelled give them back. A hold the day's end has already released is sold
 * from the shelf as it stands, refused when the shelf no longer has them.
 */
export async function markFitting(db: Database, actor: Actor, offerId: number, outcome: FittingOutcome, now = new Date()): Promise<StaffOfferChange> {
  try {
    return await db.transaction(async (tx) => {
      const [changed] = await tx
        .update(offer)
        .set({ status: outcome, updatedAt: now, ...(outcome === "cancelled" ? { calendarSequence: sql`${offer.calendarSequence} + 1` } : {}) })
        .where(and(eq(offer.id, offerId), eq(offer.status, "accepted")))
        .returning({ id: offer.id, requestId: offer.requestId, holdReleasedAt: offer.holdReleasedAt });
      if (!changed) {
        const [exists] = await tx.select({ status: offer.status }).from(offer).where(eq(offer.id, offerId));
        return exists ? { ok: false, status: 409, message: `This fitting is not booked (the offer is ${exists.status}): nothing to mark.` } : NOT_FOUND;
      }
      const sold = outcome === "fitted";
      if (changed.holdReleasedAt === null) await releaseHolds(tx, [offerId], { sold, at: now });
      else if (sold) await sellFromShelf(tx, offerId, now);
      await recordAudit(tx, actor, [
        {
          action: OUTCOME_ACTIONS[outcome],
          subject: `request ${changed.requestId}`,
          summary: `Fitting of offer ${offerId} marked ${outcome}${sold ? ": its tires sold" : ": its tires back on sale"}`,
          changes: { status: { from: "accepted", to: outcome } },
        },
      ]);
      return { ok: true };
    });
  } catch (error) {
    if (isCheckViolation(error, "stock_item_held") || isCheckViolation(error, "stock_item_quantity")) {
      return { ok: false, status: 409, message: "The shelf no longer holds these tires (they were sold or held for another fitting after this hold ended): correct the quantity on hand first." };
    }
    throw error;
  }
}

async function sellFromShelf(tx: Database, offerId: number, now: Date): Promise<void> {
  const lines = await tx.select({ stockItemId: offerLine.stockItemId, quantity: offerLine.quantity }).from(offerLine).where(eq(offerLine.offerId, offerId));
  for (const line of lines) {
    await tx
      .update(stockItem)
      .set({ quantityOnHand: sql`${stockItem.quantityOnHand} - ${line.quantity}`, updatedAt: now })
      .where(inArray(stockItem.id, [line.stockItemId]));
  }
}
