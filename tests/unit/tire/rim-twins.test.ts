import { describe, expect, it } from "vitest";
import { toDecodeResponse } from "@/lib/tire";
import { rimTwin, rimTwinCaution } from "@/lib/tire/rim-twins";
import { read } from "./helpers";

// Whole-inch and half-inch rims of the same nominal size have different bead seats; their tires
// and wheels never interchange, and a bead seated on the wrong one can burst (common practice).
describe("rim diameters that must never be mixed (common practice)", () => {
  it.each([
    [14, 14.5], [15, 15.5], [16, 16.5], [17, 17.5], [19, 19.5], [22, 22.5], [24, 24.5],
  ])("%d-inch and %d-inch are twins, both ways", (whole, half) => {
    expect(rimTwin(whole)).toBe(half);
    expect(rimTwin(half)).toBe(whole);
  });

  it("has no twin for the other rim diameters", () => {
    for (const rim of [13, 18, 20, 21, 23, 26]) expect(rimTwin(rim)).toBeNull();
    expect(rimTwinCaution(20)).toBeNull();
  });

  it("says the caution in plain words, the whole-inch size first", () => {
    const caution = "16- and 16.5-inch tires and wheels never interchange: a bead seated on the wrong rim diameter can burst while being seated (common practice).";
    expect(rimTwinCaution(16)).toBe(caution);
    expect(rimTwinCaution(16.5)).toBe(caution);
  });

  it("adds the caution once to the decode warnings of a half-inch rim", () => {
    const warnings = toDecodeResponse(read("LT215/85R16.5 115/112Q E")).warnings;
    const cautions = warnings.filter((warning) => warning.includes("never interchange"));
    expect(cautions).toEqual([
      "This tire fits 16.5-inch wheels only. 16- and 16.5-inch tires and wheels never interchange: a bead seated on the wrong rim diameter can burst while being seated (common practice).",
    ]);
    expect(toDecodeResponse(read("33x12.50R16.5LT 110Q D")).warnings.filter((warning) => warning.includes("16.5-inch"))).toHaveLength(1);
  });

  it("leaves the decode warnings of a whole-inch rim alone: the reader's rim card carries the caution there", () => {
    expect(toDecodeResponse(read("LT265/75R16 123/120S E")).warnings).toEqual([]);
  });
});
