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
}).strict();

/**
 * What the finder's one statement answers: a page of results, their total, the near misses. The
 * tests check the statement against it; the request path reads the answer as this type unchecked.
 */
export const finderAnswerSchema = z.strictObject({
  results: z.array(candidateRowSchema),
  total: z.number().int(),
  nearMisses: z.array(candidateRowSchema),
});

export type FinderAnswer = z.infer<typeof finderAnswerSchema>;
