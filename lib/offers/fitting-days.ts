import { z } from "zod";
import { addLocalDays, endOfLocalDay } from "@/lib/fittings";

export const FITTING_VIEWS = ["day", "week"] as const;
export type FittingView = (typeof FITTING_VIEWS)[number];

/**
 * `/counter/fittings?day=YYYY-MM-DD&view=week`: a day that is no real date, or a view the page does
 * not know, is dropped (the page shows today's fittings), so an old or mistyped link still opens.
 */
export const fittingsQuerySchema = z.object({
  day: z.iso.date().optional().catch(undefined),
  view: z.enum(FITTING_VIEWS).catch("day").default("day"),
});
export type FittingsQuery = z.infer<typeof fittingsQuerySchema>;

/** The Monday of a local date's week (weeks run Monday to Sunday, as the shop's hours do). */
export function mondayOf(day: string): string {
  const weekday = new Date(`${day}T00:00:00Z`).getUTCDay();
  return addLocalDays(day, -((weekday + 6) % 7));
}

export interface FittingSpan {
  /** The local dates shown, in order. */
  days: string[];
  /** The instants they cover in the shop's zone: [from, to). */
  from: Date;
  to: Date;
  previous: string;
  next: string;
}

/** The local dates a view shows around `day`, the instants they span in `timeZone`, and the days the previous and next links open. */
export function fittingSpan(day: string, view: FittingView, timeZone: string): FittingSpan {
  const first = view === "week" ? mondayOf(day) : day;
  const length = view === "week" ? 7 : 1;
  const days = Array.from({ length }, (_, index) => addLocalDays(first, index));
  return {
    days,
    from: new Date(endOfLocalDay(addLocalDays(first, -1), timeZone)),
    to: new Date(endOfLocalDay(days.at(-1)!, timeZone)),
    previous: addLocalDays(first, -length),
    next: addLocalDays(first, length),
  };
}

/** The address of a view of the fittings. */
export function fittingsHref(day: string, view: FittingView): string {
  return view === "week" ? `/counter/fittings?day=${day}&view=week` : `/counter/fittings?day=${day}`;
}
