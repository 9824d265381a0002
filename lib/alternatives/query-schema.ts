import { z } from "zod";
import { MAX_INT4, optional, originalQueryFields, wholeNumber, wholeNumberIn, yesNo } from "@/lib/api/query-fields";
import { FINDER_SORTS, MAX_ALTERNATIVES_PAGE, MAX_SET_SIZE, MIN_SET_SIZE, SEASONS, TERRAINS } from "@/lib/tire";

const SET_SIZE_RULE = `how many tires are needed, a whole number from ${MIN_SET_SIZE} to ${MAX_SET_SIZE}`;

/** How many tires a search needs: 1–8 (a word for any other value, "2.5" and "x" included). */
const setSize = z
  .string()
  .trim()
  .regex(/^\d+$/, SET_SIZE_RULE)
  .transform(Number)
  .pipe(z.number().min(MIN_SET_SIZE, SET_SIZE_RULE).max(MAX_SET_SIZE, SET_SIZE_RULE));

/**
 * GET /api/v1/alternatives: the original (a load index required) and the filters, sort and page.
 * `minLoadIndex` / `minLoadIndexDual` are the Placard check's minimums; `originalSeason` is the kind of
 * tire on the car now (a candidate of another season carries a note).
 */
export const alternativesQuerySchema = z
  .object({
    ...originalQueryFields,
    loadIndex: wholeNumber,
    minLoadIndex: optional(wholeNumber),
    minLoadIndexDual: optional(wholeNumber),
    originalSeason: optional(z.enum(SEASONS)),
    season: optional(z.enum(SEASONS)),
    terrain: optional(z.enum(TERRAINS)),
    threePeak: optional(yesNo),
    brand: optional(z.string().trim().min(1).max(100)),
    minPriceCents: optional(wholeNumberIn(0, MAX_INT4)),
    maxPriceCents: optional(wholeNumberIn(0, MAX_INT4)),
    quantity: optional(setSize).describe(`How many tires are needed, ${MIN_SET_SIZE}–${MAX_SET_SIZE} (default 4): inStock=true keeps tires with at least this many to sell now, inStock=false those with fewer, and each result's estimate is for this many.`),
    inStock: optional(yesNo),
    sort: optional(z.enum(FINDER_SORTS)),
    limit: optional(wholeNumberIn(1, MAX_ALTERNATIVES_PAGE)),
    cursor: optional(z.string()),
  })
  .refine((query) => query.minPriceCents === undefined || query.maxPriceCents === undefined || query.minPriceCents <= query.maxPriceCents, {
    path: ["maxPriceCents"],
    message: "must not be below minPriceCents",
  });

export type AlternativesQuery = z.infer<typeof alternativesQuerySchema>;
