import type { Original } from "@/lib/catalog/original";
import { diameterChangePct } from "@/lib/tire";
import { failedRules, qualifyingReasons, type RuleFacts } from "@/lib/catalog/reasons";

export interface CardTireFacts extends RuleFacts {
  rimDiameterIn: number;
}

export interface TireVerdict {
  /** The tire's overall diameter against the original's, in percent. */
  diameterDiffPct: number;
  /** True when the tire meets the equal-or-better rules for the card's original tire. */
  equalOrBetter: boolean;
  /** Why it qualifies, or what it does not meet. */
  reasons: string[];
}

/** A chosen tire measured against the card's original by the finder's own rules and words. */
export function cardTireVerdict(original: Original, tire: CardTireFacts, tolerancePct: number): TireVerdict {
  const diffPct = diameterChangePct(original.overallDiameterMm, tire.overallDiameterMm);
  const failed = failedRules(original, tire, diffPct, tolerancePct);
  if (tire.rimDiameterIn !== original.rimDiameterIn) {
    failed.unshift(`${tire.rimDiameterIn}-inch rim, not ${original.rimDiameterIn}-inch: a plus size needs other wheels`);
  }
  const equalOrBetter = failed.length === 0;
  return { diameterDiffPct: diffPct, equalOrBetter, reasons: equalOrBetter ? qualifyingReasons(original, tire, diffPct) : failed };
}
