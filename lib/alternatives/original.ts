import {
  formatSize,
  hasNominalDiameter,
  isSpeedSymbol,
  loadIndexKg,
  noDiameterMessage,
  notASizeMessage,
  plyRatingForLoadRange,
  sizeFacts,
  sizeFromSlug,
  speedSymbolRank,
  unknownLoadIndexMessage,
  unknownSpeedSymbolMessage,
  ZR_UNRATED_RANK,
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

type Refusal = { ok: false; code: OriginalProblemCode; message: string };
export type OriginalResult = { ok: true; original: Original } | Refusal;

/** "h" → "H", "(y)" → "(Y)"; undefined when the text is no speed symbol. */
export function normalizeSpeedSymbol(text: string): SpeedSymbol | undefined {
  const symbol = text.trim().toUpperCase();
  return isSpeedSymbol(symbol) ? symbol : undefined;
}

/**
 * The original as the judge reads it, from what was typed; the load index and speed symbol may be
 * left out (the Plus planner asks for none then). A ZR size without a speed symbol is taken as rated
 * above 240 km/h.
 */
export function readJudgedOriginal(input: Omit<OriginalInput, "loadIndex"> & { loadIndex?: number }) {
  const size = sizeFromSlug(input.size);
  if (!size) return refuse("unreadable", notASizeMessage(input.size));
  if (!hasNominalDiameter(size)) return refuse("unreadable", `${noDiameterMessage(size)} Tires are matched by overall diameter, so ask the shop.`);
  for (const index of [input.loadIndex, input.loadIndexDual, input.minLoadIndex, input.minLoadIndexDual]) {
    if (index !== undefined && loadIndexKg(index) === undefined) return refuse("unknown_load_index", unknownLoadIndexMessage(index));
  }
  const speedSymbol = input.speedSymbol === undefined ? null : (normalizeSpeedSymbol(input.speedSymbol) ?? null);
  if (input.speedSymbol !== undefined && !speedSymbol) return refuse("unknown_speed_symbol", unknownSpeedSymbolMessage(input.speedSymbol));
  const original = {
    ...sizeFacts(size),
    designation: formatSize(size),
    zr: size.zr,
    runFlat: size.runFlat || input.runFlat === true,
    loadIndex: input.loadIndex ?? null,
    loadIndexDual: input.loadIndexDual ?? null,
    minLoadIndex: input.minLoadIndex ?? null,
    minLoadIndexDual: input.minLoadIndexDual ?? null,
    speedSymbol: speedSymbol ?? (size.zr ? ("ZR" as const) : null),
    loadRange: input.loadRange ?? null,
    season: input.season ?? null,
  } satisfies JudgedOriginal & { designation: string; zr: boolean };
  return { ok: true as const, original, size };
}

const refuse = (code: OriginalProblemCode, message: string): Refusal => ({ ok: false, code, message });

/** The original a finder search compares against: a load index, and a speed symbol unless the size is ZR. */
export function readOriginal(input: OriginalInput): OriginalResult {
  const read = readJudgedOriginal(input);
  if (!read.ok) return read;
  const { original } = read;
  if (original.speedSymbol === null) return refuse("missing_parameter", 'The parameter "speedSymbol" is required (only a ZR size may leave it out).');
  const speedRank = original.speedSymbol === "ZR" ? ZR_UNRATED_RANK : speedSymbolRank(original.speedSymbol);
  const loadRangePly = original.loadRange ? plyRatingForLoadRange(original.loadRange) : null;
  return { ok: true, original: { ...original, loadIndex: input.loadIndex, speedRank, loadRangePly } };
}
