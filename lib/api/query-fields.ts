import { z } from "zod";
import { LOAD_RANGES, SIZE_REQUIRED } from "@/lib/tire";

/** Query-string fields every API route reads the same way. */

export const MAX_INT4 = 2_147_483_647;

/** An empty parameter counts as absent (`?cursor=&limit=` asks for the first page). */
export const optional = <Schema extends z.ZodType>(schema: Schema) => z.preprocess((value) => (value === "" ? undefined : value), schema.optional());

export const wholeNumber = z.string().trim().min(1).regex(/^\d+$/, "expected a whole number").transform(Number);
export const wholeNumberIn = (min: number, max: number) => wholeNumber.pipe(z.number().min(min).max(max));
export const decimalIn = (min: number, max: number) =>
  z.string().trim().regex(/^\d+(\.\d+)?$/, "expected a number").transform(Number).pipe(z.number().min(min).max(max));
export const yesNo = z.enum(["true", "false"]).transform((value) => value === "true");

/**
 * The tire on the car as the finder and the Plus planner take it. Load indices and speed symbols are
 * only checked for form here: one outside the published tables answers 422 (unknown_load_index,
 * unknown_speed_symbol), not 400.
 */
export const originalQueryFields = {
  size: z.string().trim().min(1, SIZE_REQUIRED),
  loadIndex: optional(wholeNumber),
  loadIndexDual: optional(wholeNumber),
  speedSymbol: optional(z.string().trim()),
  loadRange: optional(z.string().trim().toUpperCase().pipe(z.enum(LOAD_RANGES))),
  runFlat: optional(yesNo),
  tolerancePct: optional(decimalIn(1, 5)),
};
