import { wearMatch, type WearMatch } from "./wear-match";

/** What the finder knows of a tire it might fit beside the ones that stay. */
export interface WearCandidate {
  designation: string;
  /** The size's nominal overall diameter. */
  overallDiameterMm: number;
  /** New tread depth in 32nds (the item's own, else its line's); null when the shop has not recorded it. */
  treadDepth32: number | null;
}

/** The tires that stay and the vehicle maker's limit as a tread-depth difference. */
export interface StayingTires {
  remaining32: readonly number[];
  limit32: number;
}

export type CandidateWear =
  | { kind: "judged"; match: WearMatch }
  /** The line's new tread depth is not on record: the shop measures it. */
  | { kind: "unknownDepth" }
  /** Tread depth only matches tires of one size: another size turns differently however deep it is (common practice). */
  | { kind: "otherSize" };

/** Whether a candidate can join the tires that stay, judged as Wear match judges one size. */
export function candidateWear(candidate: WearCandidate, originalDesignation: string, staying: StayingTires): CandidateWear {
  if (candidate.designation !== originalDesignation) return { kind: "otherSize" };
  if (candidate.treadDepth32 === null) return { kind: "unknownDepth" };
  const match = wearMatch({
    newDiameterMm: candidate.overallDiameterMm,
    newDepth32: candidate.treadDepth32,
    remaining32: staying.remaining32,
    limit: { kind: "depth32", value: staying.limit32 },
  });
  return { kind: "judged", match };
}

const rankOf = (wear: CandidateWear): number => {
  if (wear.kind === "otherSize") return 4;
  if (wear.kind === "unknownDepth") return 2;
  return { fitsAsIs: 0, shave: 1, replaceSet: 3 }[wear.match.verdict];
};

/**
 * "No shaving needed" first: tires that fit as they are, then those to shave, then those whose depth
 * the shop must measure, then those that mean a new set, then other sizes. Stable: within a rank the
 * list keeps its own order.
 */
export function byWearMatch<T>(items: readonly T[], wearOf: (item: T) => CandidateWear): T[] {
  return items
    .map((item, index) => ({ item, index, rank: rankOf(wearOf(item)) }))
    .sort((a, b) => a.rank - b.rank || a.index - b.index)
    .map(({ item }) => item);
}
