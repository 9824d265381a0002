import { DEFAULT_SET_SIZE, MAX_ALTERNATIVES_PAGE } from "@/lib/tire/vocabulary";
import type { FinderQuery } from "./finder-query";
import { WEAR_SORT } from "./finder-wear";

/**
 * What the finder's browser code does with its state (finder-query.ts reads it from the address
 * with zod, on the server): counts, the address and the API's query. Free of zod on purpose.
 */

/** How many tires the search is for: the address's choice, else a set of four. */
export const setSizeOf = (query: FinderQuery): number => query.quantity ?? DEFAULT_SET_SIZE;

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
  // Tread depth verdicts depend on depths the API never sees: the whole list comes at once, closest
  // diameter first, and the browser orders it.
  if (query.sort === WEAR_SORT) {
    search.delete("sort");
    search.set("limit", String(MAX_ALTERNATIVES_PAGE));
  }
  if (minimums.loadIndex !== null && minimums.loadIndex > (query.loadIndex ?? -1)) search.set("loadIndex", String(minimums.loadIndex));
  if (minimums.loadIndexDual !== null && minimums.loadIndexDual > (query.loadIndexDual ?? -1)) {
    search.set("loadIndexDual", String(minimums.loadIndexDual));
  }
  return search;
}
