import { describe, expect, it } from "vitest";
import { measurableSizeFromSlug, parseMarking, sizeGeometry, type MeasurableSize } from "@/lib/tire";

function size(text: string): MeasurableSize {
  const s = measurableSizeFromSlug(text);
  if (!s) throw new Error(`test size ${text} did not read`);
  return s;
}

describe("nominal geometry", () => {
  it("205/55R16 is 631.9 mm (24.88 in) tall and turns 810.7 times a mile (worked example: 16 × 25.4 + 2 × 205 × 0.55)", () => {
    const g = sizeGeometry(size("205/55R16"));
    expect(g.sidewallMm).toBeCloseTo(112.75, 10);
    expect(g.overallDiameterMm).toBeCloseTo(631.9, 10);
    expect(g.overallDiameterIn).toBeCloseTo(24.88, 2);
    expect(g.revsPerMile).toBeCloseTo(810.7, 1);
    expect(g.circumferenceMm).toBeCloseTo(Math.PI * 631.9, 10);
    expect(g.revsPerKm).toBeCloseTo(1e6 / (Math.PI * 631.9), 10);
  });

  it("285/50R20 is 285 mm wide, 50 % aspect, on a 20-inch rim: 142.5 mm sidewall, 793 mm tall (common practice)", () => {
    const s = size("285/50R20");
    expect([s.sectionWidthMm, s.aspectRatio, s.rimDiameterIn]).toEqual([285, 50, 20]);
    const g = sizeGeometry(s);
    expect(g.sidewallMm).toBe(142.5);
    expect(g.overallDiameterMm).toBeCloseTo(793, 10);
  });

  it("33x12.50R15LT is 33 in (838.2 mm) tall, 317.5 mm wide, with a 9 in sidewall (worked example: flotation sizes state the diameter)", () => {
    const s = size("33x12.50R15LT");
    expect(s.sectionWidthMm).toBeCloseTo(317.5, 10);
    const g = sizeGeometry(s);
    expect(g.overallDiameterMm).toBeCloseTo(838.2, 10);
    expect(g.overallDiameterIn).toBeCloseTo(33, 10);
    expect(g.sidewallMm).toBeCloseTo(228.6, 10);
    expect(g.aspectRatio).toBeNull();
  });

  it("155R13 uses the 82 series: 127.1 mm sidewall, 584.4 mm tall (worked example, 82 % common practice)", () => {
    const g = sizeGeometry(size("155R13"));
    expect(g.aspectRatio).toBe(82);
    expect(g.sidewallMm).toBeCloseTo(127.1, 10);
    expect(g.overallDiameterMm).toBeCloseTo(584.4, 10);
  });

  it("half-inch rims count their half: 215/85R16.5 is 784.6 mm tall (worked example)", () => {
    expect(sizeGeometry(size("LT215/85R16.5")).overallDiameterMm).toBeCloseTo(16.5 * 25.4 + 2 * 182.75, 10);
  });

  it("estimates the rolling circumference at 97 % of the free one, labelled as an approximation (common practice)", () => {
    const g = sizeGeometry(size("205/55R16"));
    expect(g.rolling.factor).toBe(0.97);
    expect(g.rolling.circumferenceMm).toBeCloseTo(g.circumferenceMm * 0.97, 10);
    expect(g.rolling.revsPerMile).toBeCloseTo(g.revsPerMile / 0.97, 10);
    expect(g.rolling.revsPerKm).toBeCloseTo(g.revsPerKm / 0.97, 10);
    expect(g.rolling.label).toMatch(/97 %.*approximation/);
    expect(sizeGeometry(size("205/55R16"), 0.96).rolling.label).toMatch(/96 %/);
  });

  it("is part of every decoded size and absent without one", () => {
    const withSize = parseMarking("205/55R16 91V");
    const withoutSize = parseMarking("91V");
    expect(withSize.ok && withSize.geometry?.overallDiameterMm).toBeCloseTo(631.9, 10);
    expect(withoutSize.ok && withoutSize.geometry).toBeNull();
  });
});
