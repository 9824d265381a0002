import { describe, expect, it } from "vitest";
import { findSlot, fittingSlots, sameInstant, todayIn, type SlotRequest } from "@/lib/fittings";
import { startTimes, weekdays, weekOpen } from "./week";

// An invented shop in America/New_York; in December the offset there is -05:00 (EST).
const shop = {
  timeZone: "America/New_York",
  hours: weekdays([["08:00", "12:00"], ["13:00", "17:00"]], { sat: [["08:00", "12:00"]] }),
  fittingBays: 2,
  fittingMinutes: 60,
  now: "2026-12-07T06:00:00-05:00", // Monday, before opening
} satisfies SlotRequest;

const onDay = (slots: { start: string }[], date: string) => slots.filter((slot) => slot.start.startsWith(date));

describe("free fitting times within opening hours", () => {
  it("offers starts a fitting apart in each interval, none in the lunch break, each ending by its interval's end", () => {
    const slots = fittingSlots({ ...shop, days: 1 });
    expect(startTimes(slots)).toEqual(["08:00-05:00", "09:00-05:00", "10:00-05:00", "11:00-05:00", "13:00-05:00", "14:00-05:00", "15:00-05:00", "16:00-05:00"]);
    expect(slots[0]).toEqual({ start: "2026-12-07T08:00:00-05:00", end: "2026-12-07T09:00:00-05:00" });
    expect(slots.at(-1)).toEqual({ start: "2026-12-07T16:00:00-05:00", end: "2026-12-07T17:00:00-05:00" });
  });

  it("drops the last start of an interval that does not divide by the fitting's length", () => {
    const hours = weekOpen({ mon: [["08:00", "11:30"]] });
    const slots = fittingSlots({ ...shop, hours, fittingMinutes: 45, days: 1 });
    expect(startTimes(slots)).toEqual(["08:00-05:00", "08:45-05:00", "09:30-05:00", "10:15-05:00"]);
    expect(slots.at(-1)!.end).toBe("2026-12-07T11:00:00-05:00");
  });

  it("offers nothing on a day without hours or on a holiday", () => {
    const slots = fittingSlots({ ...shop, closedDates: ["2026-12-08"], days: 7 });
    expect(onDay(slots, "2026-12-08")).toEqual([]); // a Tuesday holiday
    expect(onDay(slots, "2026-12-13")).toEqual([]); // Sunday: no hours
    expect(startTimes(onDay(slots, "2026-12-12"))).toEqual(["08:00-05:00", "09:00-05:00", "10:00-05:00", "11:00-05:00"]);
    expect(onDay(slots, "2026-12-09")).toHaveLength(8);
  });

  it("starts no sooner than the lead time after now, a start exactly then included", () => {
    const later = fittingSlots({ ...shop, now: "2026-12-07T09:10:00-05:00", leadMinutes: 120, days: 1 });
    expect(startTimes(later)[0]).toBe("13:00-05:00");
    const exact = fittingSlots({ ...shop, now: "2026-12-07T09:00:00-05:00", leadMinutes: 120, days: 1 });
    expect(startTimes(exact)[0]).toBe("11:00-05:00");
  });
});

describe("bays and bookings", () => {
  const at = (time: string) => `2026-12-07T${time}:00-05:00`;
  const startsOf = (taken: SlotRequest["taken"]) => startTimes(fittingSlots({ ...shop, days: 1, taken }));

  it("keeps a start booked once free on two bays and drops one booked twice, in any offset", () => {
    const starts = startsOf([at("09:00"), at("10:00"), "2026-12-07T15:00:00Z"]);
    expect(starts).toContain("09:00-05:00");
    expect(starts).not.toContain("10:00-05:00");
  });

  it("counts bookings given with their end against every start they overlap", () => {
    const starts = startsOf([{ start: at("13:00"), end: at("15:00") }, { start: at("13:00"), end: at("15:00") }]);
    expect(starts).not.toContain("13:00-05:00");
    expect(starts).not.toContain("14:00-05:00");
    expect(starts).toContain("15:00-05:00");
  });

  it("counts bookings at the same moment, not all that touch the hour", () => {
    // Two half-hour bookings one after the other use one bay at a time.
    expect(startsOf([{ start: at("09:00"), end: at("09:30") }, { start: at("09:30"), end: at("10:00") }])).toContain("09:00-05:00");
    // A booking from 09:30 to 10:30 and one at 10:00 overlap from 10:00: both bays are busy then.
    const starts = startsOf([{ start: at("09:30"), end: at("10:30") }, at("10:00")]);
    expect(starts).toContain("09:00-05:00");
    expect(starts).not.toContain("10:00-05:00");
  });
});

