import { describe, expect, it } from "vitest";
import { describeOpeningHours } from "@/lib/shop/hours";
import { DEFAULT_WEEKLY_HOURS, type WeeklyHours } from "@/lib/tire";

const week = (weekday: [string, string][], saturday: [string, string][] = [], sunday: [string, string][] = []): WeeklyHours => ({
  mon: weekday, tue: weekday, wed: weekday, thu: weekday, fri: weekday, sat: saturday, sun: sunday,
});

describe("the opening hours in one line", () => {
  it("runs days with the same hours together and leaves closed days out", () => {
    expect(describeOpeningHours(DEFAULT_WEEKLY_HOURS)).toBe("Mon–Fri 08:00–17:00; Sat 08:00–12:00");
    expect(describeOpeningHours(week([["07:30", "12:00"], ["13:00", "18:00"]]))).toBe("Mon–Fri 07:30–12:00, 13:00–18:00");
  });

  it("starts a new run after a closed day or a change, and says when the shop is never open", () => {
    const hours = { ...week([["08:00", "17:00"]]), wed: [] };
    expect(describeOpeningHours(hours)).toBe("Mon–Tue 08:00–17:00; Thu–Fri 08:00–17:00");
    expect(describeOpeningHours({ ...week([["08:00", "17:00"]]), fri: [["08:00", "15:00"]] })).toBe("Mon–Thu 08:00–17:00; Fri 08:00–15:00");
    expect(describeOpeningHours(week([]))).toBe("Closed");
  });
});
