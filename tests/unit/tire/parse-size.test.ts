import { describe, expect, it } from "vitest";
import { formatSize } from "@/lib/tire";
import { parts, read } from "./helpers";

describe("reading sizes", () => {
  it("285/50R20: 285 mm wide, 50 % aspect, radial, 20-inch rim (common practice)", () => {
    expect(read("285/50R20").size).toEqual({
      kind: "metric", prefix: null, commercial: false, sectionWidthMm: 285, aspectRatio: 50,
      construction: "R", zr: false, runFlat: false, rimDiameterIn: 20, flotationDiameterIn: null,
    });
  });

  it.each(["285 50 20", "285/50/20", "28550R20", "285-50R20", "285 50R20", "285/50 20", "2855020", "  285 / 50 r 20  "])(
    "understands the forgiving form %j as 285/50R20 and says how it was read (common practice)",
    (text) => {
      const m = read(text);
      expect(m.size && formatSize(m.size)).toBe("285/50R20");
      if (text.trim() !== "285 / 50 r 20") expect(m.assumptions.join(" ")).toContain("285/50R20");
    },
  );

  it("notes the radial assumption when no construction letter is given (common practice)", () => {
    expect(read("285 50 20").assumptions).toEqual(['Read "285 50 20" as 285/50R20: radial construction assumed.']);
    expect(read("285/50R20").assumptions).toEqual([]);
  });

  it("reads P, LT, ST and T prefixes in any case (US P-metric, LT, ST; ETRTO T temporary)", () => {
    expect(read("p215/65r15").size?.prefix).toBe("P");
    expect(read("LT 265/75R16").size?.prefix).toBe("LT");
    expect(read("ST225/75R15").size?.prefix).toBe("ST");
    expect(read("T125/70D16").size).toMatchObject({ prefix: "T", construction: "D" });
  });

  it("reads the ETRTO commercial C after the rim, glued or spaced (EU tyre database: 215/65R16C)", () => {
    expect(read("215/65R16C").size).toMatchObject({ commercial: true, prefix: null });
    expect(read("215/65 R 16 C 109/107 T").size).toMatchObject({ commercial: true });
  });

  it("reads a letter after an LT size as its load range, not the commercial C (common practice)", () => {
    const e = read("LT265/75R16E");
    expect(e.size).toMatchObject({ prefix: "LT", commercial: false });
    expect(e.loadRange).toBe("E");
    expect(e.plyRating).toBe(10);
    const c = read("LT215/85R16C");
    expect(c.size?.commercial).toBe(false);
    expect(c.loadRange).toBe("C");
    expect(read("LT265/75R16 D").loadRange).toBe("D");
    expect(parts(e)).toEqual(["size:LT265/75R16", "loadRange:E"]);
  });

  it("moves a trailing LT to the prefix, for metric and flotation sizes (common practice)", () => {
    expect(read("265/75R16LT").size?.prefix).toBe("LT");
    expect(read("265/75R16 LT").size?.prefix).toBe("LT");
    expect(read("33x12.50R15LT").size?.prefix).toBe("LT");
    expect(read("31x10.50R15").size?.prefix).toBeNull();
  });

  it("reads ZR, and RF or ZRF in the size as run-flat (ETRTO designations)", () => {
    expect(read("245/40ZR18").size).toMatchObject({ zr: true, construction: "R", runFlat: false });
    expect(read("245/40RF18").size).toMatchObject({ zr: false, runFlat: true });
    expect(read("245/40ZRF18 97Y").size).toMatchObject({ zr: true, runFlat: true });
  });

  it("reads RFT, Run Flat and an RF before the service description as run-flat (common practice)", () => {
    for (const text of ["245/40R18 RFT", "245/40R18 Run Flat 97W", "245/40R18 run-flat", "245/40R18RF", "245/40R18 RF 97W"]) {
      const m = read(text);
      expect(m.runFlat).toBe(true);
      expect(m.size?.runFlat).toBe(true);
      expect(m.extraLoad).toBe(false);
    }
  });

  it("reads D, B and a hyphen after the aspect ratio as bias constructions (ISO 4000-1)", () => {
    expect(read("205/75D15").size?.construction).toBe("D");
    expect(read("205/75B15").size?.construction).toBe("B");
    expect(read("205/75-15").size?.construction).toBe("D");
    expect(read("90/90-21").size).toMatchObject({ sectionWidthMm: 90, aspectRatio: 90, construction: "D" });
  });

  it("reads half-inch rims 16.5, 17.5 and 19.5 (common practice)", () => {
    for (const rim of [16.5, 17.5, 19.5]) expect(read(`LT215/85R${rim}`).size?.rimDiameterIn).toBe(rim);
  });

  it("reads sizes with no aspect ratio and warns that 82 % is used (82 series, common practice)", () => {
    const m = read("155R13");
    expect(m.size).toMatchObject({ sectionWidthMm: 155, aspectRatio: null, rimDiameterIn: 13 });
    expect(m.geometry?.aspectRatio).toBe(82);
    expect(m.warnings.join(" ")).toContain("82 %");
    expect(read("185R14C 102/100Q").size).toMatchObject({ commercial: true, aspectRatio: null });
  });

  it("reads flotation sizes: overall diameter x section width (in) then rim (common practice)", () => {
    const m = read("33x12.50R15LT");
    expect(m.size).toMatchObject({ kind: "flotation", prefix: "LT", aspectRatio: null, rimDiameterIn: 15, flotationDiameterIn: 33 });
    expect(m.size?.sectionWidthMm).toBeCloseTo(317.5, 10);
    expect(read("35 X 12.50 R 20 LT").size?.flotationDiameterIn).toBe(35);
    expect(read("33×12.50R15").size?.kind).toBe("flotation");
  });

  it("reads a flotation LT size with its load range letter (common practice)", () => {
    expect(read("33x12.50R15C").loadRange).toBe("C");
    expect(read("35x12.50R20LTE").loadRange).toBe("E");
  });

  it("keeps only the first of two sizes and says so", () => {
    const m = read("285/50R20 275/55R20");
    expect(m.size && formatSize(m.size)).toBe("285/50R20");
    expect(m.warnings.join(" ")).toContain("275/55R20");
  });

  it("records where each piece of the size was typed, run-together digits included", () => {
    const pieces = (text: string) => read(text).details.map((d) => `${d.detail}:${text.slice(d.start, d.end)}`);
    expect(pieces("LT265/75R16E")).toEqual(["prefix:LT", "sectionWidth:265", "aspectRatio:75", "construction:R", "rimDiameter:16"]);
    expect(pieces("28550R20")).toEqual(["sectionWidth:285", "aspectRatio:50", "construction:R", "rimDiameter:20"]);
    expect(pieces("2855020")).toEqual(["sectionWidth:285", "aspectRatio:50", "rimDiameter:20"]);
    expect(pieces("33x12.50R15LT")).toEqual(["overallDiameter:33", "sectionWidth:12.50", "construction:R", "rimDiameter:15", "prefix:LT"]);
    expect(pieces("215/65 R 16 C")).toEqual(["sectionWidth:215", "aspectRatio:65", "construction:R", "rimDiameter:16", "commercial:C"]);
  });

  it("records where the size sits in the input, for highlighting", () => {
    const m = read("Size: 285/50R20 116T");
    expect(m.spans[1]).toEqual({ part: "size", start: 6, end: 15 });
  });
});
