import { LB_PER_KG } from "./units";

export const LOAD_INDEX_MIN = 0;
export const LOAD_INDEX_MAX = 279;

/**
 * Load capacity of indices 0–79 in tenths of a kilogram (ISO 4000-1 / ETRTO; published for 0–200
 * in the French Arrêté of 24 October 1994, Annex II, whose "240 kg" for index 59 is a misprint of 243).
 * Every later block of 80 repeats this one ten times heavier: index n + 80 carries 10 × index n.
 */
const BASE_TENTHS_KG = [
  450, 462, 475, 487, 500, 515, 530, 545, 560, 580, 600, 615, 630, 650, 670, 690, 710, 730, 750, 775,
  800, 825, 850, 875, 900, 925, 950, 975, 1000, 1030, 1060, 1090, 1120, 1150, 1180, 1210, 1250, 1280,
  1320, 1360, 1400, 1450, 1500, 1550, 1600, 1650, 1700, 1750, 1800, 1850, 1900, 1950, 2000, 2060, 2120,
  2180, 2240, 2300, 2360, 2430, 2500, 2570, 2650, 2720, 2800, 2900, 3000, 3070, 3150, 3250, 3350, 3450,
  3550, 3650, 3750, 3870, 4000, 4120, 4250, 4370,
];

// Integer tenths are scaled before dividing so that e.g. index 161 is exactly 4620, not 4620.000000000001.
const LOAD_KG: readonly number[] = Array.from({ length: LOAD_INDEX_MAX + 1 }, (_, li) => {
  const block = Math.floor(li / 80);
  const tenths = BASE_TENTHS_KG[li - block * 80] ?? Number.NaN;
  return block === 0 ? tenths / 10 : tenths * 10 ** (block - 1);
});

/** Load capacity in kg at the reference pressure; undefined outside 0–279 or for non-integers. */
export function loadIndexKg(loadIndex: number): number | undefined {
  return Number.isInteger(loadIndex) ? LOAD_KG[loadIndex] : undefined;
}

/** Load capacity in whole pounds (kg × 2.20462, rounded). */
export function loadIndexLb(loadIndex: number): number | undefined {
  const kg = loadIndexKg(loadIndex);
  return kg === undefined ? undefined : Math.round(kg * LB_PER_KG);
}

/** The lowest load index able to carry `kg`; undefined when even index 279 is not enough. */
export function minimumLoadIndex(kg: number): number | undefined {
  for (let li = LOAD_INDEX_MIN; li <= LOAD_INDEX_MAX; li++) {
    if ((LOAD_KG[li] ?? Number.NaN) >= kg) return li;
  }
  return undefined;
}
