import { describe, expect, it } from "vitest";
import { demoShop } from "@/lib/demo/shop";
import { applySettingsChanges, describeSettingChanges, settingChanges } from "@/lib/shop/settings-changes";
import type { ShopSettings } from "@/lib/shop/settings-schema";
import { formatTaxRate, parseTaxPercent, taxPercentText } from "@/lib/shop/tax-percent";
import { isTimeZoneName, listTimeZones } from "@/lib/shop/time-zone";
import { closedDateProblem, closedDatesProblem, dayHoursProblem, isCalendarDate, isClockTime } from "@/lib/shop/week-rules";

describe("a day's opening hours", () => {
  it("reads HH:MM on a 24-hour clock from 00:00 to 24:00", () => {
    for (const time of ["00:00", "07:30", "23:59", "24:00"]) expect(isClockTime(time), time).toBe(true);
    for (const time of ["7:30", "24:01", "25:00", "12:60", "12.30", "1230", " 12:30", "noon"]) expect(isClockTime(time), time).toBe(false);
  });

  it("takes closed days, a lunch break and a day that runs to midnight", () => {
    expect(dayHoursProblem([])).toBeNull();
    expect(dayHoursProblem([["08:00", "12:00"], ["13:00", "17:00"]])).toBeNull();
    expect(dayHoursProblem([["00:00", "24:00"]])).toBeNull();
  });

  it("refuses an interval that closes before it opens, intervals out of order, overlapping or touching, and more than four", () => {
    expect(dayHoursProblem([["17:00", "08:00"]])).toMatchObject({ index: 0, end: 1, message: expect.stringContaining("closes before it opens") });
    expect(dayHoursProblem([["08:00", "08:00"]])).toMatchObject({ index: 0 });
    expect(dayHoursProblem([["13:00", "17:00"], ["08:00", "12:00"]])).toMatchObject({ index: 1, end: 0, message: expect.stringContaining("in order") });
    expect(dayHoursProblem([["08:00", "12:30"], ["12:00", "17:00"]])).toMatchObject({ index: 1 });
    expect(dayHoursProblem([["08:00", "12:00"], ["12:00", "17:00"]])).toMatchObject({ index: 1, message: expect.stringContaining("break") });
    const five = [["06:00", "07:00"], ["08:00", "09:00"], ["10:00", "11:00"], ["12:00", "13:00"], ["14:00", "15:00"]] as [string, string][];
    expect(dayHoursProblem(five)).toMatchObject({ index: 4, message: expect.stringContaining("at most 4") });
    expect(dayHoursProblem([["8:00", "12:00"]])).toMatchObject({ index: 0, end: 0, message: expect.stringContaining("HH:MM") });
  });
});

describe("closed dates", () => {
  it("are dates the calendar has (Gregorian leap years: every 4th year, not centuries unless divisible by 400)", () => {
    expect(isCalendarDate("2028-02-29")).toBe(true);
    expect(isCalendarDate("2000-02-29")).toBe(true);
    expect(isCalendarDate("2100-02-29")).toBe(false);
    expect(isCalendarDate("2026-02-29")).toBe(false);
    expect(isCalendarDate("2026-02-30")).toBe(false);
    expect(isCalendarDate("2026-04-31")).toBe(false);
    expect(isCalendarDate("2026-13-01")).toBe(false);
    expect(isCalendarDate("2026-12-5")).toBe(false);
    expect(isCalendarDate("12/25/2026")).toBe(false);
  });

  it("lie in 2000–2099 and are listed once each, at most 100 of them", () => {
    expect(closedDateProblem("1999-12-31")).toContain("check the year");
    expect(closedDatesProblem(["2026-12-25", "2027-01-01"])).toBeNull();
    expect(closedDatesProblem(["2026-12-25", "2027-01-01", "2026-12-25"])).toEqual({ index: 2, message: "2026-12-25 is listed twice: list each closed date once" });
    expect(closedDatesProblem(Array.from({ length: 101 }, () => "2026-12-25"))).toMatchObject({ index: null });
  });
});

