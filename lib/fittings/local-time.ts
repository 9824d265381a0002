import { Temporal } from "temporal-polyfill";
import { instantSchema, localDateSchema, readInput, timeZoneSchema } from "./inputs";

/**
 * The shop's wall clock: local dates and times in its IANA time zone, turned into real instants.
 * Opening hours are wall-clock times, so on a daylight-saving day a local time may not exist (the
 * clock jumps over it) or may occur twice (the clock goes back over it); `wallTimeInstant` says which
 * instant each edge of an opening interval means.
 */

/** Which edge of an opening interval a wall-clock time marks. */
export type IntervalEdge = "opens" | "closes";

/**
 * The instant a wall-clock time on a local date stands for, as one edge of an opening interval.
 * A time the clock jumps over stands for the jump itself (the first instant after it), whichever
 * the edge. A time the clock shows twice opens at its first occurrence and closes at its second,
 * so an interval across a fall-back hour keeps every real minute the clock shows inside it.
 * "24:00" is the first instant of the next local day.
 */
export function wallTimeInstant(date: Temporal.PlainDate, time: string, timeZone: string, edge: IntervalEdge): Temporal.ZonedDateTime {
  if (time === "24:00") return date.add({ days: 1 }).toZonedDateTime(timeZone);
  const wall = date.toPlainDateTime(Temporal.PlainTime.from(time));
  const earlier = wall.toZonedDateTime(timeZone, { disambiguation: "earlier" });
  const later = wall.toZonedDateTime(timeZone, { disambiguation: "later" });
  if (earlier.epochMilliseconds === later.epochMilliseconds) return earlier;
  const skipped = !earlier.toPlainDateTime().equals(wall);
  if (skipped) return earlier.getTimeZoneTransition("next") ?? later;
  return edge === "opens" ? earlier : later;
}

/** An instant as ISO 8601 with the shop's offset at that instant: 2026-12-05T09:00:00-05:00. */
export function offsetDateTime(epochMilliseconds: number, timeZone: string): string {
  return Temporal.Instant.fromEpochMilliseconds(epochMilliseconds)
    .toZonedDateTimeISO(timeZone)
    .toString({ timeZoneName: "never", smallestUnit: "second" });
}

/** Milliseconds since the epoch of a Date or of an ISO 8601 text that carries its offset (or Z); null when unreadable. */
export function epochMillisecondsOf(instant: Date | string): number | null {
  if (instant instanceof Date) return Number.isNaN(instant.getTime()) ? null : instant.getTime();
  try {
    return Temporal.Instant.from(instant).epochMilliseconds;
  } catch {
    return null;
  }
}

/** The local date (YYYY-MM-DD) in a time zone at an instant. */
export function todayIn(timeZone: string, now: Date | string): string {
  const zone = readInput(timeZoneSchema, timeZone, "timeZone");
  const epoch = epochMillisecondsOf(readInput(instantSchema, now, "now"))!;
  return Temporal.Instant.fromEpochMilliseconds(epoch).toZonedDateTimeISO(zone).toPlainDate().toString();
}

/**
 * The instant a local day ends in a time zone: the first instant of the next day, with the offset
 * then in force. Something valid until that date stays valid while "now" is before this instant.
 */
export function endOfLocalDay(date: string, timeZone: string): string {
  const day = Temporal.PlainDate.from(readInput(localDateSchema, date, "date"));
  const zone = readInput(timeZoneSchema, timeZone, "timeZone");
  return day.add({ days: 1 }).toZonedDateTime(zone).toString({ timeZoneName: "never", smallestUnit: "second" });
}

/** A local date some days later (or earlier), YYYY-MM-DD. */
export function addLocalDays(date: string, days: number): string {
  return Temporal.PlainDate.from(readInput(localDateSchema, date, "date")).add({ days }).toString();
}
