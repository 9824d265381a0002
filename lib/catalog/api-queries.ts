import { z } from "zod";
import { SEASONS, TERRAINS } from "@/db/schema";
import { LOAD_RANGES } from "@/lib/tire";
import { ALTERNATIVES_SORTS } from "./cursor";

const MAX_INT4 = 2_147_483_647;

/** Rows a page holds when the query names no limit. */
export const DEFAULT_PAGE_SIZE = 50;

/** An empty parameter counts as absent (`?cursor=&limit=` asks for the first page). */
const optional = <Schema extends z.ZodType>(schema: Schema) =>
  z.preprocess((value) => (value === "" ? undefined : value), schema.optional());

const wholeNumber = z
  .string()
  .trim()
  .min(1)
  .regex(/^\d+$/, "expected a whole number")
  .transform(Number);
const wholeNumberIn = (min: number, max: number) => wholeNumber.pipe(z.number().min(min).max(max));
const decimalIn = (min: number, max: number) =>
  z
    .string()
    .trim()
    .regex(/^\d+(\.\d+)?$/, "expected a number")
    .transform(Number)
    .pipe(z.number().min(min).max(max));
const yesNo = z.enum(["true", "false"]).transform((value) => value === "true");

export const catalogQuerySchema = z.object({
  cursor: optional(z.string()),
  limit: optional(wholeNumberIn(1, 500)),
});

/**
 * GET /api/v1/alternatives. Load indices and speed symbols are only checked for form here: one
 * outside the published tables answers 422 (unknown_load_index, unknown_speed_symbol), not 400.
 * `minLoadIndex` / `minLoadIndexDual` are the Placard check's minimums; `originalSeason` is the kind of
 * tire on the car now (a candidate of another season carries a note).
 */
export const alternativesQuerySchema = z
  .object({
    size: z.string().trim().min(1, "give the size on the tire, e.g. 285-50R20"),
    loadIndex: wholeNumber,
    loadIndexDual: optional(wholeNumber),
    speedSymbol: optional(z.string().trim()),
    loadRange: optional(z.string().trim().toUpperCase().pipe(z.enum(LOAD_RANGES))),
    runFlat: optional(yesNo),
    minLoadIndex: optional(wholeNumber),
    minLoadIndexDual: optional(wholeNumber),
    originalSeason: optional(z.enum(SEASONS)),
    tolerancePct: optional(decimalIn(1, 5)),
    season: optional(z.enum(SEASONS)),
    terrain: optional(z.enum(TERRAINS)),
    threePeak: optional(yesNo),
    brand: optional(z.string().trim().min(1).max(100)),
    minPriceCents: optional(wholeNumberIn(0, MAX_INT4)),
    maxPriceCents: optional(wholeNumberIn(0, MAX_INT4)),
    inStock: optional(yesNo),
    sort: optional(z.enum(ALTERNATIVES_SORTS)),
    limit: optional(wholeNumberIn(1, 500)),
    cursor: optional(z.string()),
  })
  .refine((query) => query.minPriceCents === undefined || query.maxPriceCents === undefined || query.minPriceCents <= query.maxPriceCents, {
    path: ["maxPriceCents"],
    message: "must not be below minPriceCents",
  });

export type AlternativesQuery = z.infer<typeof alternativesQuerySchema>;
