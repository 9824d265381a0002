import { describe, expect, it } from "vitest";
import { slotDays } from "@/components/offers/slot-days";

const slot = (start: string, end: string) => ({ start, end });

describe("free fitting times by the shop's day", () => {
  it("groups times by the local date their own offset gives, in order", () => {
    // 2026-11-01T23:00-05:00 is 04:00 UTC on Nov 2: still Nov 1 at the shop (offsets from the IANA time zone database).
    const late = slot("2026-11-01T23:00:00-05:00", "2026-11-01T23:45:00-05:00");
    const days = slotDays([
      slot("2026-11-01T09:00:00-05:00", "2026-11-01T09:45:00-05:00"),
      late,
      slot("2026-11-03T09:00:00-05:00", "2026-11-03T09:45:00-05:00"),
    ]);
    expect(days.map((day) => [day.date, day.slots.length])).toEqual([
      ["2026-11-01", 2],
      ["2026-11-03", 1],
    ]);
    expect(days[0]!.slots[1]).toBe(late);
  });

  it("gives no days for no times", () => {
    expect(slotDays([])).toEqual([]);
  });
});
