import { describe, expect, it } from "vitest";
import { addCalendarDays, formatCalendarDate, formatDateTime, formatDay, formatTime, shopTimesCaption } from "@/lib/format/format";

// 2026-12-05 14:14 UTC is 09:14 in New York (EST, UTC−5) and 04:14 in Honolulu (HST, UTC−10, no daylight saving);
// 2026-07-05 14:14 UTC is 10:14 EDT (UTC−4). Offsets from the IANA time zone database.
const winter = new Date("2026-12-05T14:14:00Z");
const summer = new Date("2026-07-05T14:14:00Z");

describe("dates and times in the shop's time zone", () => {
  it("say which zone a time is in, daylight saving included", () => {
    expect(formatDateTime(winter, { timeZone: "America/New_York" })).toBe("Dec 5, 2026, 9:14 AM EST");
    expect(formatDateTime(summer, { timeZone: "America/New_York" })).toBe("Jul 5, 2026, 10:14 AM EDT");
    expect(formatDateTime(winter, { timeZone: "Pacific/Honolulu" })).toBe("Dec 5, 2026, 4:14 AM HST");
    expect(formatDateTime(winter, { timeZone: "Pacific/Honolulu", seconds: true })).toBe("Dec 5, 2026, 4:14:00 AM HST");
    expect(formatDateTime(winter)).toBe("Dec 5, 2026, 2:14 PM UTC");
  });

  it("put a day on the shop's calendar, which may differ from UTC's", () => {
    const lateEvening = new Date("2026-12-05T03:30:00Z");
    expect(formatDay(lateEvening, { timeZone: "America/New_York" })).toBe("Dec 4, 2026");
    expect(formatDay(lateEvening)).toBe("Dec 5, 2026");
  });

  it("give a local date as the date it names in any zone", () => {
    expect(formatCalendarDate("2026-12-07", "full")).toBe("Monday, December 7, 2026");
    expect(formatCalendarDate("2026-12-07")).toBe("Dec 7, 2026");
  });

  it("name the zone in a list's caption", () => {
    expect(shopTimesCaption("Pacific/Honolulu")).toBe("times in Pacific/Honolulu (the shop's time)");
  });
});

describe("calendar dates and times of day", () => {
  it("write a YYYY-MM-DD date as the same day whatever the zone", () => {
    // 2026-12-08 is a Tuesday (Gregorian calendar).
    expect(formatCalendarDate("2026-12-08")).toBe("Dec 8, 2026");
    expect(formatCalendarDate("2026-12-08", "long")).toBe("December 8, 2026");
    expect(formatCalendarDate("2026-12-08", "full")).toBe("Tuesday, December 8, 2026");
    expect(formatCalendarDate("2026-12-08", "short")).toBe("Tue, Dec 8");
  });

  it("count calendar days across a month, a year and a daylight-saving change", () => {
    expect(addCalendarDays("2026-12-25", 14)).toBe("2027-01-08");
    expect(addCalendarDays("2026-03-01", 14)).toBe("2026-03-15");
    expect(addCalendarDays("2028-02-28", 1)).toBe("2028-02-29"); // 2028 is a leap year (Gregorian calendar)
    expect(addCalendarDays("2026-11-10", -14)).toBe("2026-10-27");
  });

  it("give a time of day in the shop's zone", () => {
    expect(formatTime(winter, { timeZone: "America/New_York" })).toBe("9:14 AM");
    expect(formatTime("2026-12-08T09:00:00-05:00", { timeZone: "America/New_York" })).toBe("9:00 AM");
  });
});
