/**
 * Dates, times and counts as the Counter and the public pages show them: one language, and the time
 * zone as a parameter (the pages pass the shop's, read through lib/shop; UTC when there is none).
 * Prices are lib/money's; tire figures are lib/tire's.
 */
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

/**
 * "Dec 4, 2026, 3:05 PM EST": a time that says which zone it is in, by the zone's short name
 * ("HST", or "GMT+1" where English has no abbreviation); with `seconds`, "3:05:09 PM EST".
 */
export function formatDateTime(date: Date | string, { timeZone = DEFAULT_TIME_ZONE, seconds = false } = {}): string {
  const second = seconds ? "2-digit" : undefined;
  return dateFormat({ year: "numeric", month: "short", day: "numeric", hour: "numeric", minute: "2-digit", second, timeZoneName: "short", timeZone }).format(new Date(date));
}

/** "3:05 PM EST": a time of day that names its zone, for lists already grouped by day. */
export function formatTime(date: Date | string, { timeZone = DEFAULT_TIME_ZONE } = {}): string {
  return dateFormat({ hour: "numeric", minute: "2-digit", timeZoneName: "short", timeZone }).format(new Date(date));
}

/** "Friday, December 4, 2026": a local date (YYYY-MM-DD) as a heading, read as the date it names whatever the zone. */
export function formatLocalDate(day: string, { long = true } = {}): string {
  return dateFormat({ dateStyle: long ? "full" : "medium", timeZone: "UTC" }).format(new Date(`${day}T12:00:00Z`));
}

/** "times in America/New_York (the shop's time)": the caption of a list of times in the shop's zone. */
export const shopTimesCaption = (timeZone: string): string => `times in ${timeZone} (the shop's time)`;

/** 12,345 */
export function formatCount(count: number): string {
  return count.toLocaleString(LOCALE);
}

/** "12 cards", "1 card". */
export function countOf(count: number, one: string, many = `${one}s`): string {
  return `${formatCount(count)} ${count === 1 ? one : many}`;
}
