const PLY_BY_LOAD_RANGE = {
  B: 4, C: 6, D: 8, E: 10, F: 12, G: 14, H: 16, J: 18, L: 20, M: 22, N: 24,
} as const;

export type LoadRange = keyof typeof PLY_BY_LOAD_RANGE;

export const LOAD_RANGES = Object.keys(PLY_BY_LOAD_RANGE) as readonly LoadRange[];

export function isLoadRange(letter: string): letter is LoadRange {
  return Object.hasOwn(PLY_BY_LOAD_RANGE, letter);
}

/** The ply rating a load range stands for (E → 10). */
export function plyRatingForLoadRange(loadRange: LoadRange): number {
  return PLY_BY_LOAD_RANGE[loadRange];
}

/** The load range of a ply rating (10 → E); undefined for ratings with no load range. */
export function loadRangeForPlyRating(plyRating: number): LoadRange | undefined {
  return LOAD_RANGES.find((lr) => PLY_BY_LOAD_RANGE[lr] === plyRating);
}

/** Negative when `a` is the lighter load range. */
export function compareLoadRanges(a: LoadRange, b: LoadRange): number {
  return PLY_BY_LOAD_RANGE[a] - PLY_BY_LOAD_RANGE[b];
}

/** Typical maximum cold pressure of LT load ranges, psi (common practice; the sidewall governs). */
export const LT_MAX_PRESSURE_PSI: Readonly<Partial<Record<LoadRange, number>>> = {
  C: 50,
  D: 65,
  E: 80,
  F: 95,
};

/**
 * Pressures at which ETRTO passenger load indices are defined: standard load and extra load
 * (from memory; 250 kPa ≈ 36 psi, 290 kPa ≈ 42 psi).
 */
export const REFERENCE_PRESSURE = {
  SL: { kPa: 250, psi: 36 },
  XL: { kPa: 290, psi: 42 },
} as const;
