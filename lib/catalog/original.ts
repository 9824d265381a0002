import {
  formatSize,
  isSpeedSymbol,
  loadIndexKg,
  markedSpeedRank,
  plyRatingForLoadRange,
  serviceType,
  sizeFromSlug,
  sizeGeometry,
  type Construction,
  type LoadRange,
  type ServiceType,
  type SpeedSymbol,
} from "@/lib/tire";

/** The tire on the car, as the finder compares against it. */
export interface Original {
  designation: string;
  serviceType: ServiceType;
  rimDiameterIn: number;
  construction: Construction;
  zr: boolean;
  runFlat: boolean;
  overallDiameterMm: number;
  loadIndex: number;
  loadIndexDual: number | null;
  /** Null only for a ZR size given without a service description. */
  speedSymbol: SpeedSymbol | null;
  speedRank: number;
  loadRange: LoadRange | null;
  loadRangePly: number | null;
}

export interface OriginalInput {
  size: string;
  loadIndex: number;
  loadIndexDual?: number;
  speedSymbol?: string;
  loadRange?: LoadRange;
  runFlat?: boolean;
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
  for (const index of [input.loadIndex, input.loadIndexDual]) {
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
      designation: formatSize(size),
      serviceType: serviceType(size),
      rimDiameterIn: size.rimDiameterIn,
      construction: size.construction,
      zr: size.zr,
      runFlat: size.runFlat || input.runFlat === true,
      overallDiameterMm: sizeGeometry(size).overallDiameterMm,
      loadIndex: input.loadIndex,
      loadIndexDual: input.loadIndexDual ?? null,
      speedSymbol,
      speedRank,
      loadRange: input.loadRange ?? null,
      loadRangePly: input.loadRange ? plyRatingForLoadRange(input.loadRange) : null,
    },
  };
}
