/**
 * Rim diameters made both in whole inches and half an inch larger (16 and 16.5 …), for different
 * beads and bead seats. Tires and wheels of the two never interchange: a bead seated on the wrong
 * rim diameter can burst while being seated (common practice).
 */
const RIM_TWINS: ReadonlyArray<readonly [number, number]> = [
  [14, 14.5],
  [15, 15.5],
  [16, 16.5],
  [17, 17.5],
  [19, 19.5],
  [22, 22.5],
  [24, 24.5],
];

/** The other rim diameter a tire of this one must never be mixed with (16 → 16.5, 16.5 → 16); null when there is none. */
export function rimTwin(rimDiameterIn: number): number | null {
  for (const [whole, half] of RIM_TWINS) {
    if (rimDiameterIn === whole) return half;
    if (rimDiameterIn === half) return whole;
  }
  return null;
}

/** The caution in plain words, for a rim diameter that has a twin; null otherwise. */
export function rimTwinCaution(rimDiameterIn: number): string | null {
  const twin = rimTwin(rimDiameterIn);
  if (twin === null) return null;
  const [whole, half] = twin > rimDiameterIn ? [rimDiameterIn, twin] : [twin, rimDiameterIn];
  return `${whole}- and ${half}-inch tires and wheels never interchange: a bead seated on the wrong rim diameter can burst while being seated (common practice).`;
}
