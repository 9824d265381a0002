import { z } from "zod";
import { WEEKDAYS, type Weekday } from "@/lib/tire";
import { instantSchema, localDateSchema, timeZoneSchema } from "./inputs";

/** How far ahead one request for free times may look. */
export const MAX_SLOT_DAYS = 62;

const clockTimeSchema = z
  .string()
  .regex(/^(([01]\d|2[0-3]):[0-5]\d|24:00)$/, "a time is written HH:MM, from 00:00 to 24:00");

// "HH:MM" texts compare in clock order as plain strings.
const openingIntervalSchema = z
  .tuple([clockTimeSchema, clockTimeSchema])
  .refine(([opens, closes]) => opens < closes, "an opening interval closes after it opens");

const dayHoursSchema = z
  .array(openingIntervalSchema)
  .refine(
    (intervals) => intervals.every((interval, index) => index === 0 || intervals[index - 1]![1] <= interval[0]),
    "a day's intervals are listed in order and do not overlap",
  );

export const weeklyHoursSchema = z.object(
  Object.fromEntries(WEEKDAYS.map((day) => [day, dayHoursSchema])) as Record<Weekday, typeof dayHoursSchema>,
);

/** A booking that occupies a bay: its start alone (it lasts one fitting) or its start and end. */
export const takenBookingSchema = z.union([
  instantSchema,
  z
    .object({ start: instantSchema, end: instantSchema })
    .refine(({ start, end }) => new Date(start).getTime() < new Date(end).getTime(), "a booking ends after it starts"),
]);

export const slotRequestSchema = z.object({
  timeZone: timeZoneSchema,
  hours: weeklyHoursSchema,
  closedDates: z.array(localDateSchema).default([]),
  fittingBays: z.int().min(1, "a shop fits on at least one bay").max(50),
  fittingMinutes: z.int().min(5, "a fitting lasts at least 5 minutes").max(12 * 60),
  leadMinutes: z.int().min(0).max(60 * 24 * 60).default(0),
  now: instantSchema,
  from: localDateSchema.optional(),
  days: z.int().min(1).max(MAX_SLOT_DAYS).default(14),
  taken: z.array(takenBookingSchema).default([]),
});

export type SlotRequest = z.input<typeof slotRequestSchema>;
