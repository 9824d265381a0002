import { describe, expect, it } from "vitest";
import {
  compareLoadRanges,
  isLoadRange,
  LOAD_RANGES,
  loadRangeForPlyRating,
  plyRatingForLoadRange,
} from "@/lib/tire";

describe("load ranges", () => {
  it.each([["B", 4], ["C", 6], ["D", 8], ["E", 10], ["F", 12], ["G", 14], ["H", 16], ["J", 18], ["L", 20], ["M", 22], ["N", 24]] as const)(
    "load range %s is a %i-ply rating (common practice)",
    (lr, ply) => {
      expect(plyRatingForLoadRange(lr)).toBe(ply);
      expect(loadRangeForPlyRating(ply)).toBe(lr);
    },
  );

  it("10-ply is load range E (common practice)", () => {
    expect(loadRangeForPlyRating(10)).toBe("E");
  });

  it("orders load ranges by ply rating and rejects letters that are not load ranges (common practice)", () => {
    expect(LOAD_RANGES).toHaveLength(11);
    expect(compareLoadRanges("D", "E")).toBeLessThan(0);
    expect(isLoadRange("I")).toBe(false);
    expect(isLoadRange("K")).toBe(false);
    expect(loadRangeForPlyRating(7)).toBeUndefined();
  });
});
