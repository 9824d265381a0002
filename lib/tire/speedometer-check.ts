import { trueSpeed } from "./diameter-change";

/**
 * UN Regulation No. 39, §5.3: the speed a speedometer shows (V1) is never less than the true speed
 * (V2), and 0 ≤ V1 − V2 ≤ 0.1 × V2 + 4 km/h. The rule is written for approving a vehicle's
 * speedometer on its own tires; here the reference size stands for those tires and is taken to read
 * true, so only the change of size moves the reading.
 */
export const R39_SOURCE = "UN Regulation No. 39 §5.3";
export const R39_OVER_READING_SHARE = 0.1;
export const R39_OVER_READING_KMH = 4;

/** A change of overall diameter under 1 % is described as small (the product's wording, not a standard). */
export const isSmallChange = (diameterDiffPct: number): boolean => Math.abs(diameterDiffPct) < 1;

/**
 * same: reads as on the reference; readsHigh: shows more than the true speed, within §5.3;
 * slightlyBelowTrue: a tire under 1 % taller, which a speedometer set to read a little high absorbs
 * (common practice: makers set them to over-read); readsBelowTrue and readsTooHigh: what §5.3 forbids.
 */
export type SpeedometerVerdict = "same" | "readsHigh" | "slightlyBelowTrue" | "readsBelowTrue" | "readsTooHigh";

// Nominal diameters are whole hundredths of a millimetre; anything closer is floating-point rounding.
const SAME_DIAMETER_MM = 0.001;

/** The verdict for a speedometer set for `referenceMm` and showing `shownKmh` on a tire of `fittedMm`. */
export function speedometerVerdict(shownKmh: number, referenceMm: number, fittedMm: number): SpeedometerVerdict {
  if (Math.abs(fittedMm - referenceMm) < SAME_DIAMETER_MM) return "same";
  if (fittedMm > referenceMm) return isSmallChange(((fittedMm - referenceMm) / referenceMm) * 100) ? "slightlyBelowTrue" : "readsBelowTrue";
  const trueKmh = trueSpeed(shownKmh, referenceMm, fittedMm);
  return shownKmh - trueKmh > R39_OVER_READING_SHARE * trueKmh + R39_OVER_READING_KMH ? "readsTooHigh" : "readsHigh";
}

export const breaksR39 = (verdict: SpeedometerVerdict): boolean => verdict === "readsBelowTrue" || verdict === "readsTooHigh";

/** The speedometer shows less than the true speed on the fitted tire, by however little. */
export const readsBelowTrueSpeed = (verdict: SpeedometerVerdict): boolean => verdict === "readsBelowTrue" || verdict === "slightlyBelowTrue";
