import { z } from "zod";
import { WEEKDAYS, type Weekday } from "@/lib/tire";
import { lineText } from "@/lib/validation/text";
import { FITTING_LIMITS, MAX_CHARGE_CENTS, WEAR_LIMIT_32 } from "./limits";
import { MAX_TAX_RATE_BP } from "./tax-percent";
import { isTimeZoneName, TIME_ZONE_RULE } from "./time-zone";
import { CLOCK_PATTERN, CLOCK_RULE, closedDatesProblem, dayHoursProblem, MAX_CLOSED_DATES } from "./week-rules";

const SETTINGS_FIELDS = [
  "name", "address", "phone", "email", "timeZone", "hours", "closedDates", "tolerancePct",
  "fittingPerTireCents", "disposalPerTireCents", "tireFeePerTireCents", "taxRateBp", "taxServices",
  "fittingBays", "fittingMinutes", "leadMinutes", "cancelCutoffHours", "wearLimit32",
] as const;
const ADDRESS_FIELDS = ["streetAddress", "town", "region", "postalCode"] as const;

/**
 * A key an object does not know. Not `.strict()`: zod reports unknown keys against the object, and
 * the API's error names the field itself; the JSON Schema still says no other key is allowed.
 */
const unknownKey = (message: string) =>
  z
    .unknown()
    .refine(() => false, { error: message })
    .meta({ not: {} });

const text = (what: string, max: number) =>
  lineText(`give ${what} as text`)
    .trim()
    .min(1, { error: `${what} cannot be empty: type it in` })
    .max(max, { error: `${what} is at most ${max} characters: shorten it` });

const wholeNumber = (message: string, min: number, max: number) =>
  z.number({ error: message }).int({ error: message }).min(min, { error: message }).max(max, { error: message });

const cents = (what: string) =>
  wholeNumber(`${what} is whole cents from 0 to ${MAX_CHARGE_CENTS} ($1,000.00), e.g. 2500 for $25.00`, 0, MAX_CHARGE_CENTS);

// Seven digits or more, in the characters a phone number is written with ("(555) 014-2290", "+1 555 014 2290 ext. 12").
const PHONE = /^(?=(?:\D*\d){7})[\d\s()+./-]+(?:\s*(?:ext\.?|x)\s*\d{1,6})?$/i;

const clock = z.string({ error: CLOCK_RULE }).regex(CLOCK_PATTERN, { error: CLOCK_RULE });

/** One day's opening intervals, in order and apart; [] is closed. */
export const dayHoursSchema = z
  .array(z.tuple([clock, clock], { error: 'give each interval as ["HH:MM", "HH:MM"], opening then closing' }), {
    error: 'give a day\'s hours as a list of ["HH:MM", "HH:MM"] intervals, [] for closed',
  })
  .superRefine((intervals, context) => {
    const problem = dayHoursProblem(intervals);
    if (problem) context.addIssue({ code: "custom", message: problem.message, path: [problem.index] });
  });

const weekShape = Object.fromEntries(WEEKDAYS.map((day) => [day, dayHoursSchema])) as Record<Weekday, typeof dayHoursSchema>;

/** A change of hours: the days named are replaced, the others kept. */
export const weeklyHoursChangesSchema = z
  .object(weekShape, { error: "give the hours as an object of days (mon … sun), each a list of intervals" })
  .partial()
  .catchall(unknownKey(`not a day of the week: use ${WEEKDAYS.join(", ")}`))
  .refine((days) => Object.keys(days).length > 0, { error: "name at least one day (mon … sun) whose hours change" });

export const closedDatesSchema = z
  .array(z.string({ error: "give each closed date as text, YYYY-MM-DD" }), { error: "give the closed dates as a list of YYYY-MM-DD dates" })
  .max(MAX_CLOSED_DATES, { error: `at most ${MAX_CLOSED_DATES} closed dates: remove past ones first` })
  .superRefine((dates, context) => {
    const problem = closedDatesProblem(dates);
    if (problem) context.addIssue({ code: "custom", message: problem.message, path: problem.index === null ? [] : [problem.index] });
  });

const addressChangesSchema = z
  .object(
    { streetAddress: text("the street address", 200), town: text("the town", 100), region: text("the region (state)", 60), postalCode: text("the postal code", 20) },
    { error: "give the address as an object with streetAddress, town, region and postalCode" },
  )
  .partial()
  .catchall(unknownKey(`not a part of the address: remove it (the parts are ${ADDRESS_FIELDS.join(", ")})`))
  .refine((address) => Object.keys(address).length > 0, { error: "name at least one part of the address to change" });