describe("the window of dates", () => {
  const everyDay = weekOpen({ mon: [["08:00", "17:00"]], tue: [["08:00", "17:00"]], wed: [["08:00", "17:00"]], thu: [["08:00", "17:00"]], fri: [["08:00", "17:00"]], sat: [["08:00", "17:00"]], sun: [["08:00", "17:00"]] });

  it("looks 14 local dates ahead by default, today included", () => {
    const slots = fittingSlots({ ...shop, hours: everyDay });
    expect(slots[0]!.start).toBe("2026-12-07T08:00:00-05:00");
    expect(slots.at(-1)!.start).toBe("2026-12-20T16:00:00-05:00");
    expect(new Set(slots.map((slot) => slot.start.slice(0, 10))).size).toBe(14);
  });

  it("starts at the given date and looks the given number of days ahead", () => {
    const slots = fittingSlots({ ...shop, hours: everyDay, from: "2026-12-10", days: 3 });
    expect(slots[0]!.start).toBe("2026-12-10T08:00:00-05:00");
    expect(slots.at(-1)!.start).toBe("2026-12-12T16:00:00-05:00");
  });

  it("takes today in the shop's zone, not in UTC", () => {
    // 03:00 UTC on the 8th is still 22:00 on the 7th in New York: today there is the 7th, and its hours are past.
    const lateMonday = "2026-12-08T03:00:00Z";
    expect(todayIn("America/New_York", lateMonday)).toBe("2026-12-07");
    expect(fittingSlots({ ...shop, hours: everyDay, now: lateMonday, days: 1 })).toEqual([]);
    expect(fittingSlots({ ...shop, hours: everyDay, now: lateMonday, days: 2 })[0]!.start).toBe("2026-12-08T08:00:00-05:00");
  });
});

describe("the same instant in another offset", () => {
  const slots = fittingSlots({ ...shop, now: "2026-12-05T06:00:00-05:00", days: 1 }); // Saturday

  it("matches a requested start written in UTC or as a Date", () => {
    expect(sameInstant("2026-12-05T14:00:00Z", "2026-12-05T09:00:00-05:00")).toBe(true);
    expect(findSlot(slots, "2026-12-05T14:00:00Z")).toEqual({ start: "2026-12-05T09:00:00-05:00", end: "2026-12-05T10:00:00-05:00" });
    expect(findSlot(slots, new Date("2026-12-05T15:00:00.000Z"))?.start).toBe("2026-12-05T10:00:00-05:00");
  });

  it("matches nothing for another instant, a time without offset or unreadable text", () => {
    expect(sameInstant("2026-12-05T14:00:00Z", "2026-12-05T14:00:00-05:00")).toBe(false);
    expect(findSlot(slots, "2026-12-05T09:30:00-05:00")).toBeUndefined();
    expect(findSlot(slots, "2026-12-05T09:00:00")).toBeUndefined();
    expect(findSlot(slots, "nine o'clock")).toBeUndefined();
  });
});

describe("settings that cannot be read", () => {
  const refusal = (change: Partial<SlotRequest>) => () => fittingSlots({ ...shop, ...change } as SlotRequest);

  it("names the field and says what is wrong", () => {
    expect(refusal({ timeZone: "Atlantis/Harbor" })).toThrow(/^slots\.timeZone: not a time zone/);
    expect(refusal({ hours: weekOpen({ mon: [["08:00", "25:00"]] }) })).toThrow(/^slots\.hours\.mon\[0\]\[1\]: a time is written HH:MM/);
    expect(refusal({ hours: weekOpen({ tue: [["17:00", "08:00"]] }) })).toThrow(/^slots\.hours\.tue\[0\]: an opening interval closes after it opens/);
    expect(refusal({ hours: weekOpen({ wed: [["08:00", "13:00"], ["12:00", "17:00"]] }) })).toThrow(/^slots\.hours\.wed: .*do not overlap/);
    expect(refusal({ fittingMinutes: 0 })).toThrow(/^slots\.fittingMinutes: a fitting lasts at least 5 minutes/);
    expect(refusal({ fittingBays: 0 })).toThrow(/^slots\.fittingBays: a shop fits on at least one bay/);
    expect(refusal({ from: "2026-02-30" })).toThrow(/^slots\.from: a date is written YYYY-MM-DD/);
    expect(refusal({ closedDates: ["25/12/2026"] })).toThrow(/^slots\.closedDates\[0\]/);
    expect(refusal({ now: "2026-12-07T06:00:00" })).toThrow(/^slots\.now: an instant is a date and time with its offset/);
    expect(refusal({ days: 400 })).toThrow(/^slots\.days/);
    expect(refusal({ taken: [{ start: "2026-12-07T10:00:00Z", end: "2026-12-07T09:00:00Z" }] })).toThrow(/^slots\.taken\[0\]/);
  });
});
