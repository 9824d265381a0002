import ical, { ICalCalendarMethod, ICalEventStatus } from "ical-generator";
import { z } from "zod";
import { lineText, multiLineText } from "@/lib/validation/text";
import { instantSchema, readInput } from "./inputs";

/** A UID in visible ASCII with no spaces, e.g. fitting-42@sidewise.example: every calendar program keeps such a value as it is. */
const uidSchema = z.string().regex(/^[\x21-\x7E]{1,255}$/, "a UID is 1–255 visible ASCII characters, no spaces");

const fittingEventSchema = z
  .object({
    method: z.enum(["PUBLISH", "CANCEL"]),
    uid: uidSchema,
    sequence: z.int().min(0).max(2 ** 31 - 1),
    stamp: instantSchema,
    start: instantSchema,
    end: instantSchema,
    summary: lineText().min(1).max(200),
    description: multiLineText().max(4000).default(""),
    location: lineText().min(1).max(300),
    organizer: z.object({ name: lineText().min(1).max(200), email: z.email() }).optional(),
  })
  .refine(({ start, end }) => new Date(start).getTime() < new Date(end).getTime(), { message: "a fitting ends after it starts", path: ["end"] });

export type FittingEvent = z.input<typeof fittingEventSchema>;

/**
 * One fitting as an iCalendar object (RFC 5545) for a driver's calendar: PUBLISH announces it,
 * CANCEL withdraws it and must carry the same UID with a higher SEQUENCE. Times are written in UTC
 * (the "Z" form), so no VTIMEZONE is needed and no calendar can read them in the wrong zone. The
 * text has CRLF line endings and lines folded at 75 octets. Throws a FittingsInputError naming the
 * field for malformed input.
 */
export function fittingCalendar(event: FittingEvent): string {
  const fitting = readInput(fittingEventSchema, event, "calendar");
  const cancelled = fitting.method === "CANCEL";
  const calendar = ical({
    prodId: { company: "Sidewise", product: "Fittings", language: "EN" },
    method: cancelled ? ICalCalendarMethod.CANCEL : ICalCalendarMethod.PUBLISH,
  });
  calendar.createEvent({
    id: fitting.uid,
    sequence: fitting.sequence,
    stamp: new Date(fitting.stamp),
    start: new Date(fitting.start),
    end: new Date(fitting.end),
    summary: fitting.summary,
    description: fitting.description || null,
    location: fitting.location,
    organizer: fitting.organizer ?? null,
    status: cancelled ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
  });
  const text = calendar.toString();
  // RFC 5545 section 3.1 ends every content line with CRLF, the last one too; the library leaves the last bare.
  return text.endsWith("\r\n") ? text : `${text}\r\n`;
}
