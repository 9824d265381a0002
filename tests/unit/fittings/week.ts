import type { WeeklyHours } from "@/lib/tire";

type Intervals = [string, string][];

/** A week closed every day but those given. */
export function weekOpen(days: Partial<WeeklyHours>): WeeklyHours {
  return { mon: [], tue: [], wed: [], thu: [], fri: [], sat: [], sun: [], ...days };
}

/** The same intervals Monday to Friday, closed at the weekend unless given. */
export function weekdays(intervals: Intervals, weekend: Partial<WeeklyHours> = {}): WeeklyHours {
  return weekOpen({ mon: intervals, tue: intervals, wed: intervals, thu: intervals, fri: intervals, ...weekend });
}

/** The wall-clock part of each start: "2026-12-07T09:00:00-05:00" → "09:00-05:00". */
export function startTimes(slots: { start: string }[]): string[] {
  return slots.map((slot) => slot.start.slice(11, 16) + slot.start.slice(19));
}
