import { describe, expect, it } from "vitest";
import { measurableSizeFromSlug, sizeGeometry } from "@/lib/tire";
import { diameterChangePct, trueSpeed } from "@/lib/tire/diameter-change";

function diameterOf(designation: string): number {
  const size = measurableSizeFromSlug(designation);
  if (!size) throw new Error(`test size ${designation} did not read`);
  return sizeGeometry(size).overallDiameterMm;
}

describe("diameter change", () => {
  it("is signed and relative to the reference (worked example: (830.8 − 802.8) ÷ 802.8 × 100)", () => {
    const reference = diameterOf("265/70R17");
    const fitted = diameterOf("285/70R17");
    expect(reference).toBeCloseTo(802.8, 10);
    expect(fitted).toBeCloseTo(830.8, 10);
    expect(diameterChangePct(reference, fitted)).toBeCloseTo(3.4878, 3);
    expect(diameterChangePct(fitted, reference)).toBeCloseTo(-3.3702, 3);
    expect(diameterChangePct(reference, reference)).toBe(0);
  });

  it("a taller tire makes the car faster than the speedometer shows (worked example: 100 × 830.8 ÷ 802.8)", () => {
    expect(trueSpeed(100, 802.8, 830.8)).toBeCloseTo(103.488, 3);
    expect(trueSpeed(60, 830.8, 802.8)).toBeLessThan(60);
    expect(trueSpeed(80, 700, 700)).toBe(80);
  });
});
