import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { diameterDiffPct, toleranceBand } from "@/lib/catalog/tolerance-band";

const nextUp = (value: number) => {
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, value);
  view.setBigUint64(0, view.getBigUint64(0) + 1n);
  return view.getFloat64(0);
};
const nextDown = (value: number) => {
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, value);
  view.setBigUint64(0, view.getBigUint64(0) - 1n);
  return view.getFloat64(0);
};

describe("toleranceBand", () => {
  it("holds exactly the diameters within the tolerance, to the last bit", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 400, max: 1200, noNaN: true }),
        fc.constantFrom(1, 1.5, 2, 2.5, 3, 4, 4.75, 5),
        (reference, tolerance) => {
          const { minMm, maxMm } = toleranceBand(reference, tolerance);
          const fits = (mm: number) => Math.abs(diameterDiffPct(mm, reference)) <= tolerance;
          expect(fits(minMm) && fits(maxMm)).toBe(true);
          expect(fits(nextDown(minMm)) || fits(nextUp(maxMm))).toBe(false);
        },
      ),
      { seed: 4242, numRuns: 300 },
    );
  });

  it("agrees with the rule for every candidate around a real original", () => {
    // 285/50R20: 20 × 25.4 + 2 × 285 × 0.50 = 793 mm (nominal geometry, ETRTO convention).
    const { minMm, maxMm } = toleranceBand(793, 3);
    fc.assert(
      fc.property(fc.double({ min: 700, max: 900, noNaN: true }), (mm) => {
        expect(mm >= minMm && mm <= maxMm).toBe(Math.abs(diameterDiffPct(mm, 793)) <= 3);
      }),
      { seed: 17, numRuns: 500 },
    );
  });

  it("reaches about 3 % each way from 793 mm", () => {
    const { minMm, maxMm } = toleranceBand(793, 3);
    expect(minMm).toBeCloseTo(769.21, 6);
    expect(maxMm).toBeCloseTo(816.79, 6);
  });
});
