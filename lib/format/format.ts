/**
 * Dates, times and counts as the Counter and the public pages show them: one language, and the time
 * zone as a parameter (the pages pass the shop's, read through lib/shop; UTC when there is none).
 * Prices are lib/money's; tire figures are lib/tire's.
 */
import { formatUpToDecimals } from "@/lib/tire/display";

export const LOCALE = "en-US";
export const DEFAULT_TIME_ZONE = "UTC";

const formatters = new Map<string, Intl.DateTimeFormat>();

function dateFormat(options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = JSON.stringify(options);
  let format = formatters.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat(LOCALE, options);
    formatters.set(key, format);
  }
  return format;
}

/** "Dec 4, 2026" (or "December 4, 2026" with `long`). */
export function formatDay(date: Date | string, { timeZone = DEFAULT_TIME_ZONE, long = false } = {}): string {
  return dateFormat({ dateStyle: long ? "long" : "medium", timeZone }).format(new Date(date));
}

const CALENDAR_STYLES = {
  medium: { dateStyle: "medium" },
  long: { dateStyle: "long" },
  full: { dateStyle: "full" },
  short: { weekday: "short", month: "short", day: "numeric" },
} satisfies Record<string, Intl.DateTimeFormatOptions>;

/**
 * A calendar date written YYYY-MM-DD (an offer's last day, a day of fitting times), which is the same
 * day in every zone: "Dec 8, 2026", "December 8, 2026" (long), "Tuesday, December 8, 2026" (full)
 * or "Tue, Dec 8" (short).
 */
export function formatCalendarDate(date: string, style: keyof typeof CALENDAR_STYLES = "medium"): string {
  return dateFormat({ ...CALENDAR_STYLES[style], timeZone: "UTC" }).format(new Date(`${date}T00:00:00Z`));
}

/** A calendar date (YYYY-MM-DD) some days later, or earlier: plain calendar arithmetic, in the browser too. */
export function addCalendarDays(date: string, days: number): string {
  return new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
}

/** "3:05 PM": a time of day alone, for a list whose caption names the zone (`shopTimesCaption`). */
export function formatTime(date: Date | string, { timeZone = DEFAULT_TIME_ZONE } = {}): string {
  return dateFormat({ hour: "numeric", minute: "2-digit", timeZone }).format(new Date(date));
}

/**
 * "Dec 4, 2026, 3:05 PM EST": a time that says which zone it is in, by the zone's short name
 * ("HST", or "GMT+1" where English has no abbreviation); with `seconds`, "3:05:09 PM EST".
 */
export function formatDateTime(date: Date | string, { timeZone = DEFAULT_TIME_ZONE, seconds = false } = {}): string {
  const second = seconds ? "2-digit" : undefined;
  return dateFormat({ year: "numeric", month: "short", day: "numeric", hour: "numeric", minute: "2-digit", second, timeZoneName: "short", timeZone }).format(new Date(date));
}

/** "times in America/New_York (the shop's time)": the caption of a list of times in the shop's zone. */
export const shopTimesCaption = (timeZone: string): string => `times in ${timeZone} (the shop's time)`;

/** 12,345 */
export function formatCount(count: number): string {
  return formatUpToDecimals(count, 3);
}

/** "12 cards", "1 card". */
export function countOf(count: number, one: string, many = `${one}s`): string {
  return `${formatCount(count)} ${count === 1 ? one : many}`;
}
