import { and, eq, gt, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { offer } from "@/db/schema";
import { isCheckViolation, isUniqueViolation } from "@/lib/database/unique-violation";
import { endOfLocalDay, findSlot, todayIn, type FittingSlot } from "@/lib/fittings";
import { readShopSettings } from "@/lib/shop/settings";
import { holdOfferTires, releaseExpiredHolds } from "./hold-writes";
import { freeSlotsWith, SUGGESTED_SLOTS } from "./offer-slots";
import { offerStatusAt } from "./public-offer";
import { refusedOffer, type OfferRefusal } from "./refusals";

export type Acceptance = { ok: true; offerId: number; appointment: FittingSlot } | OfferRefusal;

class Lost extends Error {
  constructor(readonly refusal: "already_accepted" | "slot_taken" | "tires_gone") {
    super(refusal);
  }
}

/**
 * A driver accepts an offer with one of the free starts (the same instant in any offset counts):
 * in one transaction the offer becomes accepted with a bay and the time, and its tires are held
 * until the end of the fitting's local day. Races are settled by the database, not by a look first:
 * the offer row changes only while still open, a bay's start is unique among booked fittings (each
 * bay is tried in turn inside a savepoint), and the held count may not pass what is on hand. The
 * loser of any race gets a 409 with the next free times.
 */
export async function acceptOffer(db: Database, token: string, slotStart: string, now = new Date()): Promise<Acceptance> {
  await releaseExpiredHolds(db, now);
  const [row] = await db.select().from(offer).where(eq(offer.token, token));
  if (!row) return refusedOffer("not_found");
  const status = offerStatusAt(row, now);
  if (status !== "open") return refusedOffer(status === "accepted" || status === "fitted" || status === "no-show" ? "already_accepted" : status);

  const settings = await readShopSettings(db);
  if (!settings) return refusedOffer("not_found");
  const suggestions = async () => (await freeSlotsWith(db, settings, { now })).slice(0, SUGGESTED_SLOTS);
  const day = todayIn(settings.timeZone, slotStart);
  const slot = findSlot(await freeSlotsWith(db, settings, { from: day, days: 1, now }), slotStart);
  if (!slot) return refusedOffer("slot_taken", await suggestions());

  const booking = {
    status: "accepted" as const,
    fittingStart: new Date(slot.start),
    fittingEnd: new Date(slot.end),
    holdUntil: new Date(endOfLocalDay(day, settings.timeZone)),
    updatedAt: now,
  };
  try {
    await db.transaction(async (tx) => {
      let booked = false;
      for (let bay = 1; bay <= settings.fittingBays && !booked; bay++) {
        try {
          booked = await tx.transaction(async (savepoint) => {
            const updated = await savepoint
              .update(offer)
              .set({ ...booking, fittingBay: bay })
              .where(and(eq(offer.id, row.id), eq(offer.status, "open"), gt(offer.validUntil, sql`${now.toISOString()}::timestamptz`)))
              .returning({ id: offer.id });
            if (updated.length === 0) throw new Lost("already_accepted");
            return true;
          });
        } catch (error) {
          if (!isUniqueViolation(error)) throw error;
        }
      }
      if (!booked) throw new Lost("slot_taken");
      if (!(await holdOfferTires(tx, row.id))) throw new Lost("tires_gone");
    });
  } catch (error) {
    const lost = error instanceof Lost ? error.refusal : isCheckViolation(error, "stock_item_held") ? "tires_gone" : null;
    if (!lost) throw error;
    return refusedOffer(lost, lost === "already_accepted" ? [] : await suggestions());
  }
  return { ok: true, offerId: row.id, appointment: slot };
}
