import { diameterChangePct } from "./diameter-change";
import { formatSize } from "./format";
import { sizeGeometry, type MeasurableSize } from "./geometry";
import { MM_PER_INCH } from "./units";

export const PLUS_GRID = {
  widthsMm: { from: 125, to: 355, step: 10 },
  aspectRatios: { from: 25, to: 85, step: 5 },
  plus: { from: -1, to: 3 },
} as const;

export interface PlusCandidate {
  designation: string;
  size: MeasurableSize;
  plus: number;
  rimDiameterIn: number;
  sectionWidthMm: number;
  /** Null only for a flotation original, which is marked by its overall diameter instead. */
  aspectRatio: number | null;
  overallDiameterMm: number;
  sidewallMm: number;
  diameterDiffPct: number;
  theoreticalRimWidthIn: number;
}

/**
 * Theoretical rim width = section width × K, K by nominal aspect ratio (UN Regulation No. 30 §6.1.1.1).
 * The K values below are from memory of that regulation's table: 0.70 for aspect ratios 75 and up,
 * 0.75 for 60–70, 0.80 for 50–55, 0.85 for 45, 0.90 for 30–40, 0.92 for 25 and below.
 */
export function rimWidthFactor(aspectRatio: number): number {
  if (aspectRatio >= 75) return 0.7;
  if (aspectRatio >= 60) return 0.75;
  if (aspectRatio >= 50) return 0.8;
  if (aspectRatio >= 45) return 0.85;
  if (aspectRatio >= 30) return 0.9;
  return 0.92;
}

/** The theoretical rim width in inches, rounded to the nearest half inch as rim widths are made. */
export function theoreticalRimWidthIn(sectionWidthMm: number, aspectRatio: number): number {
  return Math.round(((sectionWidthMm * rimWidthFactor(aspectRatio)) / MM_PER_INCH) * 2) / 2;
}

function range(from: number, to: number, step: number): number[] {
  return Array.from({ length: Math.floor((to - from) / step) + 1 }, (_, index) => from + index * step);
}

function candidateOf(original: MeasurableSize, size: MeasurableSize, plus: number, referenceMm: number): PlusCandidate {
  const geometry = sizeGeometry(size);
  const effectiveAspect = geometry.aspectRatio ?? (geometry.sidewallMm / geometry.sectionWidthMm) * 100;
  return {
    designation: formatSize(size),
    size,
    plus,
    rimDiameterIn: size.rimDiameterIn,
    sectionWidthMm: size.sectionWidthMm,
    aspectRatio: geometry.aspectRatio,
    overallDiameterMm: geometry.overallDiameterMm,
    sidewallMm: geometry.sidewallMm,
    diameterDiffPct: size === original ? 0 : diameterChangePct(referenceMm, geometry.overallDiameterMm),
    theoreticalRimWidthIn: theoreticalRimWidthIn(size.sectionWidthMm, effectiveAspect),
  };
}

/**
 * The section widths a wheel `plus` inches larger (or smaller) takes in practice, from the original's
 * width: from 10 mm narrower (20 mm on a smaller wheel) to 20 mm wider plus 10 mm for each inch
 * added (nothing added on the same or a smaller wheel). Common practice, not a standard: a wider
 * wheel carries a somewhat wider tire, and a 125 or 345 mm section on the same wheel fits no car.
 */
export function practicalWidthRangeMm(originalWidthMm: number, plus: number): { min: number; max: number } {
  return { min: originalWidthMm - (plus < 0 ? 20 : 10), max: originalWidthMm + 20 + 10 * Math.max(plus, 0) };
}

/**
 * Grid sizes on a wheel one inch smaller to three inches larger whose overall diameter stays within
 * the tolerance, the original first; ordered by plus, then |diameter change|, then width. Only the
 * section widths such a wheel takes in practice (`practicalWidthRangeMm`) unless `every` asks for
 * every theoretical size. Grid sizes keep the original's service type marks (P or LT prefix, C,
 * run-flat) so they can be matched against the catalog.
 */
export function plusCandidates(original: MeasurableSize, tolerancePct: number, { every = false } = {}): PlusCandidate[] {
  const referenceMm = sizeGeometry(original).overallDiameterMm;
  const originalCandidate = candidateOf(original, original, 0, referenceMm);
  const found: PlusCandidate[] = [originalCandidate];
  for (let plus = PLUS_GRID.plus.from; plus <= PLUS_GRID.plus.to; plus++) {
    const rimDiameterIn = original.rimDiameterIn + plus;
    const widths = practicalWidthRangeMm(original.sectionWidthMm, plus);
    for (const sectionWidthMm of range(PLUS_GRID.widthsMm.from, PLUS_GRID.widthsMm.to, PLUS_GRID.widthsMm.step)) {
      if (!every && (sectionWidthMm < widths.min || sectionWidthMm > widths.max)) continue;
      for (const aspectRatio of range(PLUS_GRID.aspectRatios.from, PLUS_GRID.aspectRatios.to, PLUS_GRID.aspectRatios.step)) {
        const size: MeasurableSize = {
          kind: "metric",
          prefix: original.prefix,
          commercial: original.commercial,
          sectionWidthMm,
          aspectRatio,
          construction: "R",
          zr: false,
          runFlat: original.runFlat,
          rimDiameterIn,
          flotationDiameterIn: null,
        };
        const candidate = candidateOf(original, size, plus, referenceMm);
        if (Math.abs(candidate.diameterDiffPct) <= tolerancePct && candidate.designation !== originalCandidate.designation) found.push(candidate);
      }
    }
  }
  return found.sort(
    (a, b) => a.plus - b.plus || Math.abs(a.diameterDiffPct) - Math.abs(b.diameterDiffPct) || a.sectionWidthMm - b.sectionWidthMm,
  );
}
