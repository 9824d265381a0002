import type { SlotList } from "@/lib/offers/offer-slots";

export type FreeSlot = SlotList["slots"][number];

/** One local day of free fitting times. */
export interface SlotDay {
  /** YYYY-MM-DD in the shop's time zone. */
  date: string;
  slots: FreeSlot[];
}

/**
 * Free times grouped by the shop's calendar day, in order. Every start carries the shop's own offset
 * (2026-12-08T09:00:00-05:00), so its first ten characters are the shop's local date.
 */
export function slotDays(slots: readonly FreeSlot[]): SlotDay[] {
  const days: SlotDay[] = [];
  for (const slot of slots) {
    const date = slot.start.slice(0, 10);
    const last = days.at(-1);
    if (last?.date === date) last.slots.push(slot);
    else days.push({ date, slots: [slot] });
  }
  return days;
}