describe("the shop's time zone", () => {
  it("takes IANA names Intl can format in, UTC, and the current names ICU files under an older spelling", () => {
    for (const zone of ["America/New_York", "Pacific/Honolulu", "UTC", "Etc/UTC", "Asia/Kolkata", "Europe/Kyiv", "America/Argentina/Buenos_Aires", "US/Eastern"]) {
      expect(isTimeZoneName(zone), zone).toBe(true);
    }
  });

  it("refuses unknown names, other spellings, abbreviations, POSIX names, offsets and Etc/GMT±N", () => {
    for (const zone of ["Mars/Olympus", "america/new_york", "AMERICA/NEW_YORK", "EST", "EST5EDT", "GMT", "+05:00", "Etc/GMT+5", "", "New_York"]) {
      expect(isTimeZoneName(zone), zone).toBe(false);
    }
  });

  it("offers the runtime's list with UTC, sorted, every one of them accepted", () => {
    const zones = listTimeZones();
    expect(zones).toContain("UTC");
    expect(zones).toContain("America/New_York");
    expect([...zones].sort()).toEqual(zones);
    expect(zones.filter((zone) => !isTimeZoneName(zone))).toEqual([]);
  });
});

describe("the tax rate as a percent", () => {
  it("reads basis points from the typed digits, never through a float", () => {
    expect(parseTaxPercent("7.25")).toBe(725);
    expect(parseTaxPercent("7.25 %")).toBe(725);
    expect(parseTaxPercent(" 8% ")).toBe(800);
    expect(parseTaxPercent("7.5")).toBe(750);
    expect(parseTaxPercent(".5")).toBe(50);
    expect(parseTaxPercent("0")).toBe(0);
    expect(parseTaxPercent("100")).toBe(10_000);
    // 0.29 × 100 is 28.999999999999996 in floating point; 4.35 × 100 is 434.99999999999994.
    expect(parseTaxPercent("7.29")).toBe(729);
    expect(parseTaxPercent("4.35")).toBe(435);
    expect(parseTaxPercent("0.07")).toBe(7);
  });

  it("refuses more than two decimals, more than 100 %, signs, commas and words", () => {
    for (const text of ["7.255", "100.01", "101", "-1", "7,25", "seven", "", ".", "%", "1e2"]) expect(parseTaxPercent(text), text).toBeNull();
  });

  it("writes basis points back without trailing zeros", () => {
    expect([taxPercentText(725), taxPercentText(750), taxPercentText(800), taxPercentText(5), taxPercentText(0)]).toEqual(["7.25", "7.5", "8", "0.05", "0"]);
    expect(formatTaxRate(725)).toBe("7.25 %");
    for (let bp = 0; bp <= 10_000; bp += 1) expect(parseTaxPercent(taxPercentText(bp))).toBe(bp);
  });
});

describe("what a change of settings did", () => {
  const before: ShopSettings = {
    name: demoShop.name,
    address: { streetAddress: demoShop.streetAddress, town: demoShop.town, region: demoShop.region, postalCode: demoShop.postalCode },
    phone: demoShop.phone,
    email: demoShop.email,
    timeZone: "America/New_York",
    hours: demoShop.hours!,
    closedDates: ["2026-12-25", "2027-01-01"],
    tolerancePct: 3,
    fittingPerTireCents: 2_500,
    disposalPerTireCents: 400,
    tireFeePerTireCents: 100,
    taxRateBp: 725,
    taxServices: true,
    fittingBays: 2,
    fittingMinutes: 60,
    leadMinutes: 120,
    cancelCutoffHours: 24,
    wearLimit32: 2,
  };

  it("merges the address and the week part by part and sorts the closed dates", () => {
    const after = applySettingsChanges(before, { address: { postalCode: "43998" }, hours: { sun: [["10:00", "14:00"]] }, closedDates: ["2027-01-01", "2026-12-31"] });
    expect(after.address).toEqual({ ...before.address, postalCode: "43998" });
    expect(after.hours).toEqual({ ...before.hours, sun: [["10:00", "14:00"]] });
    expect(after.closedDates).toEqual(["2026-12-31", "2027-01-01"]);
  });

  it("lists only what differs, in words", () => {
    const after = applySettingsChanges(before, { taxRateBp: 800, tireFeePerTireCents: 150, closedDates: ["2026-12-31", "2027-01-01"], tolerancePct: 3, timeZone: "Pacific/Honolulu" });
    const changes = settingChanges(before, after);
    expect(changes.map((change) => change.field)).toEqual(["timeZone", "closedDates", "tireFeePerTireCents", "taxRateBp"]);
    expect(describeSettingChanges(changes)).toBe(
      "time zone America/New_York → Pacific/Honolulu; closed dates: 2026-12-31 added, 2026-12-25 removed; tire fee $1.00 → $1.50 per tire; tax rate 7.25 % → 8 %",
    );
    expect(settingChanges(before, applySettingsChanges(before, { name: before.name }))).toEqual([]);
  });
});
