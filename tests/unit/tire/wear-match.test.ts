import convert from "convert-units";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { depthLimit32, formatDepth32, MM_PER_32ND, shaveDepthToShow, wearMatch, wearVerdictSentence, type WearLimit, wornTire } from "@/lib/tire";

// 225/65R17: 17 × 25.4 + 2 × 225 × 0.65 = 431.8 + 292.5 = 724.3 mm, the ISO 4000-1 nominal overall diameter.
const D_225_65R17 = 724.3;
const depth = (value: number): WearLimit => ({ kind: "depth32", value });
const circumference = (value: number): WearLimit => ({ kind: "circumferenceMm", value });

describe("the arithmetic of worn tires", () => {
  it("takes 1/32 in as 0.79375 mm: the international inch is 25.4 mm exactly; the npm library convert-units agrees to 1e-7", () => {
    expect(MM_PER_32ND).toBe(0.79375);
    expect(MM_PER_32ND).toBeCloseTo(convert(1 / 32).from("in").to("mm"), 6);
  });

  it("takes twice the lost tread off the diameter, and π × diameter as the free circumference (worked by hand)", () => {
    // 10/32 new, 6/32 left: 4/32 of tread = 3.175 mm on each side, 6.35 mm of diameter.
    const tire = wornTire(D_225_65R17, 10, 6);
    expect(tire.overallDiameterMm).toBeCloseTo(717.95, 9);
    expect(tire.circumferenceMm).toBeCloseTo(Math.PI * 717.95, 9);
    expect(wornTire(D_225_65R17, 10, 10).overallDiameterMm).toBe(D_225_65R17);
  });

  it("turns a circumference limit into a depth limit: c / (2π × 0.79375 mm)", () => {
    // 10 mm of circumference = 10 / π mm of diameter = 5 / π mm of tread a side ≈ 2.0051/32 in (worked by hand).
    expect(depthLimit32(circumference(10))).toBeCloseTo(2.0051, 4);
    expect(depthLimit32(depth(2))).toBe(2);
  });
});

describe("the verdict (limits: 2/32 in is common practice; the vehicle maker's figure rules)", () => {
  it("a new tire within the limit of every staying tire fits as it is", () => {
    const match = wearMatch({ newDiameterMm: D_225_65R17, newDepth32: 10, remaining32: [9, 9.5, 10], limit: depth(2) });
    expect(match).toMatchObject({ verdict: "fitsAsIs", spread32: 1, shaveTo32: null, replaceReason: null });
  });

  it("a new tire deeper than the shallowest staying one plus the limit is shaved to that depth", () => {
    const match = wearMatch({ newDiameterMm: D_225_65R17, newDepth32: 10, remaining32: [6, 6, 7], limit: depth(2) });
    expect(match).toMatchObject({ verdict: "shave", shaveTo32: 8, spread32: 1 });
    expect(match.remaining.map((tire) => tire.overallDiameterMm)).toEqual([expect.closeTo(717.95, 9), expect.closeTo(717.95, 9), expect.closeTo(719.5375, 9)]);
  });

  it("staying tires that already differ by more than the limit mean replacing the set", () => {
    const match = wearMatch({ newDiameterMm: D_225_65R17, newDepth32: 10, remaining32: [5, 8], limit: depth(2) });
    expect(match).toMatchObject({ verdict: "replaceSet", replaceReason: "spread", spread32: 3 });
  });

  it("a new tire shallower than the deepest staying one less the limit means replacing the set: shaving adds no tread", () => {
    const match = wearMatch({ newDiameterMm: D_225_65R17, newDepth32: 8, remaining32: [11, 11.5], limit: depth(2) });
    expect(match).toMatchObject({ verdict: "replaceSet", replaceReason: "newTooShallow" });
  });

  it("a tire exactly at the limit is within it, for a circumference limit too", () => {
    expect(wearMatch({ newDiameterMm: D_225_65R17, newDepth32: 8, remaining32: [6, 6, 6], limit: depth(2) }).verdict).toBe("fitsAsIs");
    const limit = circumference(2 * 2 * Math.PI * MM_PER_32ND); // exactly 2/32 in of depth
    expect(wearMatch({ newDiameterMm: D_225_65R17, newDepth32: 8, remaining32: [6, 6, 6], limit }).verdict).toBe("fitsAsIs");
  });

  it("a circumference limit gives an unrounded shaving depth, shown rounded down to a whole 32nd", () => {
    const match = wearMatch({ newDiameterMm: D_225_65R17, newDepth32: 10, remaining32: [6, 6, 6], limit: circumference(10) });
    expect(match.shaveTo32).toBeCloseTo(8.0051, 4);
    expect(shaveDepthToShow(match)).toBe(8);
  });

  it("shows a half where a whole 32nd would take too much off (a limit under 1/32)", () => {
    const limit = circumference(0.3 * 2 * Math.PI * MM_PER_32ND); // 0.3/32 in of depth
    const match = wearMatch({ newDiameterMm: D_225_65R17, newDepth32: 10, remaining32: [6.5, 6.5], limit });
    expect(match.shaveTo32).toBeCloseTo(6.8, 9);
    expect(shaveDepthToShow(match)).toBe(6.5);
  });
});

