import type { FitCardDraft } from "@/components/fit-card/save-fit-card-button";
import type { AlternativesResponse, Candidate } from "@/lib/finder/alternatives-response";
import { MAX_COMPARED_SIZES } from "@/lib/compare/read-sizes";

/** A Fit card from the finder: the original's size first, then the picked tires' other sizes. */
export function fitCardDraft(original: AlternativesResponse["original"], picked: readonly Candidate[], tolerancePct: number): FitCardDraft {
  const sizes = [...new Set([original.designation, ...picked.map((tire) => tire.designation)])].slice(0, MAX_COMPARED_SIZES);
  return {
    sizes,
    skus: picked.map((tire) => tire.sku),
    loadIndex: original.loadIndex,
    speedSymbol: original.speedSymbol ?? undefined,
    loadRange: original.loadRange ?? undefined,
    tolerancePct,
  };
}