/** PATCH /api/v1/shop: any of the settings, each checked in full; a setting not named stays as it is. */
export const shopSettingsChangesSchema = z
  .object({
    name: text("the shop's name", 100),
    address: addressChangesSchema,
    phone: text("the phone number", 40).regex(PHONE, { error: "write the phone number with at least 7 digits, e.g. (555) 014-2290" }),
    email: z.email({ error: "give the shop's e-mail address, e.g. counter@example.com" }).max(254, { error: "the e-mail address is at most 254 characters" }),
    timeZone: z.string({ error: TIME_ZONE_RULE }).refine(isTimeZoneName, { error: TIME_ZONE_RULE }),
    hours: weeklyHoursChangesSchema,
    closedDates: closedDatesSchema,
    tolerancePct: z
      .number({ error: "the default tolerance is a number of percent from 1 to 5, e.g. 3" })
      .min(1, { error: "the default tolerance is at least 1 %: the finder allows 1–5 %" })
      .max(5, { error: "the default tolerance is at most 5 %: the finder allows 1–5 %" }),
    fittingPerTireCents: cents("fitting per tire"),
    disposalPerTireCents: cents("disposal per tire"),
    tireFeePerTireCents: cents("the tire fee per new tire"),
    taxRateBp: wholeNumber(`the tax rate is whole basis points from 0 to ${MAX_TAX_RATE_BP}: 725 for 7.25 %`, 0, MAX_TAX_RATE_BP),
    taxServices: z.boolean({ error: "taxServices is true (fitting and disposal are taxed) or false" }),
    fittingBays: wholeNumber(`fittingBays is how many sets can be fitted at once, a whole number from 1 to ${FITTING_LIMITS.bays.max}`, 1, FITTING_LIMITS.bays.max),
    fittingMinutes: wholeNumber(
      `fittingMinutes is how long one set takes, whole minutes from ${FITTING_LIMITS.minutes.min} to ${FITTING_LIMITS.minutes.max}, e.g. 60`,
      FITTING_LIMITS.minutes.min,
      FITTING_LIMITS.minutes.max,
    ),
    leadMinutes: wholeNumber(`leadMinutes is the earliest start from now, whole minutes from 0 to ${FITTING_LIMITS.leadMinutes.max} (14 days)`, 0, FITTING_LIMITS.leadMinutes.max),
    cancelCutoffHours: wholeNumber(
      `cancelCutoffHours is until how many hours before a fitting a driver can cancel online, from 0 to ${FITTING_LIMITS.cancelCutoffHours.max}`,
      0,
      FITTING_LIMITS.cancelCutoffHours.max,
    ),
    wearLimit32: z
      .number({ error: WEAR_LIMIT_32.rule })
      .min(WEAR_LIMIT_32.min, { error: WEAR_LIMIT_32.rule })
      .max(WEAR_LIMIT_32.max, { error: WEAR_LIMIT_32.rule })
      .refine((value) => Number.isInteger(value * 2), { error: WEAR_LIMIT_32.rule }),
  })
  .partial()
  .catchall(unknownKey(`not a setting of the shop: remove it (the settings are ${SETTINGS_FIELDS.join(", ")})`))
  .refine((changes) => Object.keys(changes).length > 0, { error: `name at least one setting to change (${SETTINGS_FIELDS.join(", ")})` });

export type ShopSettingsChanges = z.infer<typeof shopSettingsChangesSchema>;

const interval = z.tuple([z.string(), z.string()]);
const dayAnswer = z.array(interval);

/** GET /api/v1/shop, and PATCH's answer: the settings as they are now. */
export const shopSettingsSchema = z.object({
  name: z.string(),
  address: z.object({ streetAddress: z.string(), town: z.string(), region: z.string(), postalCode: z.string() }),
  phone: z.string(),
  email: z.string(),
  /** An IANA time zone name. */
  timeZone: z.string(),
  /** Opening intervals per day, ["HH:MM", "HH:MM"] in the shop's time zone; [] is closed. */
  hours: z.object({ mon: dayAnswer, tue: dayAnswer, wed: dayAnswer, thu: dayAnswer, fri: dayAnswer, sat: dayAnswer, sun: dayAnswer }),
  /** YYYY-MM-DD, in order. */
  closedDates: z.array(z.string()),
  /** The finder's and the Plus planner's default diameter tolerance, 1–5 %. */
  tolerancePct: z.number(),
  fittingPerTireCents: z.number().int(),
  disposalPerTireCents: z.number().int(),
  /** A per-new-tire fee some states charge; never taxed. */
  tireFeePerTireCents: z.number().int(),
  /** Sales tax in basis points: 725 = 7.25 %. */
  taxRateBp: z.number().int(),
  /** Whether fitting and disposal are taxed as well as the tires. */
  taxServices: z.boolean(),
  /** How many sets can be fitted at once. */
  fittingBays: z.number().int(),
  /** Minutes one set takes; also the step between fitting starts. */
  fittingMinutes: z.number().int(),
  /** The earliest start a driver can book, in minutes from now. */
  leadMinutes: z.number().int(),
  /** A driver can cancel a fitting online until this many hours before it starts. */
  cancelCutoffHours: z.number().int(),
  /** Wear match's limit when a vehicle maker states none, in 32nds of an inch of tread depth (2 is common practice). */
  wearLimit32: z.number(),
});

export type ShopSettings = z.infer<typeof shopSettingsSchema>;
