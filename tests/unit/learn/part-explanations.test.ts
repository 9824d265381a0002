import { describe, expect, it } from "vitest";
import { explainPart, moreAboutLabel, sidewallParts } from "@/content/sidewall-parts";
import { parseMarking, type TireSize } from "@/lib/tire";

function sizeOf(text: string): TireSize {
  const read = parseMarking(text);
  if (!read.ok || !read.size) throw new Error(`${text} has no size`);
  return read.size;
}

describe("part explanations for a given size", () => {
  it("a flotation size's width is in inches and its first number the overall diameter in inches (flotation designation)", () => {
    const size = sizeOf("33x12.50R15LT");
    expect(explainPart("sectionWidth", size).summary).toMatch(/section width in inches, not millimetres/);
    expect(explainPart("overallDiameter", size).summary).toMatch(/first number is the tire's overall diameter in inches/);
    expect(explainPart("sectionWidth", sizeOf("285/50R20")).summary).toBe(sidewallParts.sectionWidth.summary);
  });

  it("a rim with a half-inch twin says the two never interchange (common practice)", () => {
    expect(explainPart("rimDiameter", sizeOf("LT235/85R16")).summary).toContain(
      "16- and 16.5-inch tires and wheels never interchange: a bead seated on the wrong rim diameter can burst while being seated",
    );
    expect(explainPart("rimDiameter", sizeOf("33x12.50R16.5LT")).summary).toContain("16- and 16.5-inch tires and wheels never interchange");
    expect(explainPart("rimDiameter", sizeOf("285/50R20"))).toBe(sidewallParts.rimDiameter);
    expect(explainPart("rimDiameter", null)).toBe(sidewallParts.rimDiameter);
  });

  it("the load index says passenger tires carry no dual rating and do not belong on dual wheels (common practice)", () => {
    expect(sidewallParts.loadIndex.summary).toContain("Passenger tires have one number only: they carry no dual rating and do not belong on dual wheels.");
  });
});

describe("More about … links", () => {
  it("keep the capitals of abbreviations and lower-case the rest", () => {
    expect(moreAboutLabel(sidewallParts.dot.title)).toBe("More about DOT code (TIN)");
    expect(moreAboutLabel(sidewallParts.utqg.title)).toBe("More about UTQG grades");
    expect(moreAboutLabel(sidewallParts.extraLoad.title)).toBe("More about extra load (XL)");
    expect(moreAboutLabel(sidewallParts.loadIndex.title)).toBe("More about load index");
    expect(moreAboutLabel(sidewallParts.runFlat.title)).toBe("More about run-flat");
  });
});
