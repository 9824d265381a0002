import { judgedCandidate, type CandidateFacts } from "@/lib/alternatives/judged-candidate";
import type { Original } from "@/lib/alternatives/original";
import { diameterChangePct, judgeCandidate, noteWords, verdictWords } from "@/lib/tire";

export interface TireVerdict {
  /** The tire's overall diameter against the original's, in percent. */
  diameterDiffPct: number;
  /** True when the tire meets the equal-or-better rules for the card's original tire. */
  equalOrBetter: boolean;
  /** Why it qualifies, or what it does not meet. */
  reasons: string[];
  /** What a driver should know beyond the rules (a change of season, a different inflation). */
  notes: string[];
}

/** A chosen tire measured against the card's original by the same judge, and in the same words, as the finder's results. */
export function cardTireVerdict(original: Original, tire: CandidateFacts, tolerancePct: number): TireVerdict {
  const verdict = judgeCandidate(original, judgedCandidate(tire), { tolerancePct });
  return {
    diameterDiffPct: diameterChangePct(original.overallDiameterMm, tire.overallDiameterMm),
    equalOrBetter: verdict.qualifies,
    reasons: verdictWords(verdict),
    notes: noteWords(verdict.notes),
  };
}
