import { describe, expect, it } from "vitest";
import { compareSizes, measurableSizeFromSlug, type MeasurableSize } from "@/lib/tire";

const sizes = (...designations: string[]): MeasurableSize[] => designations.map((designation) => measurableSizeFromSlug(designation)!);

describe("comparing sizes", () => {
  it("reproduces the worked example of the encyclopedia article \"Speedometer\": 185/70R14 → 195/50R15 reads 6.7 % high", () => {
    const [, fitted] = compareSizes(sizes("185/70R14", "195/50R15"));
    // 185/70R14: 355.6 + 2 × 129.5 = 614.6 mm; 195/50R15: 381 + 2 × 97.5 = 576 mm.
    const row = fitted!.speedometer[0]!;
    expect(row.shownKmh / row.trueKmh).toBeCloseTo(1.067, 3);
    expect(fitted!.readsBelowTrue).toBe(false);
  });

  it("measures against the first size, which reads 0 % and shows true speeds", () => {
    const [reference] = compareSizes(sizes("285/50R20", "275/55R20"));
    expect(reference!.diameterDiffPct).toBe(0);
    expect(reference!.clearanceChangeMm).toBe(0);
    expect(reference!.speedometer.every((row) => row.trueKmh === row.shownKmh)).toBe(true);
  });

  it("flags a taller tire, whose speedometer reads below the true speed (UN Regulation No. 39 §5.3)", () => {
    const [, taller] = compareSizes(sizes("265/70R17", "285/70R17"));
    // 265/70R17: 431.8 + 371 = 802.8 mm; 285/70R17: 431.8 + 399 = 830.8 mm → +3.49 %, +14 mm clearance.
    expect(taller!.diameterDiffPct).toBeCloseTo(((830.8 - 802.8) / 802.8) * 100, 9);
    expect(taller!.clearanceChangeMm).toBeCloseTo(14, 9);
    expect(taller!.readsBelowTrue).toBe(true);
    expect(taller!.speedometer[0]!.trueKmh).toBeGreaterThan(50);
  });

  it("reads the speedometer at 50, 80, 100, 120 km/h, then 30, 50, 60, 70 mph, each in both units", () => {
    const [, fitted] = compareSizes(sizes("205/55R16", "225/45R17"));
    const rows = fitted!.speedometer;
    expect(rows.slice(0, 4).map((row) => row.shownKmh)).toEqual([50, 80, 100, 120]);
    expect(rows.slice(4).map((row) => row.shownMph)).toEqual([30, 50, 60, 70]);
    // 1 mile = 1.609344 km exactly (international mile).
    expect(rows[4]!.shownKmh).toBeCloseTo(48.28032, 9);
    expect(rows[0]!.shownMph).toBeCloseTo(50 / 1.609344, 12);
  });
});
