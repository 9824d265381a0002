import type { Original } from "@/lib/catalog/original";
import { failedRules, qualifyingReasons, type RuleFacts } from "@/lib/catalog/reasons";

export interface CardTireFacts extends RuleFacts {
  rimDiameterIn: number;
}

export interface TireVerdict {
  /** True when the tire meets the equal-or-better rules for the card's original tire. */
  equalOrBetter: boolean;
  /** Why it qualifies, or what it does not meet. */
  reasons: string[];
}

/** A chosen tire measured against the card's original by the finder's own rules and words. */
export function cardTireVerdict(original: Original, tire: CardTireFacts, tolerancePct: number): TireVerdict {
  const diffPct = ((tire.overallDiameterMm - original.overallDiameterMm) / original.overallDiameterMm) * 100;
  const failed = failedRules(original, tire, diffPct, tolerancePct);
  if (tire.rimDiameterIn !== original.rimDiameterIn) {
    failed.unshift(`${tire.rimDiameterIn}-inch rim, not ${original.rimDiameterIn}-inch: a plus size needs other wheels`);
  }
  return failed.length === 0 ? { equalOrBetter: true, reasons: qualifyingReasons(original, tire, diffPct) } : { equalOrBetter: false, reasons: failed };
}
