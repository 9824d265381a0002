import { z } from "zod";
import { LOAD_RANGES } from "@/lib/tire/load-range";
import { SEASONS } from "@/lib/tire/vocabulary";
import { MAX_COMPARED_SIZES } from "@/lib/compare/compare-limits";
import { skuSchema } from "@/lib/validation/sku";
import { lineText, multiLineText } from "@/lib/validation/text";
import { MAX_CARD_TIRES, MAX_NOTE_LENGTH } from "./card-limits";
import { MAX_TREAD_DEPTH_32, STAYING_TIRES_MAX, STAYING_TIRES_MIN, WEAR_LIMIT_32_MAX } from "@/lib/wear-match/wear-match-rules";

/** The shape of a slug (see slug.ts), to refuse anything else before touching the database. */
export const FIT_CARD_SLUG_PATTERN = /^[A-Za-z0-9_-]{24}$/;

const loadIndexField = z.number().int().min(0).max(279);
const inHalves = (min: number, max: number) =>
  z
    .number()
    .min(min)
    .max(max)
    .refine((value) => Number.isInteger(value * 2), `must be whole or a half, ${min} to ${max}`);

/**
 * POST /api/v1/fit-cards. Sizes, load index and speed symbol are checked for form here and read
 * by the tire core when the card is made (unreadable → 422).
 */
export const newFitCardSchema = z
  .object({
    sizes: z.array(lineText().trim().min(1).max(40)).min(1).max(MAX_COMPARED_SIZES),
    skus: z.array(skuSchema).max(MAX_CARD_TIRES).default([]),
    loadIndex: loadIndexField,
    loadIndexDual: loadIndexField.optional(),
    speedSymbol: lineText().trim().min(1).max(3),
    loadRange: z.enum(LOAD_RANGES).optional(),
    runFlat: z.boolean().optional(),
    minLoadIndex: loadIndexField.optional(),
    minLoadIndexDual: loadIndexField.optional(),
    originalSeason: z.enum(SEASONS).optional(),
    tolerancePct: z.number().min(1).max(5).optional(),
    wear: z
      .object({
        remaining32: z.array(inHalves(0, MAX_TREAD_DEPTH_32)).min(STAYING_TIRES_MIN).max(STAYING_TIRES_MAX),
        limit32: inHalves(0.5, WEAR_LIMIT_32_MAX),
      })
      .strict()
      .optional()
      .describe("Replacing one or two tires on an all-wheel-drive vehicle: the depths left on the tires that stay and the limit between any two, in 32nds."),
    note: multiLineText().trim().max(MAX_NOTE_LENGTH).optional(),
    expiresInDays: z.number().int().min(1).max(365).optional(),
  })
  .strict()
  .refine((card) => new Set(card.skus).size === card.skus.length, { message: "name each SKU once", path: ["skus"] });

export type NewFitCard = z.infer<typeof newFitCardSchema>;

/** The 201 body of POST /api/v1/fit-cards. */
export const savedFitCardSchema = z.object({ slug: z.string(), url: z.url().describe("The card's public page, /s/{slug}.") });

export type SavedFitCard = z.infer<typeof savedFitCardSchema>;

/** The `{slug}` in a card's address. */
export const fitCardParamsSchema = z.object({ slug: z.string().regex(FIT_CARD_SLUG_PATTERN) });
