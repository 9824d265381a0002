import { z } from "zod";
import { judgedCandidate, type CandidateFacts } from "@/lib/alternatives/judged-candidate";
import type { Original } from "@/lib/alternatives/original";
import { diameterChangePct, judgeCandidate, noteWords, verdictWords } from "@/lib/tire";

export const tireVerdictSchema = z.object({
  diameterDiffPct: z.number().describe("The tire's overall diameter against the original's: (this − original) ÷ original × 100, unrounded."),
  equalOrBetter: z.boolean().describe("The tire meets the rules of equal-or-better for the card's original tire."),
  reasons: z.array(z.string()).describe("Why it qualifies, or what it does not meet."),
  notes: z.array(z.string()).describe("What a driver should know beyond the rules (a change of season, a different inflation)."),
});

export type TireVerdict = z.infer<typeof tireVerdictSchema>;

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
