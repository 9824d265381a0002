import { z } from "zod";
import type { fitCard } from "@/db/schema";
import { candidateWear, candidateWearWords, shaveDepthToShow, type StayingTires, type WearCandidate } from "@/lib/tire";

export const cardWearSchema = z.object({
  remaining32: z.array(z.number()).describe("The depths left on the tires that stay, in 32nds of an inch."),
  limit32: z.number().describe("The limit between the tread depths of any two tires on the vehicle, in 32nds."),
});

export const tireWearSchema = z.object({
  verdict: z.enum(["fitsAsIs", "shave", "replaceSet", "unknownDepth", "otherSize"]),
  shaveTo32: z.number().nullable().describe("The depth to shave to, rounded down as a fitter reads it; only when shaving is the answer."),
  words: z.string(),
});

export type TireWear = z.infer<typeof tireWearSchema>;

/** The tires that stay, as the card was saved with them. */
export function stayingOnCard(card: Pick<typeof fitCard.$inferSelect, "wearRemaining32" | "wearLimit32">): StayingTires | null {
  if (card.wearRemaining32 === null || card.wearLimit32 === null) return null;
  return { remaining32: card.wearRemaining32, limit32: card.wearLimit32 };
}

/** A card's tire beside the tires that stay, judged as the finder judges it. */
export function cardTireWear(tire: WearCandidate, originalDesignation: string, staying: StayingTires): TireWear {
  const wear = candidateWear(tire, originalDesignation, staying);
  const words = candidateWearWords(wear);
  if (wear.kind !== "judged") return { verdict: wear.kind, shaveTo32: null, words };
  return { verdict: wear.match.verdict, shaveTo32: shaveDepthToShow(wear.match), words };
}
