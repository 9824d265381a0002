/**
 * What a change of overall diameter does, as plain ratios of nominal diameters.
 * A speedometer counts wheel turns: a taller tire covers more ground per turn than the one the
 * speedometer was set for, so the car moves faster than it shows.
 */

/** Signed change in percent, (fitted − reference) ÷ reference × 100, unrounded. */
export function diameterChangePct(referenceMm: number, fittedMm: number): number {
  return ((fittedMm - referenceMm) / referenceMm) * 100;
}

/** The true speed when the speedometer shows `shown` (any unit): shown × fitted ÷ reference. */
export function trueSpeed(shown: number, referenceMm: number, fittedMm: number): number {
  return (shown * fittedMm) / referenceMm;
}
