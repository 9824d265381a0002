import { isLoadRange, LOAD_RANGES, loadRangeForPlyRating, LT_MAX_PRESSURE_PSI, plyRatingForLoadRange, type LoadRange } from "@/lib/tire/load-range";
import { everyRow, noRow, readAmount, type SearchOutcome } from "./search-terms";

export interface LoadRangeRow {
  key: string;
  loadRange: LoadRange;
  plyRating: number;
  /** Typical maximum cold pressure of an LT tire of this range (common practice), when known. */
  typicalMaxPsi: number | null;
}

/** Every load range, lightest first, with its ply rating and typical LT pressure. */
export const loadRangeRows: readonly LoadRangeRow[] = LOAD_RANGES.map((loadRange) => ({
  key: loadRange,
  loadRange,
  plyRating: plyRatingForLoadRange(loadRange),
  typicalMaxPsi: LT_MAX_PRESSURE_PSI[loadRange] ?? null,
}));

const plyWords: Record<string, "ply"> = { pr: "ply", ply: "ply" };

/** Finds rows for a load range letter ("e", "LRE", "Load Range E") or a ply rating ("10", "10 PR"). */
export function searchLoadRanges(query: string): SearchOutcome {
  if (!query.trim()) return everyRow;
  const letter = query.trim().toUpperCase().replace(/^(LOAD\s*RANGE|LR)\s*/, "");
  if (isLoadRange(letter)) return { keys: new Set([letter]), notes: [], tags: new Map() };
  const amount = readAmount(query.replace(/\s*-\s*ply$/i, " ply"), plyWords);
  if (!amount) return noRow;
  const loadRange = loadRangeForPlyRating(amount.value);
  if (!loadRange) return { ...noRow, notes: [`No load range has a ${amount.value}-ply rating.`] };
  return { keys: new Set([loadRange]), notes: [`A ${amount.value}-ply rating is load range ${loadRange}.`], tags: new Map() };
}
