import {
  formatSize,
  hasNominalDiameter,
  isSpeedSymbol,
  loadIndexKg,
  markedSpeedRank,
  noDiameterMessage,
  plyRatingForLoadRange,
  sizeFacts,
  sizeFromSlug,
  type JudgedOriginal,
  type LoadRange,
  type Season,
  type SpeedSymbol,
} from "@/lib/tire";

/** The tire on the car, as the finder compares against it: what the judge reads, and what the SQL reads. */
export interface Original extends JudgedOriginal {
  designation: string;
  zr: boolean;
  loadIndex: number;
  /** The speed the candidates must reach, as a rank (a ZR size without a service description: above 240 km/h). */
  speedRank: number;
  loadRangePly: number | null;
}

export interface OriginalInput {
  size: string;
  loadIndex: number;
  loadIndexDual?: number;
  speedSymbol?: string;
  loadRange?: LoadRange;
  runFlat?: boolean;
  /** The Placard check's minimums. */
  minLoadIndex?: number;
  minLoadIndexDual?: number;
  /** What kind of tire is on the car now. */
  season?: Season;
}

export type OriginalProblemCode = "missing_parameter" | "unreadable" | "unknown_load_index" | "unknown_speed_symbol";

export type OriginalResult = { ok: true; original: Original } | { ok: false; code: OriginalProblemCode; message: string };

/** "h" → "H", "(y)" → "(Y)"; undefined when the text is no speed symbol. */
export function normalizeSpeedSymbol(text: string): SpeedSymbol | undefined {
  const symbol = text.trim().toUpperCase();
  return isSpeedSymbol(symbol) ? symbol : undefined;
}

/**
 * Reads the original tire from what was typed. The speed symbol may be left out only for a ZR size,
 * which is then taken as rated above 240 km/h.
 */
export function readOriginal(input: OriginalInput): OriginalResult {
  const size = sizeFromSlug(input.size);
  if (!size) return { ok: false, code: "unreadable", message: `"${input.size}" is not a tire size (try 285/50R20 or 285-50R20).` };
  if (!hasNominalDiameter(size)) return { ok: false, code: "unreadable", message: `${noDiameterMessage(size)} Replacements are found by overall diameter, so ask the shop.` };
  for (const index of [input.loadIndex, input.loadIndexDual, input.minLoadIndex, input.minLoadIndexDual]) {
    if (index !== undefined && loadIndexKg(index) === undefined) {
      return { ok: false, code: "unknown_load_index", message: `Load index ${index} is not in the load index table (0–279).` };
    }
  }
  let speedSymbol: SpeedSymbol | null = null;
  if (input.speedSymbol !== undefined) {
    speedSymbol = normalizeSpeedSymbol(input.speedSymbol) ?? null;
    if (!speedSymbol) return { ok: false, code: "unknown_speed_symbol", message: `"${input.speedSymbol}" is not a speed symbol.` };
  }
  const speedRank = markedSpeedRank(size, speedSymbol ? { speedSymbol } : null);
  if (speedRank === null) {
    return { ok: false, code: "missing_parameter", message: 'The parameter "speedSymbol" is required (only a ZR size may leave it out).' };
  }
  return {
    ok: true,
    original: {
      ...sizeFacts(size),
      designation: formatSize(size),
      zr: size.zr,
      runFlat: size.runFlat || input.runFlat === true,
      loadIndex: input.loadIndex,
      loadIndexDual: input.loadIndexDual ?? null,
      minLoadIndex: input.minLoadIndex ?? null,
      minLoadIndexDual: input.minLoadIndexDual ?? null,
      speedSymbol: speedSymbol ?? "ZR",
      speedRank,
      loadRange: input.loadRange ?? null,
      loadRangePly: input.loadRange ? plyRatingForLoadRange(input.loadRange) : null,
      season: input.season ?? null,
    },
  };
}
