import { z } from "zod";
import { DEFAULT_SET_SIZE, FINDER_SORTS, SEASONS, SET_SIZE_CHOICES, TERRAINS } from "@/lib/tire";
import { lineText } from "@/lib/validation/text";

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
  sort: z.enum(FINDER_SORTS).optional().catch(undefined),
  gawrFront: z.coerce.number().positive().max(100_000).optional().catch(undefined),
  gawrRear: z.coerce.number().positive().max(100_000).optional().catch(undefined),
  gawrUnit: z.enum(["kg", "lb"]).optional().catch(undefined),
  rearDuals: flag,
  vehicle: z.enum(vehicleTypes).optional().catch(undefined),
});

export type FinderQuery = z.infer<typeof finderQuerySchema>;

/** How many tires the search is for: the address's choice, else a set of four. */
export const setSizeOf = (query: FinderQuery): number => query.quantity ?? DEFAULT_SET_SIZE;

export function readFinderQuery(params: Record<string, string | string[] | undefined>): FinderQuery {
  const flat = Object.fromEntries(Object.entries(params).map(([key, value]) => [key, Array.isArray(value) ? value[0] : value]));
  return finderQuerySchema.parse(flat);
}

const filterKeys = ["season", "terrain", "brand", "minPriceCents", "maxPriceCents", "inStock", "threePeak", "tolerancePct"] as const;

/** How many of the finder's filters narrow the list (the set size and the sort narrow nothing). */
export const activeFilterCount = (query: FinderQuery): number => filterKeys.filter((key) => query[key] !== undefined).length;

/** The query string that reproduces this state: for the address bar and for links. */
export function finderSearch(query: FinderQuery): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== "") search.set(key, String(value));
  }
  return search.toString();
}

const apiKeys = [
  "size", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "runFlat", "originalSeason", "tolerancePct", "season", "terrain",
  "threePeak", "brand", "minPriceCents", "maxPriceCents", "inStock", "sort",
] as const;

const flagKeys = new Set<string>(["runFlat", "threePeak", "inStock"]);

/**
 * Results the finder asks for at a time, well below the API's own default, so that on a phone the
 * end of the list (Show more, the near misses, Ask the shop) is a short scroll away.
 */
export const FINDER_PAGE_SIZE = 12;

/** The Placard check's minimum load indices, when it was made. */
export interface PlacardMinimums {
  loadIndex: number | null;
  loadIndexDual: number | null;
}

/** The alternatives API's query for this state, with the Placard check's minimums applied. */
export function alternativesSearch(query: FinderQuery, minimums: PlacardMinimums): URLSearchParams {
  const search = new URLSearchParams();
  for (const key of apiKeys) {
    const value = query[key];
    // The address keeps flags short ("1"); the API takes true or false.
    if (value !== undefined && value !== "") search.set(key, flagKeys.has(key) ? "true" : String(value));
  }
  // Always named, so that each answer says for how many tires its stock filter and estimates are.
  search.set("quantity", String(setSizeOf(query)));
  search.set("limit", String(FINDER_PAGE_SIZE));
  if (minimums.loadIndex !== null && minimums.loadIndex > (query.loadIndex ?? -1)) search.set("loadIndex", String(minimums.loadIndex));
  if (minimums.loadIndexDual !== null && minimums.loadIndexDual > (query.loadIndexDual ?? -1)) {
    search.set("loadIndexDual", String(minimums.loadIndexDual));
  }
  return search;
}
