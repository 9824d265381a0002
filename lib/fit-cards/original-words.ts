import { formatServiceDescription } from "@/lib/tire";
import type { PublicFitCard } from "./read-card";

type CardOriginal = PublicFitCard["original"];

/** "119S", "123/120R, load range E, run-flat": the original's service description and what else the card was judged on. */
export function originalServiceWords(original: CardOriginal): string {
  const extras = [original.loadRange ? `load range ${original.loadRange}` : null, original.runFlat ? "run-flat" : null].filter(Boolean);
  return [formatServiceDescription(original), ...extras].join(", ");
}

/** "The Placard check asked for load index 121 or more, and dual 118 or more", or null when no check was made. */
export function placardMinimumWords(original: CardOriginal): string | null {
  const parts = [
    original.minLoadIndex === null ? null : `load index ${original.minLoadIndex} or more`,
    original.minLoadIndexDual === null ? null : `a dual load index of ${original.minLoadIndexDual} or more`,
  ].filter(Boolean);
  return parts.length === 0 ? null : `The Placard check asked for ${parts.join(", and ")}.`;
}
