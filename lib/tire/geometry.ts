import type { TireSize } from "./types";
import { MM_PER_INCH } from "./units";

/** Sizes marked without an aspect ratio (155R13) belong to the 82 series (common practice). */
export const IMPLIED_ASPECT_RATIO = 82;

/**
 * A tire rolls on a slightly smaller circumference than its free one because the loaded tire
 * deflects. 0.97 is an approximation (common practice), not a measured value for any tire.
 */
export const ROLLING_CIRCUMFERENCE_FACTOR = 0.97;

const INCHES_PER_MILE = 63_360;

export interface RollingEstimate {
  factor: number;
  label: string;
  circumferenceMm: number;
  revsPerMile: number;
  revsPerKm: number;
}

/** Nominal dimensions of a new, unloaded tire; unrounded. */
export interface Geometry {
  sectionWidthMm: number;
  /** The aspect ratio the numbers use (82 for sizes marked without one); null for flotation sizes. */
  aspectRatio: number | null;
  rimDiameterMm: number;
  sidewallMm: number;
  overallDiameterMm: number;
  overallDiameterIn: number;
  circumferenceMm: number;
  revsPerMile: number;
  revsPerKm: number;
  rolling: RollingEstimate;
}

export function rollingLabel(factor: number): string {
  const pct = Math.round(factor * 1000) / 10;
  return `Estimated rolling circumference: about ${pct} % of the free circumference (an approximation, common practice)`;
}

const DEFAULT_ROLLING_LABEL = rollingLabel(ROLLING_CIRCUMFERENCE_FACTOR);

/** A size whose marking gives its overall diameter: every metric and flotation size, not an inch-width one. */
export type MeasurableSize = TireSize & { kind: "metric" | "flotation" };

export function hasNominalDiameter(size: TireSize): size is MeasurableSize {
  return size.kind !== "inch";
}

/**
 * Why an inch-width size (11R22.5, 7.50-16) gets no drawing or figures: its marking gives no aspect
 * ratio, and the 82 series assumed for 185R14 does not apply to it.
 */
export const NO_NOMINAL_DIAMETER =
  "the marking gives no aspect ratio, and the 82 series of sizes like 185R14 does not apply to it; take the overall diameter from the tire maker's data";

export function sizeGeometry(size: MeasurableSize, rollingFactor = ROLLING_CIRCUMFERENCE_FACTOR): Geometry {
  const rimDiameterMm = size.rimDiameterIn * MM_PER_INCH;
  let aspectRatio: number | null = null;
  let sidewallMm: number;
  let overallDiameterMm: number;
  if (size.flotationDiameterIn !== null) {
    overallDiameterMm = size.flotationDiameterIn * MM_PER_INCH;
    sidewallMm = (overallDiameterMm - rimDiameterMm) / 2;
  } else {
    aspectRatio = size.aspectRatio ?? IMPLIED_ASPECT_RATIO;
    sidewallMm = (size.sectionWidthMm * aspectRatio) / 100;
    overallDiameterMm = rimDiameterMm + 2 * sidewallMm;
  }
  const overallDiameterIn = overallDiameterMm / MM_PER_INCH;
  const circumferenceMm = Math.PI * overallDiameterMm;
  const rollingCircumferenceMm = circumferenceMm * rollingFactor;
  return {
    sectionWidthMm: size.sectionWidthMm,
    aspectRatio,
    rimDiameterMm,
    sidewallMm,
    overallDiameterMm,
    overallDiameterIn,
    circumferenceMm,
    revsPerMile: INCHES_PER_MILE / (Math.PI * overallDiameterIn),
    revsPerKm: 1e6 / circumferenceMm,
    rolling: {
      factor: rollingFactor,
      label: rollingFactor === ROLLING_CIRCUMFERENCE_FACTOR ? DEFAULT_ROLLING_LABEL : rollingLabel(rollingFactor),
      circumferenceMm: rollingCircumferenceMm,
      revsPerMile: (INCHES_PER_MILE * MM_PER_INCH) / rollingCircumferenceMm,
      revsPerKm: 1e6 / rollingCircumferenceMm,
    },
  };
}
