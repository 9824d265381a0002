import { formatOneDecimal } from "./display";
import { mmToIn } from "./units";
import { MM_PER_32ND, shaveDepthToShow, type WearLimit, type WearMatch } from "./wear-match";
import type { CandidateWear, StayingTires } from "./wear-match-candidate";

/** Up to two decimals and no trailing zeros: 2, 6.5, 2.01. */
const upToHundredths = (value: number): string => String(Math.round(value * 100) / 100);

/** A depth as a fitter's gauge reads it: "6.5/32 in (5.2 mm)". */
export function formatDepth32(depth32: number): string {
  return `${upToHundredths(depth32)}/32 in (${formatOneDecimal(depth32 * MM_PER_32ND)} mm)`;
}

/** A worn tire's diameter or circumference, fine enough to show a few millimetres of wear: 717.9 mm (28.27 in). */
export function formatWornLength(mm: number): string {
  return `${formatOneDecimal(mm)} mm (${mmToIn(mm).toFixed(2)} in)`;
}

/** The limit in words: "2/32 in of tread depth" or "10 mm of rolling circumference (about 2/32 in of depth)". */
export function formatWearLimit(limit: WearLimit, limit32: number): string {
  if (limit.kind === "depth32") return `${limit.value}/32 in of tread depth`;
  return `${upToHundredths(limit.value)} mm of rolling circumference (about ${upToHundredths(limit32)}/32 in of tread depth)`;
}

/** A depth as a drawing labels it, without the unit: "6.5/32". */
export const formatDepth32Short = (depth32: number): string => `${upToHundredths(depth32)}/32`;

const depth = (depth32: number) => `${formatDepth32Short(depth32)} in`;

/** The verdict in one sentence, with the numbers that decided it. */
export function wearVerdictSentence(match: WearMatch, limit: WearLimit): string {
  const limitWords = formatWearLimit(limit, match.limit32);
  const depths = match.remaining.map((tire) => tire.depth32);
  const [shallowest, deepest] = [Math.min(...depths), Math.max(...depths)];
  const newDepth = match.newTire.depth32;
  switch (match.verdict) {
    case "fitsAsIs":
      return `The new tire can go on as it is: at ${depth(newDepth)} it is within ${limitWords} of every tire that stays (${depth(shallowest)} to ${depth(deepest)}).`;
    case "shave":
      return `Shave the new tire to ${depth(shaveDepthToShow(match)!)} before it goes on: at ${depth(newDepth)} it is ${depth(newDepth - shallowest)} deeper than the shallowest tire that stays (${depth(shallowest)}), and the limit is ${limitWords}.`;
    case "replaceSet":
      return match.replaceReason === "spread"
        ? `Replace the set: the tires that stay already differ by ${depth(match.spread32)} (${depth(shallowest)} to ${depth(deepest)}), more than the limit of ${limitWords}, and a new tire cannot bring them closer.`
        : `Replace the set: the new tire's ${depth(newDepth)} is more than ${limitWords} below the deepest tire that stays (${depth(deepest)}), and shaving cannot add tread.`;
  }
}

/** A finder result's verdict in a few words, for its card and for what travels with a request. */
export function candidateWearWords(wear: CandidateWear): string {
  if (wear.kind === "otherSize") return "Another size: it cannot be matched by tread depth beside the tires that stay on an all-wheel-drive vehicle";
  if (wear.kind === "unknownDepth") return "New tread depth not on record: ask the shop to measure it against the tires that stay";
  const { match } = wear;
  const newDepth = depth(match.newTire.depth32);
  switch (match.verdict) {
    case "fitsAsIs":
      return `Fits as it is: ${newDepth} new, within the limit of the tires that stay`;
    case "shave":
      return `Shave to ${depth(shaveDepthToShow(match)!)} before fitting: ${newDepth} new`;
    case "replaceSet":
      return match.replaceReason === "spread"
        ? "Replace the set: the tires that stay already differ by more than the limit"
        : `Replace the set: ${newDepth} new is too far below the deepest tire that stays`;
  }
}

/** The tires that stay in one line: "All-wheel drive: 2 tires stay at 7/32 in, 7.5/32 in (limit 2/32 in)". */
export function stayingTiresWords({ remaining32, limit32 }: StayingTires): string {
  return `All-wheel drive: ${remaining32.length} tires stay at ${remaining32.map(depth).join(", ")} (limit ${depth(limit32)})`;
}
