import { describe, expect, it } from "vitest";
import { endOfLocalDay, fittingSlots, type SlotRequest } from "@/lib/fittings";
import { startTimes, weekOpen } from "./week";

/*
 * Transition dates, from the IANA tz database (files `northamerica`, `europe`, `australasia`):
 * - America/New_York, Rule US 2007 onwards (the Energy Policy Act of 2005): clocks go from 02:00 EST
 *   to 03:00 EDT on the second Sunday of March (2026-03-08) and from 02:00 EDT back to 01:00 EST on
 *   the first Sunday of November (2026-11-01).
 * - Europe/Berlin, Rule EU (Directive 2000/84/EC: 01:00 UTC on the last Sunday of March and of
 *   October): 02:00 CET → 03:00 CEST on 2026-03-29, 03:00 CEST → 02:00 CET on 2026-10-25.
 * - Australia/Lord_Howe, Rule LH 2008 onwards (from memory, confirmed by the zone data the tests run
 *   on): a 30-minute shift at 02:00 on the first Sunday of October (02:00 +10:30 → 02:30 +11:00,
 *   2026-10-04) and of April (02:00 +11:00 → 01:30 +10:30, 2026-04-05).
 * - Pacific/Honolulu keeps -10:00 all year (no daylight saving since 1947).
 */

const sundayShop = (timeZone: string, sun: [string, string][], from: string, fittingMinutes = 60): SlotRequest => ({
  timeZone,
  hours: weekOpen({ sun }),
  fittingBays: 1,
  fittingMinutes,
  now: "2026-01-01T00:00:00Z",
  from,
  days: 1,
});

const HOUR_MS = 3_600_000;
const lengthMs = (slot: { start: string; end: string }) => Date.parse(slot.end) - Date.parse(slot.start);

describe("the spring-forward day has no skipped starts", () => {
  it("America/New_York, 2026-03-08: a shop open 01:00–04:00 offers no 02:xx start", () => {
    const hourly = fittingSlots(sundayShop("America/New_York", [["01:00", "04:00"]], "2026-03-08"));
    expect(startTimes(hourly)).toEqual(["01:00-05:00", "03:00-04:00"]);
    expect(hourly[0]!.end).toBe("2026-03-08T03:00:00-04:00"); // one real hour after 01:00 EST
    const halfHourly = fittingSlots(sundayShop("America/New_York", [["01:00", "04:00"]], "2026-03-08", 30));
    expect(startTimes(halfHourly)).toEqual(["01:00-05:00", "01:30-05:00", "03:00-04:00", "03:30-04:00"]);
  });

  it("an opening or closing time the clock jumps over stands for the jump itself", () => {
    const opensInGap = fittingSlots(sundayShop("America/New_York", [["02:30", "05:00"]], "2026-03-08"));
    expect(startTimes(opensInGap)).toEqual(["03:00-04:00", "04:00-04:00"]);
    const closesInGap = fittingSlots(sundayShop("America/New_York", [["00:00", "02:30"]], "2026-03-08"));
    expect(closesInGap.map((slot) => slot.start)).toEqual(["2026-03-08T00:00:00-05:00", "2026-03-08T01:00:00-05:00"]);
    expect(closesInGap.at(-1)!.end).toBe("2026-03-08T03:00:00-04:00");
  });

  it("Europe/Berlin, 2026-03-29: 02:00–03:00 does not exist", () => {
    const slots = fittingSlots(sundayShop("Europe/Berlin", [["01:00", "04:00"]], "2026-03-29"));
    expect(startTimes(slots)).toEqual(["01:00+01:00", "03:00+02:00"]);
  });

  it("Australia/Lord_Howe, 2026-10-04: only half an hour is skipped", () => {
    const slots = fittingSlots(sundayShop("Australia/Lord_Howe", [["01:00", "04:00"]], "2026-10-04", 30));
    expect(startTimes(slots)).toEqual(["01:00+10:30", "01:30+10:30", "02:30+11:00", "03:00+11:00", "03:30+11:00"]);
  });
});

