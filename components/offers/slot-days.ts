import type { SlotList } from "@/lib/offers/offer-slots";

export type FreeSlot = SlotList["slots"][number];

/** One local day of free fitting times. */
export interface SlotDay {
  /** YYYY-MM-DD in the shop's time zone. */
  date: string;
  slots: FreeSlot[];
}

/**
 * The shop's local date of a time the API gives: every time carries the shop's own offset
 * (2026-12-08T09:00:00-05:00), so its first ten characters are that date.
 */
export const shopDateOf = (time: string): string => time.slice(0, 10);

/** Free times grouped by the shop's calendar day, in order. */
export function slotDays(slots: readonly FreeSlot[]): SlotDay[] {
  const days: SlotDay[] = [];
  for (const slot of slots) {
    const date = shopDateOf(slot.start);
    const last = days.at(-1);
    if (last?.date === date) last.slots.push(slot);
    else days.push({ date, slots: [slot] });
  }
  return days;
}