const halves = (min: number, max: number) => fc.integer({ min: min * 2, max: max * 2 }).map((value) => value / 2);
const limits = fc.oneof(halves(0.5, 4).map(depth), fc.double({ min: 0.5, max: 25, noNaN: true }).map(circumference));
const cases = fc.record({ newDepth32: halves(2, 20), remaining32: fc.array(halves(0, 20), { minLength: 2, maxLength: 3 }), limit: limits });
const SLACK = 1e-6;
const withinLimit = (depths: readonly number[], limit32: number) => Math.max(...depths) - Math.min(...depths) <= limit32 + SLACK;

describe("properties of the verdict", () => {
  it("never lets two tires on the vehicle differ by more than the limit, and replaces the set only when no depth would do", () => {
    fc.assert(
      fc.property(cases, (input) => {
        const match = wearMatch({ newDiameterMm: D_225_65R17, ...input });
        const limit32 = depthLimit32(input.limit);
        if (match.verdict === "fitsAsIs") expect(withinLimit([input.newDepth32, ...input.remaining32], limit32)).toBe(true);
        if (match.verdict === "shave") {
          expect(withinLimit([match.shaveTo32!, ...input.remaining32], limit32)).toBe(true);
          expect(withinLimit([shaveDepthToShow(match)!, ...input.remaining32], limit32)).toBe(true);
        }
        if (match.verdict === "replaceSet") {
          // The best a new tire could do is the deepest depth it may keep, no deeper than it is.
          const best = Math.min(input.newDepth32, Math.min(...input.remaining32) + limit32);
          expect(withinLimit([best, ...input.remaining32], limit32 - 2 * SLACK)).toBe(false);
        }
      }),
      { numRuns: 3000 },
    );
  });

  it("shaveTo32 is the deepest depth that keeps every tire within the limit", () => {
    fc.assert(
      fc.property(cases, (input) => {
        const match = wearMatch({ newDiameterMm: D_225_65R17, ...input });
        if (match.verdict !== "shave") return;
        const limit32 = depthLimit32(input.limit);
        expect(match.shaveTo32!).toBeLessThan(input.newDepth32);
        expect(withinLimit([match.shaveTo32! + 0.01, ...input.remaining32], limit32)).toBe(false);
      }),
      { numRuns: 3000 },
    );
  });
});

describe("the verdict in words", () => {
  const sentence = (newDepth32: number, remaining32: number[], limit: WearLimit) =>
    wearVerdictSentence(wearMatch({ newDiameterMm: D_225_65R17, newDepth32, remaining32, limit }), limit);

  it("says each verdict with the numbers that decided it", () => {
    expect(sentence(10, [9, 9.5, 10], depth(2))).toBe("The new tire can go on as it is: at 10/32 in it is within 2/32 in of tread depth of every tire that stays (9/32 in to 10/32 in).");
    expect(sentence(10, [6, 6, 7], depth(2))).toBe(
      "Shave the new tire to 8/32 in before it goes on: at 10/32 in it is 4/32 in deeper than the shallowest tire that stays (6/32 in), and the limit is 2/32 in of tread depth.",
    );
    expect(sentence(10, [5, 8], depth(2))).toMatch(/^Replace the set: the tires that stay already differ by 3\/32 in \(5\/32 in to 8\/32 in\)/);
    expect(sentence(8, [11, 11.5], depth(2))).toMatch(/^Replace the set: the new tire's 8\/32 in is more than 2\/32 in of tread depth below the deepest tire that stays \(11.5\/32 in\), and shaving cannot add tread\.$/);
  });

  it("names a circumference limit and the depth it allows", () => {
    expect(sentence(10, [6, 6, 6], circumference(10))).toContain("the limit is 10 mm of rolling circumference (about 2.01/32 in of tread depth)");
  });

  it("gives a depth in 32nds and millimetres", () => {
    expect(formatDepth32(6.5)).toBe("6.5/32 in (5.2 mm)");
  });
});
