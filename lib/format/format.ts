/**
 * Dates, times and counts as the Counter and the public pages show them: one language and one place
 * to say which time zone (UTC until the shop's settings hold one). Prices are lib/money's; tire figures
 * are lib/tire's.
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

/** "Dec 4, 2026, 3:05 PM" (with `seconds`, "3:05:09 PM"). */
export function formatDateTime(date: Date | string, { timeZone = DEFAULT_TIME_ZONE, seconds = false } = {}): string {
  return dateFormat({ dateStyle: "medium", timeStyle: seconds ? "medium" : "short", timeZone }).format(new Date(date));
}

/** 12,345 */
export function formatCount(count: number): string {
  return count.toLocaleString(LOCALE);
}

/** "12 cards", "1 card". */
export function countOf(count: number, one: string, many = `${one}s`): string {
  return `${formatCount(count)} ${count === 1 ? one : many}`;
}
