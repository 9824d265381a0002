import { z } from "zod";
import { FINDER_SORTS, SEASONS, SET_SIZE_CHOICES, TERRAINS } from "@/lib/tire/vocabulary";
import { lineText } from "@/lib/validation/text";
import { WEAR_LIMIT_32_MAX } from "@/lib/wear-match/wear-match-rules";
import { WEAR_SORT } from "./finder-wear";

export const vehicleTypes = ["passenger-car", "mpv-truck-trailer"] as const;

const optionalText = lineText().trim().max(64).optional().catch(undefined);
const optionalCount = (max: number) => z.coerce.number().int().min(0).max(max).optional().catch(undefined);
const flag = z.enum(["1", "true"]).optional().catch(undefined);
/** One of the set sizes the finder offers; anything else falls back to the default set. */
const setSize = z.coerce
  .number()
  .refine((count) => (SET_SIZE_CHOICES as readonly number[]).includes(count))
  .optional()
  .catch(undefined);

/**
 * The Replacement finder's state as it lives in the URL. Unknown or malformed values are dropped
 * rather than refused: a shared link with a stale filter should still show a list.
 */
export const finderQuerySchema = z.object({
  size: optionalText,
  loadIndex: optionalCount(279),
  loadIndexDual: optionalCount(279),
  speedSymbol: z.string().trim().max(4).optional().catch(undefined),
  loadRange: z.string().trim().toUpperCase().regex(/^[B-N]$/).optional().catch(undefined),
  runFlat: flag,
  tolerancePct: z.coerce.number().min(1).max(5).optional().catch(undefined),
  originalSeason: z.enum(SEASONS).optional().catch(undefined),
  season: z.enum(SEASONS).optional().catch(undefined),
  terrain: z.enum(TERRAINS).optional().catch(undefined),
  threePeak: flag,
  brand: optionalText,
  minPriceCents: optionalCount(10_000_000),
  maxPriceCents: optionalCount(10_000_000),
  /** How many tires are needed; absent means the default set of four. */
  quantity: setSize,
  inStock: flag,
  sort: z.enum([...FINDER_SORTS, WEAR_SORT]).optional().catch(undefined),
  gawrFront: z.coerce.number().positive().max(100_000).optional().catch(undefined),
  gawrRear: z.coerce.number().positive().max(100_000).optional().catch(undefined),
  gawrUnit: z.enum(["kg", "lb"]).optional().catch(undefined),
  rearDuals: flag,
  vehicle: z.enum(vehicleTypes).optional().catch(undefined),
  /** Replacing fewer than four on an all-wheel-drive vehicle: the depths of the tires that stay, as typed. */
  awd: flag,
  remaining32: z.string().trim().max(40).optional().catch(undefined),
  wearLimit32: z.coerce
    .number()
    .min(0.5)
    .max(WEAR_LIMIT_32_MAX)
    .refine((limit) => Number.isInteger(limit * 2))
    .optional()
    .catch(undefined),
});

export type FinderQuery = z.infer<typeof finderQuerySchema>;

export function readFinderQuery(params: Record<string, string | string[] | undefined>): FinderQuery {
  const flat = Object.fromEntries(Object.entries(params).map(([key, value]) => [key, Array.isArray(value) ? value[0] : value]));
  return finderQuerySchema.parse(flat);
}
