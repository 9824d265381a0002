/** Signed (candidate − reference) ÷ reference × 100, in this order of operations, as the finder's SQL computes it. */
export function diameterDiffPct(candidateMm: number, referenceMm: number): number {
  return ((candidateMm - referenceMm) / referenceMm) * 100;
}

const bits = new Float64Array(1);
const asInteger = new BigInt64Array(bits.buffer);

function toOrdered(value: number): bigint {
  bits[0] = value;
  return asInteger[0] ?? 0n;
}

function fromOrdered(ordered: bigint): number {
  asInteger[0] = ordered;
  return bits[0] ?? Number.NaN;
}

/**
 * The largest positive double in [from, to] for which `holds` is true, given that it holds at `from`,
 * fails at `to`, and changes only once in between. Positive doubles sort like their bit patterns.
 */
function lastHolding(from: number, to: number, holds: (value: number) => boolean): number {
  let good = toOrdered(from);
  let bad = toOrdered(to);
  const step = good < bad ? 1n : -1n;
  while ((bad - good) * step > 1n) {
    const middle = good + ((bad - good) / 2n);
    if (holds(fromOrdered(middle))) good = middle;
    else bad = middle;
  }
  return fromOrdered(good);
}

/**
 * The overall diameters, in mm, that rule 2 accepts: exactly those with |diameterDiffPct| ≤ tolerance.
 * The percentage only grows as a diameter moves away from the reference (each floating-point step is
 * monotonic), so the accepted diameters form one interval, whose ends are found to the last bit. The
 * finder can then test rule 2 as a range on its index and still agree with the written rule.
 */
export function toleranceBand(referenceMm: number, tolerancePct: number): { minMm: number; maxMm: number } {
  const fits = (mm: number) => Math.abs(diameterDiffPct(mm, referenceMm)) <= tolerancePct;
  const reach = referenceMm * (tolerancePct / 100);
  return {
    minMm: lastHolding(referenceMm, Math.max(Number.MIN_VALUE, referenceMm - 2 * reach - 1), fits),
    maxMm: lastHolding(referenceMm, referenceMm + 2 * reach + 1, fits),
  };
}
