import { Temporal } from "temporal-polyfill";
import { z } from "zod";

/** A refusal of what a fittings function was given, naming the field ("hours.mon[0]", "now"). */
export class FittingsInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
    this.name = "FittingsInputError";
  }
}

/** True for a time zone name the time-zone database knows ("America/New_York", "UTC"). */
export function isTimeZone(name: string): boolean {
  try {
    Temporal.Instant.fromEpochMilliseconds(0).toZonedDateTimeISO(name);
    return true;
  } catch {
    return false;
  }
}

export const timeZoneSchema = z.string().refine(isTimeZone, "not a time zone the time-zone database knows (e.g. America/New_York)");

/** A calendar date in the shop's zone, YYYY-MM-DD. */
export const localDateSchema = z.iso.date("a date is written YYYY-MM-DD and must exist");

/** An instant: a Date, or ISO 8601 with its offset or Z (a time without one names no instant). */
const INSTANT_FORM = "an instant is a date and time with its offset, e.g. 2026-12-05T09:00:00-05:00";
export const instantSchema = z.union([z.date(INSTANT_FORM), z.iso.datetime({ offset: true, error: INSTANT_FORM })], INSTANT_FORM);

function fieldOf(path: PropertyKey[], root: string): string {
  return path.reduce<string>((name, key) => (typeof key === "number" ? `${name}[${key}]` : `${name}.${String(key)}`), root);
}

/** Parses with a schema, or throws a FittingsInputError naming the first field at fault. */
export function readInput<Schema extends z.ZodType>(schema: Schema, value: unknown, root: string): z.output<Schema> {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0]!;
  throw new FittingsInputError(fieldOf(issue.path, root), issue.message);
}
