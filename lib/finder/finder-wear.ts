import { STAYING_TIRES_MAX, STAYING_TIRES_MIN, HALF_32NDS_PATTERN, MAX_TREAD_DEPTH_32 } from "@/lib/wear-match/wear-match-rules";
import type { StayingTires } from "@/lib/tire/wear-match-candidate";
import { DEFAULT_SET_SIZE } from "@/lib/tire/vocabulary";

/** The finder's sort that puts tires needing no shaving first; judged in the browser, where the depths are. */
export const WEAR_SORT = "noShaving";

/** What the finder's address says about the tires that stay (awd, remaining32, wearLimit32). */
export interface FinderWearQuery {
  awd?: string;
  remaining32?: string;
  wearLimit32?: number;
  quantity?: number;
}

export type FinderWear =
  | { on: false }
  | {
      on: true;
      /** How many tires stay on the vehicle: four less those being replaced (0 when all four are). */
      stayingCount: number;
      /** The depths as typed, one per staying tire. */
      typed: string[];
      limit32: number;
      limitFromShop: boolean;
      /** The tires that stay, once every depth reads right. */
      staying: StayingTires | null;
      /** What to fix before results can be judged. */
      problem: string | null;
    };

export const DEPTH_PROBLEM = `Give the depth left on each tire that stays in 32nds of an inch, from 0 to ${MAX_TREAD_DEPTH_32}, whole or a half (such as 6 or 6.5).`;
export const COUNT_PROBLEM = "Choose 1 or 2 under Tires needed: tread depth matters when one or two new tires join worn ones.";

const readDepth = (text: string): number | null => {
  const trimmed = text.trim();
  if (!HALF_32NDS_PATTERN.test(trimmed)) return null;
  const depth = Number(trimmed);
  return depth <= MAX_TREAD_DEPTH_32 ? depth : null;
};

/** Reads the address's wear choice; free of zod so the finder's browser code can use it. */
export function readFinderWear(query: FinderWearQuery, shopLimit32: number): FinderWear {
  if (query.awd === undefined) return { on: false };
  const replaced = query.quantity ?? DEFAULT_SET_SIZE;
  const stayingCount = Math.max(0, 4 - replaced);
  const parts = (query.remaining32 ?? "").split(",");
  const typed = Array.from({ length: stayingCount }, (_, index) => parts[index]?.trim() ?? "");
  const limit32 = query.wearLimit32 ?? shopLimit32;
  const base = { on: true as const, stayingCount, typed, limit32, limitFromShop: query.wearLimit32 === undefined };
  if (stayingCount < STAYING_TIRES_MIN || stayingCount > STAYING_TIRES_MAX) return { ...base, staying: null, problem: COUNT_PROBLEM };
  const depths = typed.map(readDepth);
  if (depths.some((depth) => depth === null)) return { ...base, staying: null, problem: DEPTH_PROBLEM };
  return { ...base, staying: { remaining32: depths as number[], limit32 }, problem: null };
}
