/**
 * What a week of opening hours and a list of closed dates must be, as pure checks that the API's
 * schema and the Counter's form share. Each problem says what is wrong and what to do.
 */

/** Enough for a lunch break and an evening opening; more is a typing mistake. */
export const MAX_INTERVALS_PER_DAY = 4;
/** A few years of holidays. */
export const MAX_CLOSED_DATES = 100;
export const CLOSED_DATE_YEARS = { first: 2000, last: 2099 } as const;

/** 00:00–23:59 on a 24-hour clock, and 24:00 for a day that runs to midnight. */
export const CLOCK_PATTERN = /^(?:(?:[01]\d|2[0-3]):[0-5]\d|24:00)$/;

export const CLOCK_RULE = "write times as HH:MM on a 24-hour clock, from 00:00 to 24:00 (e.g. 07:30 or 18:00)";

export const isClockTime = (text: string): boolean => CLOCK_PATTERN.test(text);

const minutesOf = (time: string) => Number(time.slice(0, 2)) * 60 + Number(time.slice(3, 5));

export interface IntervalProblem {
  /** Which interval of the day (0 = the first). */
  index: number;
  /** Which end: 0 opening, 1 closing; absent when the problem is the interval as a whole. */
  end?: 0 | 1;
  message: string;
}

/** The first thing wrong with one day's intervals, or null when they are ordered, well-formed and apart. */
export function dayHoursProblem(intervals: readonly (readonly [string, string])[]): IntervalProblem | null {
  if (intervals.length > MAX_INTERVALS_PER_DAY) {
    return { index: MAX_INTERVALS_PER_DAY, message: `a day has at most ${MAX_INTERVALS_PER_DAY} opening intervals: join or remove some` };
  }
  for (const [index, [from, to]] of intervals.entries()) {
    if (!isClockTime(from)) return { index, end: 0, message: `"${from}" is not a time: ${CLOCK_RULE}` };
    if (!isClockTime(to)) return { index, end: 1, message: `"${to}" is not a time: ${CLOCK_RULE}` };
    if (minutesOf(from) >= minutesOf(to)) {
      return { index, end: 1, message: `${from}–${to} closes before it opens: make the closing time later than the opening time (24:00 at the latest)` };
    }
    const before = intervals[index - 1];
    if (before && isClockTime(before[1]) && minutesOf(from) <= minutesOf(before[1])) {
      return {
        index,
        end: 0,
        message: `${from}–${to} opens before the interval before it closes (${before[1]}): list a day's intervals in order, with a break between them`,
      };
    }
  }
  return null;
}

/** Whether `text` is a YYYY-MM-DD date that exists in the calendar (no 2026-02-30). */
export function isCalendarDate(text: string): boolean {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!match) return false;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

/** What is wrong with one closed date, or null. */
export function closedDateProblem(text: string): string | null {
  if (!isCalendarDate(text)) return `"${text}" is not a date in the calendar: write it as YYYY-MM-DD, e.g. 2026-12-25`;
  const year = Number(text.slice(0, 4));
  if (year < CLOSED_DATE_YEARS.first || year > CLOSED_DATE_YEARS.last) {
    return `${text} is outside ${CLOSED_DATE_YEARS.first}–${CLOSED_DATE_YEARS.last}: check the year`;
  }
  return null;
}

/** The first problem in a list of closed dates with where it stands, or null. */
export function closedDatesProblem(dates: readonly string[]): { index: number | null; message: string } | null {
  if (dates.length > MAX_CLOSED_DATES) return { index: null, message: `at most ${MAX_CLOSED_DATES} closed dates: remove past ones first` };
  const seen = new Set<string>();
  for (const [index, date] of dates.entries()) {
    const problem = closedDateProblem(date);
    if (problem) return { index, message: problem };
    if (seen.has(date)) return { index, message: `${date} is listed twice: list each closed date once` };
    seen.add(date);
  }
  return null;
}
