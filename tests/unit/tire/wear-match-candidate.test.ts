import { describe, expect, it } from "vitest";
import { byWearMatch, candidateWear, candidateWearWords, type WearCandidate } from "@/lib/tire";

// 285/50R20: 285 × 0.5 × 2 + 20 × 25.4 = 793 mm nominal (the metric size formula).
const candidate = (treadDepth32: number | null, designation = "285/50R20"): WearCandidate => ({ designation, overallDiameterMm: 793, treadDepth32 });
const staying = { remaining32: [7, 7.5, 8], limit32: 2 };

describe("a finder result beside the tires that stay", () => {
  it("judges a tire of the original's size with its line's new depth", () => {
    // Worked: shallowest 7, deepest 8, limit 2 → a new tire may be 6 to 9/32 in deep.
    expect(candidateWear(candidate(9), "285/50R20", staying)).toMatchObject({ kind: "judged", match: { verdict: "fitsAsIs" } });
    expect(candidateWear(candidate(11), "285/50R20", staying)).toMatchObject({ kind: "judged", match: { verdict: "shave", shaveTo32: 9 } });
    expect(candidateWear(candidate(5.5), "285/50R20", staying)).toMatchObject({ kind: "judged", match: { verdict: "replaceSet", replaceReason: "newTooShallow" } });
  });

  it("sends the shop to measure when the line's depth is not on record, and never matches another size", () => {
    expect(candidateWear(candidate(null), "285/50R20", staying)).toEqual({ kind: "unknownDepth" });
    // Common practice: tread depth matching compares tires of one size only.
    expect(candidateWear(candidate(9, "275/55R20"), "285/50R20", staying)).toEqual({ kind: "otherSize" });
  });

  it("puts no shaving first, then shaving, then unknown depths, then a new set, then other sizes, keeping the list's order within each", () => {
    const list = [candidate(12), candidate(9, "275/55R20"), candidate(null), candidate(5), candidate(8), candidate(11), candidate(9)];
    const sorted = byWearMatch(list, (tire) => candidateWear(tire, "285/50R20", staying));
    expect(sorted.map((tire) => `${tire.designation} ${tire.treadDepth32}`)).toEqual([
      "285/50R20 8", "285/50R20 9", "285/50R20 12", "285/50R20 11", "285/50R20 null", "285/50R20 5", "275/55R20 9",
    ]);
  });

  it("says each verdict in a few words", () => {
    expect(candidateWearWords(candidateWear(candidate(11), "285/50R20", staying))).toBe("Shave to 9/32 in before fitting: 11/32 in new");
    expect(candidateWearWords(candidateWear(candidate(9), "285/50R20", staying))).toMatch(/^Fits as it is/);
    expect(candidateWearWords({ kind: "unknownDepth" })).toMatch(/ask the shop/);
    expect(candidateWearWords({ kind: "otherSize" })).toMatch(/cannot be matched by tread depth/);
  });
});
