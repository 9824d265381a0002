import { z } from "zod";
import { tireSchema } from "@/lib/catalog/catalog-tire";
import { CONSTRUCTIONS, SERVICE_TYPES } from "@/lib/tire";

/** A stock item as the finder's statement returns it: a Tire's columns, what the rules read, its place in the order. */
const candidateRowSchema = tireSchema.omit({ inStock: true }).extend({
  rimDiameterIn: z.number(),
  construction: z.enum(CONSTRUCTIONS),
  serviceType: z.enum(SERVICE_TYPES),
  diffPct: z.number(),
  sortKey: z.number(),
});

/** What the finder's one statement answers: a page of results, their total, the near misses. */
export const finderAnswerSchema = z.object({
  results: z.array(candidateRowSchema),
  total: z.number().int(),
  nearMisses: z.array(candidateRowSchema),
});
