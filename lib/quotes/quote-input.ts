import { z } from "zod";
import { QUOTE_SOURCES } from "@/db/schema/quotes";
import { lineText, multiLineText } from "@/lib/validation/text";
import { skuSchema } from "@/lib/validation/sku";
import { DEFAULT_QUANTITY, HONEYPOT_FIELD, MAX_QUANTITY, MIN_QUANTITY, PREFERRED_DAY_MAX_AHEAD } from "./quote-limits";

/**
 * A person needs longer than this to fill in a name, an address and a vehicle; a script does not.
 * Measured from the server's signed `renderedAt`.
 */
export const MIN_FILL_MS = 3000;
export const MAX_REPLY_LENGTH = 5000;
/** At most as many catalog tires as a Fit card holds. */
export const MAX_REQUEST_SKUS = 6;

const DAY_MS = 86_400_000;
const isoDay = (date: Date) => date.toISOString().slice(0, 10);

/**
 * The days a driver may ask for. "Today" starts a day early because the browser's today can be
 * the server's yesterday in time zones west of UTC.
 */
export function preferredDayRange(now = new Date()): { min: string; max: string } {
  return { min: isoDay(new Date(now.getTime() - DAY_MS)), max: isoDay(new Date(now.getTime() + PREFERRED_DAY_MAX_AHEAD * DAY_MS)) };
}

const optionalText = (schema: z.ZodString) => z.preprocess((value) => (typeof value === "string" && value.trim() === "" ? undefined : value), schema.optional());

/** What a driver sends with "Ask the shop", checked the same way in the browser and by the API. */
export const quoteRequestSchema = z.object({
  name: lineText("Type your name so the shop knows who is asking")
    .trim()
    .min(1, "Type your name so the shop knows who is asking")
    .max(100, "Keep the name under 100 characters"),
  email: z
    .string({ error: "Type your e-mail address: the shop answers there" })
    .trim()
    .min(1, "Type your e-mail address: the shop answers there")
    .max(254, "That e-mail address is too long")
    .pipe(z.email("Check the e-mail address: it should look like name@example.com")),
  phone: optionalText(
    z
      .string()
      .trim()
      .max(30, "Keep the phone number under 30 characters")
      .regex(/^[0-9 +()-]+$/, "Use only digits, spaces and + ( ) - in the phone number")
      .refine((phone) => (phone.match(/\d/g) ?? []).length >= 7, "A phone number needs at least 7 digits"),
  ),
  vehicle: lineText("Say which vehicle the tires are for, such as “2019 family SUV”")
    .trim()
    .min(2, "Say which vehicle the tires are for, such as “2019 family SUV”")
    .max(120, "Keep the vehicle under 120 characters"),
  tires: multiLineText("Say which tires or size you would like a price for")
    .trim()
    .min(2, "Say which tires or size you would like a price for")
    .max(600, "Keep the tires under 600 characters"),
  quantity: z.coerce
    .number({ error: `Choose how many tires, ${MIN_QUANTITY} to ${MAX_QUANTITY}` })
    .int(`Choose a whole number of tires, ${MIN_QUANTITY} to ${MAX_QUANTITY}`)
    .min(MIN_QUANTITY, `Choose how many tires, ${MIN_QUANTITY} to ${MAX_QUANTITY}`)
    .max(MAX_QUANTITY, `Choose how many tires, ${MIN_QUANTITY} to ${MAX_QUANTITY}`)
    .default(DEFAULT_QUANTITY),
  preferredDay: optionalText(
    z
      .string()
      .regex(/^\d{4}-\d{2}-\d{2}$/, "Pick the day as a date, such as 2026-12-24")
      .refine((day) => !Number.isNaN(Date.parse(`${day}T00:00:00Z`)) && isoDay(new Date(`${day}T00:00:00Z`)) === day, "That day does not exist: pick another")
      .refine((day) => {
        const { min, max } = preferredDayRange();
        return day >= min && day <= max;
      }, `Pick a day from today to ${PREFERRED_DAY_MAX_AHEAD} days ahead, or leave it empty`),
  ),
  source: z.enum(QUOTE_SOURCES, { error: "The page the request comes from is unknown" }),
  reference: optionalText(lineText().trim().max(100, "The reference is longer than 100 characters")),
  skus: z
    .array(skuSchema, { error: "The catalog tires must be a list of SKUs" })
    .max(MAX_REQUEST_SKUS, `Name at most ${MAX_REQUEST_SKUS} catalog tires`)
    .optional()
    .describe("The catalog tires the request is about (as the finder or a Fit card filled it in); SKUs the catalog does not hold now are left out."),
  [HONEYPOT_FIELD]: z.string().max(500).optional(),
  /** The signed token of GET /api/v1/quote-requests/form-token, fetched when the form opened. */
  renderedAt: z.string().max(200).optional(),
});

export type QuoteRequestInput = z.infer<typeof quoteRequestSchema>;

/** The 201 body of POST /api/v1/quote-requests. */
export const quoteRequestCreatedSchema = z.object({ id: z.number().int(), status: z.literal("new") });

export type QuoteRequestCreated = z.infer<typeof quoteRequestCreatedSchema>;
export type NewQuoteRequest = Omit<QuoteRequestInput, typeof HONEYPOT_FIELD | "renderedAt">;

/** What a refused sender reads: the same words for every reason, so a script learns nothing. */
export const SPAM_REFUSAL_MESSAGE = "The request could not be accepted. Please wait a few seconds, check the form and send it again.";

/** The first message per field, keyed by field name, for the form to show beside each input. */
export function quoteFieldErrors(error: z.ZodError): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of error.issues) errors[String(issue.path[0] ?? "form")] ??= issue.message;
  return errors;
}

/** A customer staff record at the counter from the finder: who, how to reach them, the car, and the tires picked. */
export const walkInRequestSchema = quoteRequestSchema.pick({ name: true, email: true, phone: true, vehicle: true, tires: true, quantity: true, skus: true });
export type WalkInRequest = z.infer<typeof walkInRequestSchema>;
