import { describe, expect, it } from "vitest";
import { readSizeSheet } from "@/lib/size-sheet/read-size-sheet";
import { COMMON_SIZES, formatSize, sizeFromSlug } from "@/lib/tire";

describe("reading a Size sheet's URL segment", () => {
  it.each([
    ["285-50R20", "285/50R20", "285-50R20"],
    ["285%2F50R20", "285/50R20", "285-50R20"],
    ["285-50r20", "285/50R20", "285-50R20"],
    ["LT265-75R16", "LT265/75R16", "LT265-75R16"],
    ["33x12.50R15LT", "33x12.50R15LT", "33x12.50R15LT"],
    ["33X12.5R15LT", "33x12.50R15LT", "33x12.50R15LT"],
  ])("%s is %s, canonically /size/%s", (segment, designation, slug) => {
    const sheet = readSizeSheet(segment);
    expect(sheet?.designation).toBe(designation);
    expect(sheet?.slug).toBe(slug);
  });

  it("summarises the size with its nominal numbers (20 × 25.4 + 2 × 142.5 = 793 mm)", () => {
    expect(readSizeSheet("285-50R20")?.summary).toBe(
      "285/50R20: 285 mm wide, 793 mm (31.2 in) tall, for 20-inch wheels, 646 revolutions per mile.",
    );
  });

  it.each(["not-a-size", "285-50R", "119S", "285-50R20-119S", "%E0%A4%A", ""])("refuses %j", (segment) => {
    expect(readSizeSheet(segment)).toBeNull();
  });
});

describe("the common sizes listed in the sitemap", () => {
  it.each(COMMON_SIZES)("%s reads and prints back unchanged", (designation) => {
    const size = sizeFromSlug(designation);
    expect(size && formatSize(size)).toBe(designation);
  });
});
