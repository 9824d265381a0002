import { describe, expect, it } from "vitest";
import { formatSize, sizeToSlug, serviceType } from "@/lib/tire";
import { readSizeSheet } from "@/lib/size-sheet/read-size-sheet";
import { read } from "./helpers";

// Truck and inch-width sizes give the section width in inches and no aspect ratio: 11R22.5 is an
// 11-inch radial for 22.5-inch wheels, 7.50-16 a 7.50-inch bias tire for 16-inch wheels (TRA
// designations, common practice; from memory). One inch is 25.4 mm exactly (1959 international inch).

describe("reading truck and inch-width sizes", () => {
  it.each([
    ["11R22.5", { kind: "inch", prefix: null, commercial: true, sectionWidthMm: 279.4, aspectRatio: null, construction: "R", rimDiameterIn: 22.5 }, "11R22.5", "C"],
    ["7.50R16LT", { kind: "inch", prefix: "LT", commercial: false, sectionWidthMm: 190.5, aspectRatio: null, construction: "R", rimDiameterIn: 16 }, "7.50R16LT", "LT"],
    ["7.50-16", { kind: "inch", prefix: null, commercial: true, sectionWidthMm: 190.5, aspectRatio: null, construction: "D", rimDiameterIn: 16 }, "7.50-16", "C"],
    ["8.25r16lt", { kind: "inch", prefix: "LT", sectionWidthMm: 209.55, construction: "R", rimDiameterIn: 16 }, "8.25R16LT", "LT"],
    ["ST4.80-12", { kind: "inch", prefix: "ST", sectionWidthMm: 121.92, construction: "D", rimDiameterIn: 12 }, "ST4.80-12", "ST"],
  ] as const)("%s reads as %o, written %s, of the %s service type", (text, expected, designation, service) => {
    const marking = read(text);
    expect(marking.size).toMatchObject(expected);
    expect(formatSize(marking.size!)).toBe(designation);
    expect(serviceType(marking.size!)).toBe(service);
  });

  it("gives no geometry, and says plainly to take the diameter from the maker's data (the 82 series does not apply)", () => {
    const marking = read("11R22.5 146/143L");
    expect(marking.geometry).toBeNull();
    expect(marking.service).toMatchObject({ loadIndex: 146, loadIndexDual: 143, speedSymbol: "L" });
    expect(marking.warnings.some((warning) => /No overall diameter for 11R22\.5: .*82 series.*maker's data/.test(warning))).toBe(true);
    expect(read("185R14").geometry?.overallDiameterMm).toBe(659);
  });

  it("reads a truck size's load range, as TRA marks it (common practice)", () => {
    expect(read("11R22.5 146/143L LR H").loadRange).toBe("H");
    expect(read("12R22.5 152/148L G").loadRange).toBe("G");
  });

  it("leaves a ply rating, a metric size and other numbers with a dash alone", () => {
    expect(read("285/50R20 10-PLY")).toMatchObject({ plyRating: 10, size: { kind: "metric" } });
    expect(read("LT245/75R16 120/116Q 10 PLY").size?.kind).toBe("metric");
  });

  it("has a Size sheet without a drawing, under its own address", () => {
    const sheet = readSizeSheet("11R22.5");
    expect(sheet).toMatchObject({ designation: "11R22.5", slug: "11R22.5", geometry: null });
    expect(sheet?.summary).toMatch(/^11R22\.5: 11\.0 in \(279 mm\) wide, for 22\.5-inch wheels/);
    expect(sizeToSlug(read("7.50-16").size!)).toBe("7.50-16");
    expect(readSizeSheet("7.50-16")?.designation).toBe("7.50-16");
  });
});
