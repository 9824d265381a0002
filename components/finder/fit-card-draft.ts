import type { FitCardDraft } from "@/components/fit-card/save-fit-card-button";
import type { Candidate } from "@/lib/finder/alternatives-response";
import type { FinderQuery } from "@/lib/finder/finder-query";
import type { PlacardMinimums } from "@/lib/finder/finder-state";
import { MAX_COMPARED_SIZES } from "@/lib/compare/compare-limits";
import type { StayingTires } from "@/lib/tire/wear-match-candidate";

/**
 * A Fit card from the finder: the original's size first, then the picked tires' other sizes, with
 * everything the judge reads about the original (as typed, and the Placard check's minimums apart),
 * and the tires that stay on an all-wheel-drive vehicle when their depths were given.
 */
export function fitCardDraft(designation: string, query: FinderQuery, minimums: PlacardMinimums, picked: readonly Candidate[], tolerancePct: number, staying: StayingTires | null): FitCardDraft {
  const sizes = [...new Set([designation, ...picked.map((tire) => tire.designation)])].slice(0, MAX_COMPARED_SIZES);
  return {
    sizes,
    skus: picked.map((tire) => tire.sku),
    loadIndex: query.loadIndex,
    loadIndexDual: query.loadIndexDual,
    speedSymbol: query.speedSymbol,
    loadRange: query.loadRange,
    runFlat: query.runFlat !== undefined ? true : undefined,
    minLoadIndex: minimums.loadIndex ?? undefined,
    minLoadIndexDual: minimums.loadIndexDual ?? undefined,
    originalSeason: query.originalSeason,
    tolerancePct,
    wear: staying ? { remaining32: [...staying.remaining32], limit32: staying.limit32 } : undefined,
  };
}
