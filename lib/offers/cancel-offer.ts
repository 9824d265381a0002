import { and, eq, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { offer } from "@/db/schema";
import { readShopSettings } from "@/lib/shop/settings";
import { releaseHolds } from "./hold-writes";
import { offerStatusAt } from "./public-offer";
import { refusedOffer, type OfferRefusal } from "./refusals";

const HOUR_MS = 3_600_000;

export type Cancellation = { ok: true; offerId: number } | OfferRefusal;

/**
 * The driver cancels a booked fitting from the offer page, up to the shop's cut-off before it
 * starts: the offer becomes cancelled, the bay's time is free again, the tires go back on sale and
 * the calendar's SEQUENCE rises, so the CANCEL e-mailed next replaces the booking in calendars.
 */
export async function cancelByDriver(db: Database, token: string, now = new Date()): Promise<Cancellation> {
  const [row] = await db.select().from(offer).where(eq(offer.token, token));
  if (!row) return refusedOffer("not_found");
  const status = offerStatusAt(row, now);
  if (status === "expired" || status === "withdrawn" || status === "cancelled") return refusedOffer(status);
  if (status === "open") return refusedOffer("not_booked");
  const settings = await readShopSettings(db);
  const cutOff = row.fittingStart!.getTime() - (settings?.cancelCutoffHours ?? 0) * HOUR_MS;
  if (status !== "accepted" || now.getTime() >= cutOff) return refusedOffer("too_late");

  const cancelled = await db.transaction(async (tx) => {
    const [changed] = await tx
      .update(offer)
      .set({ status: "cancelled", calendarSequence: sql`${offer.calendarSequence} + 1`, updatedAt: now })
      .where(and(eq(offer.id, row.id), eq(offer.status, "accepted")))
      .returning({ id: offer.id });
    if (changed) await releaseHolds(tx, [row.id], { at: now });
    return Boolean(changed);
  });
  return cancelled ? { ok: true, offerId: row.id } : refusedOffer("cancelled");
}
