import { diameterChangePct, trueSpeed } from "./diameter-change";
import { formatSize } from "./format";
import { sizeGeometry, type MeasurableSize } from "./geometry";
import { readsBelowTrueSpeed, speedometerVerdict } from "./speedometer-check";
import { KM_PER_MILE, mmToIn } from "./units";

export interface SpeedometerRow {
  shownKmh: number;
  trueKmh: number;
  shownMph: number;
  trueMph: number;
}

export interface ComparedSize {
  designation: string;
  overallDiameterMm: number;
  overallDiameterIn: number;
  sectionWidthMm: number;
  sidewallMm: number;
  circumferenceMm: number;
  revsPerMile: number;
  /** (this − reference) ÷ reference × 100, unrounded; 0 for the reference. */
  diameterDiffPct: number;
  /** Half the change of overall diameter: how much higher (or lower) the axle rides. */
  clearanceChangeMm: number;
  speedometer: SpeedometerRow[];
  /** True when the speedometer would show less than the true speed (UN Regulation No. 39 §5.3 forbids that). */
  readsBelowTrue: boolean;
}

/** Speeds at which the speedometer is read: common road speeds in each unit system. */
export const SHOWN_KMH = [50, 80, 100, 120] as const;
export const SHOWN_MPH = [30, 50, 60, 70] as const;

function speedometerRows(referenceMm: number, fittedMm: number): SpeedometerRow[] {
  const row = (shownKmh: number, shownMph: number): SpeedometerRow => ({
    shownKmh,
    trueKmh: trueSpeed(shownKmh, referenceMm, fittedMm),
    shownMph,
    trueMph: trueSpeed(shownMph, referenceMm, fittedMm),
  });
  return [...SHOWN_KMH.map((kmh) => row(kmh, kmh / KM_PER_MILE)), ...SHOWN_MPH.map((mph) => row(mph * KM_PER_MILE, mph))];
}

/** Each size measured against the first, which is the reference the speedometer was set for. */
export function compareSizes(sizes: readonly MeasurableSize[]): ComparedSize[] {
  const reference = sizes[0] ? sizeGeometry(sizes[0]).overallDiameterMm : 0;
  return sizes.map((size) => {
    const geometry = sizeGeometry(size);
    const diameter = geometry.overallDiameterMm;
    return {
      designation: formatSize(size),
      overallDiameterMm: diameter,
      overallDiameterIn: mmToIn(diameter),
      sectionWidthMm: geometry.sectionWidthMm,
      sidewallMm: geometry.sidewallMm,
      circumferenceMm: geometry.circumferenceMm,
      revsPerMile: geometry.revsPerMile,
      diameterDiffPct: diameterChangePct(reference, diameter),
      clearanceChangeMm: (diameter - reference) / 2,
      speedometer: speedometerRows(reference, diameter),
      readsBelowTrue: readsBelowTrueSpeed(speedometerVerdict(SHOWN_KMH[0], reference, diameter)),
    };
  });
}
