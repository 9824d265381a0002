import { z } from "zod";
import { MAX_INT4, optional, originalQueryFields, wholeNumber, wholeNumberIn, yesNo } from "@/lib/api/query-fields";
import { FINDER_SORTS, SEASONS, TERRAINS } from "@/lib/tire";

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
    inStock: optional(yesNo),
    sort: optional(z.enum(FINDER_SORTS)),
    limit: optional(wholeNumberIn(1, 500)),
    cursor: optional(z.string()),
  })
  .refine((query) => query.minPriceCents === undefined || query.maxPriceCents === undefined || query.minPriceCents <= query.maxPriceCents, {
    path: ["maxPriceCents"],
    message: "must not be below minPriceCents",
  });

export type AlternativesQuery = z.infer<typeof alternativesQuerySchema>;
