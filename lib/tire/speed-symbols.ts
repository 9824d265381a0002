import { KM_PER_MILE } from "./units";

/** Speed symbols of ISO 4000-1 / ETRTO (Arrêté of 24 October 1994, Annex I), plus "(Y)" for above 300 km/h. */
const SPEED_KMH = {
  A1: 5, A2: 10, A3: 15, A4: 20, A5: 25, A6: 30, A7: 35, A8: 40,
  B: 50, C: 60, D: 65, E: 70, F: 80, G: 90, J: 100, K: 110, L: 120, M: 130, N: 140,
  P: 150, Q: 160, R: 170, S: 180, T: 190, U: 200, H: 210, V: 240, W: 270, Y: 300, "(Y)": 300,
} as const;

export type SpeedSymbol = keyof typeof SPEED_KMH;

export interface SpeedSymbolInfo {
  readonly symbol: SpeedSymbol;
  readonly kmh: number;
  /** Rounded to the whole mile per hour. */
  readonly mph: number;
  /** True when the tire is rated above `kmh` rather than at it: only "(Y)". */
  readonly above: boolean;
}

/**
 * A single number that orders speed capability by km/h, not by letter. A rating "above" a speed
 * sorts just over that speed and below the next symbol, so (Y) > Y > W > V.
 */
export function speedRank(kmh: number, above = false): number {
  return kmh * 2 + (above ? 1 : 0);
}

/**
 * A ZR size without a service description is only known to be rated above 240 km/h: it ranks over V,
 * but cannot be assumed to reach W (270 km/h).
 */
export const ZR_UNRATED_RANK = speedRank(SPEED_KMH.V, true);

const INFO = new Map<string, SpeedSymbolInfo>(
  (Object.keys(SPEED_KMH) as SpeedSymbol[]).map((symbol) => {
    const kmh = SPEED_KMH[symbol];
    return [symbol, { symbol, kmh, mph: Math.round(kmh / KM_PER_MILE), above: symbol === "(Y)" }];
  }),
);

/** Every speed symbol, slowest first. */
export const SPEED_SYMBOLS: readonly SpeedSymbolInfo[] = [...INFO.values()].sort(
  (a, b) => speedRank(a.kmh, a.above) - speedRank(b.kmh, b.above),
);

export function isSpeedSymbol(symbol: string): symbol is SpeedSymbol {
  return INFO.has(symbol);
}

/** Looks up a symbol as written in the table ("H", "A8", "(Y)"); undefined for anything else. */
export function speedSymbolInfo(symbol: string): SpeedSymbolInfo | undefined {
  return INFO.get(symbol);
}

export function speedSymbolRank(symbol: SpeedSymbol): number {
  return speedRank(SPEED_KMH[symbol], symbol === "(Y)");
}

/** Negative when `a` is slower than `b`, zero when equal, positive when faster. */
export function compareSpeedSymbols(a: SpeedSymbol, b: SpeedSymbol): number {
  return speedSymbolRank(a) - speedSymbolRank(b);
}

/**
 * The speed capability a tire is known to have: its speed symbol's rank, or for a ZR size with no
 * service description ZR_UNRATED_RANK; null when neither is marked.
 */
export function markedSpeedRank(size: { zr: boolean } | null, service: { speedSymbol: SpeedSymbol } | null): number | null {
  if (service) return speedSymbolRank(service.speedSymbol);
  return size?.zr ? ZR_UNRATED_RANK : null;
}
