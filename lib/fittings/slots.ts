import { Temporal } from "temporal-polyfill";
import { WEEKDAYS } from "@/lib/tire";
import { readInput } from "./inputs";
import { epochMillisecondsOf, offsetDateTime, todayIn, wallTimeInstant } from "./local-time";
import { slotRequestSchema, type SlotRequest } from "./slot-request";

/** A free fitting time, both ends ISO 8601 with the shop's offset: 2026-12-05T09:00:00-05:00. */
export type FittingSlot = { start: string; end: string };

type Span = { start: number; end: number };

const MINUTE_MS = 60_000;

/**
 * The free fitting times from `from` (default: today in the shop's zone) for `days` local dates.
 *
 * Each local date is read with that date's own offsets: an opening interval runs from the instant
 * its opening time stands for to the instant its closing time stands for (see `wallTimeInstant`),
 * and starts are real instants `fittingMinutes` apart from the opening, each ending by the close.
 * So on a spring-forward day the skipped hour yields no start, and on a fall-back day a 01:00–03:00
 * interval is three real hours long and no instant is offered twice. A start is free when it is at
 * least `leadMinutes` after `now` and fewer than `fittingBays` bookings overlap it at any moment.
 * Throws a FittingsInputError naming the field for malformed settings.
 */
export function fittingSlots(request: SlotRequest): FittingSlot[] {
  const settings = readInput(slotRequestSchema, request, "slots");
  const { timeZone, hours, fittingBays } = settings;
  const now = epochMillisecondsOf(settings.now)!;
  const stepMs = settings.fittingMinutes * MINUTE_MS;
  const earliestStart = now + settings.leadMinutes * MINUTE_MS;
  const closed = new Set(settings.closedDates);
  const bookings = settings.taken.map((booking) => bookingSpan(booking, stepMs));
  const first = Temporal.PlainDate.from(settings.from ?? todayIn(timeZone, new Date(now)));

  const starts = new Set<number>();
  for (let offset = 0; offset < settings.days; offset++) {
    const date = first.add({ days: offset });
    if (closed.has(date.toString())) continue;
    for (const [opens, closes] of hours[WEEKDAYS[date.dayOfWeek - 1]!]) {
      const intervalEnd = wallTimeInstant(date, closes, timeZone, "closes").epochMilliseconds;
      let start = wallTimeInstant(date, opens, timeZone, "opens").epochMilliseconds;
      for (; start + stepMs <= intervalEnd; start += stepMs) {
        if (start < earliestStart) continue;
        if (mostAtOnce(bookings, { start, end: start + stepMs }) >= fittingBays) continue;
        starts.add(start);
      }
    }
  }
  return [...starts]
    .sort((a, b) => a - b)
    .map((start) => ({ start: offsetDateTime(start, timeZone), end: offsetDateTime(start + stepMs, timeZone) }));
}

function bookingSpan(booking: Date | string | { start: Date | string; end: Date | string }, stepMs: number): Span {
  if (typeof booking === "object" && !(booking instanceof Date)) {
    return { start: epochMillisecondsOf(booking.start)!, end: epochMillisecondsOf(booking.end)! };
  }
  const start = epochMillisecondsOf(booking)!;
  return { start, end: start + stepMs };
}

/** The most bookings that overlap one another at any moment inside the span. */
function mostAtOnce(bookings: Span[], span: Span): number {
  const overlapping = bookings.filter((booking) => booking.start < span.end && span.start < booking.end);
  // The count can only rise where a booking starts, so checking those moments (and the span's start) suffices.
  const moments = [span.start, ...overlapping.map((booking) => booking.start).filter((moment) => moment > span.start)];
  return Math.max(0, ...moments.map((moment) => overlapping.filter((booking) => booking.start <= moment && moment < booking.end).length));
}

/** True when two times name the same instant, whatever their offsets; false when either is unreadable. */
export function sameInstant(a: Date | string, b: Date | string): boolean {
  const first = epochMillisecondsOf(a);
  return first !== null && first === epochMillisecondsOf(b);
}

/** The slot starting at the requested instant, in any offset; undefined when none does. */
export function findSlot(slots: FittingSlot[], requested: Date | string): FittingSlot | undefined {
  return slots.find((slot) => sameInstant(slot.start, requested));
}