describe("the fall-back day offers the repeated hour once per real instant", () => {
  it("America/New_York, 2026-11-01: 01:00–03:00 is three real hours, no instant twice", () => {
    const slots = fittingSlots(sundayShop("America/New_York", [["01:00", "03:00"]], "2026-11-01"));
    expect(slots.map((slot) => slot.start)).toEqual(["2026-11-01T01:00:00-04:00", "2026-11-01T01:00:00-05:00", "2026-11-01T02:00:00-05:00"]);
    expect(slots.every((slot) => lengthMs(slot) === HOUR_MS)).toBe(true);
    const halfHourly = fittingSlots(sundayShop("America/New_York", [["01:00", "02:00"]], "2026-11-01", 30));
    expect(startTimes(halfHourly)).toEqual(["01:00-04:00", "01:30-04:00", "01:00-05:00", "01:30-05:00"]);
  });

  it("a closing time the clock shows twice closes at its second showing", () => {
    const slots = fittingSlots(sundayShop("America/New_York", [["00:00", "01:30"]], "2026-11-01", 30));
    expect(startTimes(slots)).toEqual(["00:00-04:00", "00:30-04:00", "01:00-04:00", "01:30-04:00", "01:00-05:00"]);
    expect(slots.at(-1)!.end).toBe("2026-11-01T01:30:00-05:00");
  });

  it("intervals that meet inside the repeated hour still offer no instant twice", () => {
    const slots = fittingSlots(sundayShop("America/New_York", [["01:00", "01:30"], ["01:30", "02:00"]], "2026-11-01", 30));
    const starts = slots.map((slot) => Date.parse(slot.start));
    expect(new Set(starts).size).toBe(starts.length);
  });

  it("Europe/Berlin, 2026-10-25: 02:00–03:00 occurs twice", () => {
    const slots = fittingSlots(sundayShop("Europe/Berlin", [["02:00", "04:00"]], "2026-10-25"));
    expect(startTimes(slots)).toEqual(["02:00+02:00", "02:00+01:00", "03:00+01:00"]);
  });

  it("Australia/Lord_Howe, 2026-04-05: 01:30–02:00 occurs twice", () => {
    const slots = fittingSlots(sundayShop("Australia/Lord_Howe", [["01:00", "03:00"]], "2026-04-05", 30));
    expect(startTimes(slots)).toEqual(["01:00+11:00", "01:30+11:00", "01:30+10:30", "02:00+10:30", "02:30+10:30"]);
  });
});

describe("around each transition, every fitting lasts its real length", () => {
  const aroundTransitions: [string, string][] = [
    ["America/New_York", "2026-03-06"], ["America/New_York", "2026-10-30"],
    ["Europe/Berlin", "2026-03-27"], ["Europe/Berlin", "2026-10-23"],
    ["Australia/Lord_Howe", "2026-04-03"], ["Australia/Lord_Howe", "2026-10-02"],
    ["Pacific/Honolulu", "2026-03-06"],
  ];
  const day: [string, string][] = [["00:00", "24:00"]];
  const allWeek = weekOpen({ mon: day, tue: day, wed: day, thu: day, fri: day, sat: day, sun: day });

  it.each(aroundTransitions)("%s, four days from %s", (timeZone, from) => {
    const slots = fittingSlots({ timeZone, hours: allWeek, fittingBays: 1, fittingMinutes: 90, now: "2026-01-01T00:00:00Z", from, days: 4 });
    const starts = slots.map((slot) => Date.parse(slot.start));
    expect(starts.every((start, index) => index === 0 || start > starts[index - 1]!)).toBe(true);
    expect(slots.every((slot) => lengthMs(slot) === 1.5 * HOUR_MS)).toBe(true);
  });
});

describe("a shop in another zone than the machine", () => {
  it("Pacific/Honolulu: hours and today are Honolulu's", () => {
    const slots = fittingSlots({
      timeZone: "Pacific/Honolulu",
      hours: weekOpen({ mon: [["08:00", "10:00"]], tue: [["08:00", "10:00"]] }),
      fittingBays: 1,
      fittingMinutes: 60,
      now: "2026-12-08T05:00:00Z", // still Monday 19:00 in Honolulu
      days: 2,
    });
    expect(slots.map((slot) => slot.start)).toEqual(["2026-12-08T08:00:00-10:00", "2026-12-08T09:00:00-10:00"]);
  });
});

describe("the end of a local day", () => {
  const hoursLong = (date: string, previous: string, timeZone: string) =>
    (Date.parse(endOfLocalDay(date, timeZone)) - Date.parse(endOfLocalDay(previous, timeZone))) / HOUR_MS;

  it("is the first instant of the next day, with that day's offset", () => {
    expect(endOfLocalDay("2026-12-05", "America/New_York")).toBe("2026-12-06T00:00:00-05:00");
    expect(endOfLocalDay("2026-03-08", "America/New_York")).toBe("2026-03-09T00:00:00-04:00");
    expect(endOfLocalDay("2026-11-01", "America/New_York")).toBe("2026-11-02T00:00:00-05:00");
    expect(endOfLocalDay("2026-03-29", "Europe/Berlin")).toBe("2026-03-30T00:00:00+02:00");
    expect(endOfLocalDay("2026-10-25", "Europe/Berlin")).toBe("2026-10-26T00:00:00+01:00");
    expect(endOfLocalDay("2026-12-31", "Pacific/Honolulu")).toBe("2027-01-01T00:00:00-10:00");
  });

  it("makes a daylight-saving day as long as it really is", () => {
    expect(hoursLong("2026-03-08", "2026-03-07", "America/New_York")).toBe(23);
    expect(hoursLong("2026-11-01", "2026-10-31", "America/New_York")).toBe(25);
    expect(hoursLong("2026-10-25", "2026-10-24", "Europe/Berlin")).toBe(25);
    expect(hoursLong("2026-10-04", "2026-10-03", "Australia/Lord_Howe")).toBe(23.5);
  });

  it("refuses a date that does not exist or an unknown zone, naming the field", () => {
    expect(() => endOfLocalDay("2026-02-29", "America/New_York")).toThrow(/^date: a date is written YYYY-MM-DD/);
    expect(() => endOfLocalDay("2026-12-05", "Mars/Olympus")).toThrow(/^timeZone: not a time zone/);
  });
});
