import { and, eq, gt, inArray, lt } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { offer } from "@/db/schema";
import { addLocalDays, fittingSlots, todayIn, type FittingSlot } from "@/lib/fittings";
import { endOfLocalDay } from "@/lib/fittings/local-time";
import { readShopSettings } from "@/lib/shop/settings";
import type { ShopSettings } from "@/lib/shop/settings-schema";

/** How many local days one list of free times covers. */
export const SLOT_DAYS = 14;
/** How many free times a refusal suggests instead. */
export const SUGGESTED_SLOTS = 5;

export const slotListSchema = z.object({
  timeZone: z.string().describe("The shop's IANA time zone; every time carries its offset there."),
  slots: z
    .array(z.object({ start: z.string().describe("ISO 8601 with the shop's offset."), end: z.string() }))
    .describe(`Free fitting starts, in order, for up to ${SLOT_DAYS} days from the first day asked for.`),
});

export type SlotList = z.infer<typeof slotListSchema>;

/** Fittings that occupy a bay (booked or done) and overlap the span. */
async function takenBetween(db: Database, from: Date, to: Date): Promise<{ start: Date; end: Date }[]> {
  const rows = await db
    .select({ start: offer.fittingStart, end: offer.fittingEnd })
    .from(offer)
    .where(and(inArray(offer.status, ["accepted", "fitted"]), lt(offer.fittingStart, to), gt(offer.fittingEnd, from)));
  return rows.flatMap(({ start, end }) => (start && end ? [{ start, end }] : []));
}

/** The free fitting times for `days` local dates from `from` (default today in the shop's zone). */
export async function freeSlotsWith(db: Database, settings: ShopSettings, { from, days = SLOT_DAYS, now }: { from?: string; days?: number; now: Date }): Promise<FittingSlot[]> {
  const { timeZone } = settings;
  const today = todayIn(timeZone, now);
  const first = from && from > today ? from : today;
  const last = addLocalDays(first, days - 1);
  const taken = await takenBetween(db, new Date(endOfLocalDay(addLocalDays(first, -1), timeZone)), new Date(endOfLocalDay(last, timeZone)));
  return fittingSlots({
    timeZone,
    hours: settings.hours,
    closedDates: settings.closedDates,
    fittingBays: settings.fittingBays,
    fittingMinutes: settings.fittingMinutes,
    leadMinutes: settings.leadMinutes,
    now,
    from: first,
    days,
    taken,
  });
}

/** GET …/slots: the free times from a day (default today) for an offer's driver; null for an unknown token. */
export async function readOfferSlots(db: Database, token: string, { from, now = new Date() }: { from?: string; now?: Date }): Promise<SlotList | null> {
  const [known] = await db.select({ id: offer.id }).from(offer).where(eq(offer.token, token));
  const settings = known ? await readShopSettings(db) : null;
  if (!settings) return null;
  return { timeZone: settings.timeZone, slots: await freeSlotsWith(db, settings, { from, now }) };
}
