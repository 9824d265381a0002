import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { PLUS_GRID, plusCandidates, practicalWidthRangeMm, measurableSizeFromSlug, sizeGeometry, theoreticalRimWidthIn, type MeasurableSize } from "@/lib/tire";

const size = (designation: string): MeasurableSize => measurableSizeFromSlug(designation)!;

/** Brute force: every grid size, measured the long way, for comparison with the planner. */
function bruteForce(original: MeasurableSize, tolerancePct: number): string[] {
  const reference = sizeGeometry(original).overallDiameterMm;
  const found: string[] = [];
  for (let plus = -1; plus <= 3; plus++) {
    for (let width = 125; width <= 355; width += 10) {
      for (let aspect = 25; aspect <= 85; aspect += 5) {
        const rim = original.rimDiameterIn + plus;
        const diameter = rim * 25.4 + (2 * width * aspect) / 100;
        if ((Math.abs(diameter - reference) / reference) * 100 <= tolerancePct) found.push(`${width}/${aspect}R${rim}`);
      }
    }
  }
  return found;
}

describe("the Plus planner's candidates", () => {
  it("lists the original once, with plus 0 and 0 % difference", () => {
    const candidates = plusCandidates(size("225/45R17"), 3, { every: true });
    expect(candidates.filter((candidate) => candidate.designation === "225/45R17")).toEqual([
      expect.objectContaining({ plus: 0, diameterDiffPct: 0 }),
    ]);
    // 135/75R17 has exactly the same nominal diameter (431.8 + 202.5 = 634.3 mm) and is narrower, so it sorts first.
    expect(candidates.filter((candidate) => candidate.plus === 0).slice(0, 2).map((c) => c.designation)).toEqual(["135/75R17", "225/45R17"]);
  });

  it("finds the well-known plus-one step 205/55R16 → 225/45R17 within 1 % (common practice)", () => {
    const candidate = plusCandidates(size("205/55R16"), 3).find((c) => c.designation === "225/45R17");
    expect(candidate?.plus).toBe(1);
    // 205/55R16 = 631.9 mm; 225/45R17 = 634.3 mm → +0.38 %.
    expect(candidate?.diameterDiffPct).toBeCloseTo(((634.3 - 631.9) / 631.9) * 100, 9);
  });

  it("misses no grid size and keeps none outside the tolerance (brute-force enumeration)", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 23 }).map((i) => 125 + i * 10),
        fc.integer({ min: 0, max: 12 }).map((i) => 25 + i * 5),
        fc.integer({ min: 14, max: 22 }),
        fc.double({ min: 1, max: 5, noNaN: true }),
        (width, aspect, rim, tolerance) => {
          const original = size(`${width}/${aspect}R${rim}`);
          const planned = plusCandidates(original, tolerance, { every: true }).map((candidate) => candidate.designation);
          expect(new Set(planned)).toEqual(new Set(bruteForce(original, tolerance)));
          // The widths a wheel takes in practice, written out again here: −10 mm (−20 on a smaller wheel) to +20 mm + 10 per inch added.
          const practical = bruteForce(original, tolerance).filter((designation) => {
            const candidate = size(designation);
            const plus = candidate.rimDiameterIn - rim;
            return candidate.sectionWidthMm >= width - (plus < 0 ? 20 : 10) && candidate.sectionWidthMm <= width + 20 + 10 * Math.max(plus, 0);
          });
          expect(new Set(plusCandidates(original, tolerance).map((candidate) => candidate.designation))).toEqual(new Set(practical));
        },
      ),
      { numRuns: 60, seed: 20261202 },
    );
  });

  it("keeps every candidate on the grid and orders by plus, then |difference|, then width", () => {
    const candidates = plusCandidates(size("LT265/75R16"), 5);
    for (const candidate of candidates.slice(1)) {
      expect((candidate.sectionWidthMm - PLUS_GRID.widthsMm.from) % 10).toBe(0);
      expect(candidate.plus).toBeGreaterThanOrEqual(-1);
      expect(candidate.plus).toBeLessThanOrEqual(3);
      expect(candidate.designation.startsWith("LT")).toBe(true);
    }
    const keys = candidates.map((c) => [c.plus, Math.abs(c.diameterDiffPct), c.sectionWidthMm] as const);
    const sorted = [...keys].sort((a, b) => a[0] - b[0] || a[1] - b[1] || a[2] - b[2]);
    expect(keys).toEqual(sorted);
  });

  it("gives the theoretical rim width as section width × K, to the half inch (UN Regulation No. 30 §6.1.1.1; K from memory)", () => {
    // 225 × 0.85 = 191.25 mm = 7.53 in → 7.5; 265 × 0.70 = 185.5 mm = 7.30 in → 7.5; 285 × 0.80 = 228 mm = 8.98 in → 9.0.
    expect(theoreticalRimWidthIn(225, 45)).toBe(7.5);
    expect(theoreticalRimWidthIn(265, 75)).toBe(7.5);
    expect(theoreticalRimWidthIn(285, 50)).toBe(9);
  });

  it("lists by default only the section widths a wheel takes in practice (common practice)", () => {
    const every = plusCandidates(size("225/45R17"), 3, { every: true });
    const practical = plusCandidates(size("225/45R17"), 3);
    expect(every.map((candidate) => candidate.designation)).toEqual(expect.arrayContaining(["125/80R17", "345/30R17"]));
    expect(practical.map((candidate) => candidate.designation)).not.toEqual(expect.arrayContaining(["125/80R17"]));
    expect(practical.length).toBeLessThan(every.length / 3);
    for (const candidate of practical.slice(1)) {
      const { min, max } = practicalWidthRangeMm(225, candidate.plus);
      expect(candidate.sectionWidthMm, candidate.designation).toBeGreaterThanOrEqual(min);
      expect(candidate.sectionWidthMm, candidate.designation).toBeLessThanOrEqual(max);
    }
    // +1 inch: 215 to 255 mm; −1 inch: 205 to 245 mm.
    expect(practicalWidthRangeMm(225, 1)).toEqual({ min: 215, max: 255 });
    expect(practicalWidthRangeMm(225, -1)).toEqual({ min: 205, max: 245 });
    expect(practical.map((candidate) => candidate.designation)).toContain("225/40R18");
  });
});
