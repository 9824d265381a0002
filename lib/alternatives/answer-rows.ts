import { z } from "zod";
import { CONSTRUCTIONS, SEASONS, SERVICE_TYPES, TERRAINS } from "@/lib/tire";

/** A stock item as the finder's statement returns it: a Tire's columns, what the rules read, its place in the order. */
const candidateRowSchema = z.object({
  sku: z.string(),
  brand: z.string(),
  line: z.string(),
  designation: z.string(),
  loadIndex: z.number().int(),
  loadIndexDual: z.number().int().nullable(),
  speedSymbol: z.string(),
  loadRange: z.string().nullable(),
  extraLoad: z.boolean(),
  runFlat: z.boolean(),
  season: z.enum(SEASONS),
  terrain: z.enum(TERRAINS),
  threePeak: z.boolean(),
  treadDepth32: z.number().int().nullable(),
  overallDiameterMm: z.number(),
  priceCents: z.number().int(),
  quantity: z.number().int(),
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
