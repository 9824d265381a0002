import { z } from "zod";
import { multiLineText } from "@/lib/validation/text";
import { skuSchema } from "@/lib/validation/sku";

/** How many tires of one item an offer may hold: a set, with a spare or two. */
export const MAX_LINE_QUANTITY = 8;
/** One package is a few tires bought together (four of one, two and two…); alternatives are separate offers. */
export const MAX_OFFER_LINES = 6;
/** How far ahead an offer may stay valid. */
export const MAX_VALID_DAYS = 60;
/** How long an offer stays valid when staff do not say. */
export const DEFAULT_VALID_DAYS = 7;

/** A quote request's id in a path. */
export const requestIdParamsSchema = z.object({
  id: z.coerce.number({ error: "the request id is a whole number" }).int({ error: "the request id is a whole number" }).positive({ error: "the request id is a whole number" }),
});

/** POST /api/v1/quote-requests/{id}/offers: the tires and quantities of one package, how long it holds, a short message. */
export const newOfferSchema = z.object({
  lines: z
    .array(
      z.object({
        sku: skuSchema,
        quantity: z
          .number({ error: `give each line's quantity as a number of tires, 1 to ${MAX_LINE_QUANTITY}` })
          .int({ error: `give each line's quantity as a whole number of tires, 1 to ${MAX_LINE_QUANTITY}` })
          .min(1, { error: `give each line's quantity as a number of tires, 1 to ${MAX_LINE_QUANTITY}` })
          .max(MAX_LINE_QUANTITY, { error: `give each line's quantity as a number of tires, 1 to ${MAX_LINE_QUANTITY}` }),
      }),
      { error: "give the offer's lines as a list of { sku, quantity }" },
    )
    .min(1, { error: "an offer needs at least one tire: add a line with a SKU and a quantity" })
    .max(MAX_OFFER_LINES, { error: `an offer holds at most ${MAX_OFFER_LINES} lines: to offer alternatives, send two offers` })
    .refine((lines) => new Set(lines.map((line) => line.sku)).size === lines.length, {
      error: "each SKU appears once in an offer: add the quantities together",
    }),
  validUntil: z.iso
    .date({ error: "validUntil is a date written YYYY-MM-DD (the offer holds until the end of that day in the shop's time zone)" })
    .optional()
    .describe(`The last day the offer holds, in the shop's time zone; default ${DEFAULT_VALID_DAYS} days from today.`),
  message: multiLineText("give the message as text")
    .trim()
    .max(1000, { error: "keep the message under 1,000 characters" })
    .optional()
    .describe("A short note to the driver, shown with the offer."),
});

export type NewOffer = z.infer<typeof newOfferSchema>;

/** An offer's token in a path: base64url, as made by newOfferToken. */
export const offerTokenParamsSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{22,64}$/, { error: "this is not an offer's link: check the address in the e-mail" }),
});

/** GET /api/v1/offers/{token}/slots */
export const slotsQuerySchema = z.object({
  from: z.iso
    .date({ error: "from is a date written YYYY-MM-DD in the shop's time zone" })
    .optional()
    .describe("The first day to list, in the shop's time zone; default today there."),
});

/** POST /api/v1/offers/{token}/accept */
export const acceptOfferSchema = z.object({
  slotStart: z.iso.datetime({
    offset: true,
    error: "slotStart is one of the offered starts, as the list of free times gives it (e.g. 2026-12-08T09:00:00-05:00)",
  }),
});

/** A staff change to a fitting at the counter. */
export const offerIdParamsSchema = z.object({
  id: z.coerce.number({ error: "the offer id is a whole number" }).int({ error: "the offer id is a whole number" }).positive({ error: "the offer id is a whole number" }),
});
