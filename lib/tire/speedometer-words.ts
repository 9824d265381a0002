import type { ComparedSize } from "./compare";
import { trueSpeed } from "./diameter-change";
import { formatSignedPercent, formatSpeed, formatSpeedGap, formatSpeedToTenth, type UnitSystem } from "./display";
import { breaksR39, isSmallChange, R39_SOURCE, speedometerVerdict, type SpeedometerVerdict } from "./speedometer-check";
import { mphToKmh } from "./units";

/** The speed each unit system's sentence is read at: 100 km/h, or 65 mph (common road speeds). */
export const SENTENCE_SPEED_KMH: Record<UnitSystem, number> = { metric: 100, imperial: mphToKmh(65) };

export interface SpeedometerSentence {
  designation: string;
  verdict: SpeedometerVerdict;
  /** The reading is one UN Regulation No. 39 §5.3 forbids. */
  breaksRule: boolean;
  text: string;
}

/** One plain sentence: what the speedometer shows on `size`, set for the reference, and what §5.3 says of it. */
export function speedometerSentence(referenceMm: number, size: ComparedSize, units: UnitSystem): SpeedometerSentence {
  const shownKmh = SENTENCE_SPEED_KMH[units];
  const trueKmh = trueSpeed(shownKmh, referenceMm, size.overallDiameterMm);
  const verdict = speedometerVerdict(shownKmh, referenceMm, size.overallDiameterMm);
  const reading = `On ${size.designation}, showing ${formatSpeed(shownKmh, units)}, you would be doing ${formatSpeedToTenth(trueKmh, units)}`;
  const gap = formatSpeedGap(shownKmh - trueKmh, units);
  const small = isSmallChange(size.diameterDiffPct) ? `a small change (${formatSignedPercent(size.diameterDiffPct)} in diameter)` : null;
  const verdictWords: Record<SpeedometerVerdict, string> = {
    same: "the same as on the reference",
    readsHigh: `${small ? `${small}; ` : ""}the speedometer reads ${gap} high, within what ${R39_SOURCE} allows`,
    slightlyBelowTrue: `${small}; the speedometer reads ${gap} below the true speed if it read true on the reference; speedometers are usually set to read a little high, which covers a change this small (common practice), and a fitter can check yours`,
    readsBelowTrue: `the speedometer reads ${gap} below the true speed, which ${R39_SOURCE} forbids`,
    readsTooHigh: `the speedometer reads ${gap} high, more than ${R39_SOURCE} allows (110 % of the true speed plus 4 km/h)`,
  };
  return { designation: size.designation, verdict, breaksRule: breaksR39(verdict), text: `${reading}: ${verdictWords[verdict]}.` };
}

/** The short mark a speedometer table puts beside a reading §5.3 forbids; null for any other. */
export const VERDICT_MARK: Record<SpeedometerVerdict, string | null> = {
  same: null,
  readsHigh: null,
  slightlyBelowTrue: null,
  readsBelowTrue: "below true speed",
  readsTooHigh: "too high",
};
