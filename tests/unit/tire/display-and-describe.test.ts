import { describe, expect, it } from "vitest";
import { parseMarking, type Marking } from "@/lib/tire";
import { describeMarking } from "@/lib/tire/describe";
import {
  defaultUnitSystem,
  formatInchesAsMarked,
  formatLength,
  formatLoad,
  formatMillimetresAsMarked,
  formatSignedPercent,
  formatSpeed,
} from "@/lib/tire/display";

function read(text: string): Marking {
  const result = parseMarking(text, { today: new Date("2026-12-02T00:00:00Z") });
  if (!result.ok) throw new Error(result.error.message);
  return result;
}

describe("display formatting", () => {
  it("rounds lengths to the millimetre and to a tenth of an inch (1 in = 25.4 mm exactly, by definition)", () => {
    expect(formatLength(793, "metric")).toBe("793 mm");
    expect(formatLength(793, "imperial")).toBe("31.2 in");
    expect(formatLength(2491.28, "metric")).toBe("2,491 mm");
  });

  it("keeps the figure printed on the tire beside the other unit (1 in = 25.4 mm exactly, by definition)", () => {
    // 225 mm ÷ 25.4 = 8.86 in; 12.50 in × 25.4 = 317.5 mm.
    expect(formatMillimetresAsMarked(225, "imperial")).toBe("8.9 in (225 mm)");
    expect(formatMillimetresAsMarked(225, "metric")).toBe("225 mm");
    expect(formatInchesAsMarked(317.5, "metric")).toBe("12.50 in (318 mm)");
    expect(formatInchesAsMarked(317.5, "imperial")).toBe("12.50 in");
    expect(formatInchesAsMarked(838.2, "imperial")).toBe("33 in");
  });

  it("shows loads as the load tables print them: kg and kg × 2.20462 rounded (common practice)", () => {
    expect(formatLoad(1360, "metric")).toBe("1,360 kg");
    expect(formatLoad(1360, "imperial")).toBe("2,998 lb");
  });

  it("shows speeds in km/h and in mph (S = 180 km/h = 112 mph, common practice)", () => {
    expect(formatSpeed(180, "metric")).toBe("180 km/h");
    expect(formatSpeed(180, "imperial")).toBe("112 mph");
  });

  it("signs percentages", () => {
    expect(formatSignedPercent(0.44)).toBe("+0.4 %");
    expect(formatSignedPercent(-1.25)).toBe("−1.3 %");
    expect(formatSignedPercent(0.01)).toBe("0.0 %");
  });

  it("starts US, Liberian and Myanmar browsers in imperial, everyone else in metric", () => {
    expect(defaultUnitSystem("en-US")).toBe("imperial");
    expect(defaultUnitSystem("en-GB")).toBe("metric");
    expect(defaultUnitSystem("fr")).toBe("metric");
    expect(defaultUnitSystem(undefined)).toBe("metric");
  });
});

describe("describing a marking part by part", () => {
  it("points at each part of a size where it was typed", () => {
    const marking = read("285/50R20 119S");
    const parts = describeMarking(marking, "metric");
    const typed = Object.fromEntries(parts.map((part) => [part.key, part.span && marking.input.slice(part.span.start, part.span.end)]));
    expect(typed).toMatchObject({
      sectionWidth: "285",
      aspectRatio: "50",
      construction: "R",
      rimDiameter: "20",
      loadIndex: "119",
      speedSymbol: "S",
    });
  });

  it("reads each part in plain words, in the chosen units", () => {
    const parts = describeMarking(read("285/50R20 119S"), "imperial");
    const reading = Object.fromEntries(parts.map((part) => [part.key, part.reading]));
    // 285 mm ÷ 25.4 = 11.22 in; the millimetres printed on the tire stay beside the inches.
    expect(reading.sectionWidth).toBe("11.2 in (285 mm) wide");
    // A passenger size (no LT, ST or C): no dual rating (common practice).
    expect(reading.loadIndex).toBe("119: carries up to 2,998 lb per tire; no dual rating: not for dual wheels");
    expect(reading.speedSymbol).toBe("S: built for up to 112 mph");
    expect(reading.rimDiameter).toBe("fits 20-inch wheels only");
  });

  it("ties size parts to the dimension they describe on a drawing", () => {
    const parts = describeMarking(read("205/55R16"), "metric");
    const dimension = Object.fromEntries(parts.map((part) => [part.key, part.dimension]));
    expect(dimension).toMatchObject({ sectionWidth: "sectionWidth", aspectRatio: "sidewall", rimDiameter: "rim" });
  });

  it("gives dual load indices and the prefix their own readings", () => {
    const parts = describeMarking(read("LT265/75R16 123/120S"), "metric");
    const reading = Object.fromEntries(parts.map((part) => [part.key, part.reading]));
    // Load index 123 = 1,550 kg and 120 = 1,400 kg (ISO 4000-1 table).
    expect(reading.loadIndex).toBe("123: carries up to 1,550 kg per tire; 120 on dual wheels: 1,400 kg each");
    expect(reading.prefix).toBe("LT: light truck");
  });

  it("describes DOT, UTQG and winter marks without a size", () => {
    const parts = describeMarking(read("DOT 4B7X 2HRT 1523 Treadwear 500 Traction A Temperature A M+S 3PMSF"), "metric");
    expect(parts.map((part) => part.key)).toEqual(["dot", "utqg", "winter"]);
    expect(parts[0]?.reading).toMatch(/^made in week 15 of 2023, about 3 years old$/);
  });

  it("says a passenger tire has no dual rating, but not when the size is unknown (common practice)", () => {
    const reading = (text: string) => describeMarking(read(text), "metric").find((part) => part.key === "loadIndex")?.reading;
    // Load index 91 = 615 kg (ISO 4000-1 load-index table).
    expect(reading("205/55R16 91V")).toBe("91: carries up to 615 kg per tire; no dual rating: not for dual wheels");
    expect(reading("91V")).toBe("91: carries up to 615 kg per tire");
  });

  it("reads a flotation size's first number as the overall diameter in inches, and its width in inches (flotation designation)", () => {
    const marking = read("33x12.50R15LT 108Q C");
    const metric = describeMarking(marking, "metric");
    const typed = Object.fromEntries(metric.map((part) => [part.key, part.span && marking.input.slice(part.span.start, part.span.end)]));
    expect(metric.map((part) => part.key).slice(0, 3)).toEqual(["prefix", "overallDiameter", "sectionWidth"]);
    expect(typed).toMatchObject({ overallDiameter: "33", sectionWidth: "12.50", rimDiameter: "15" });
    expect(metric.some((part) => part.key === "aspectRatio")).toBe(false);
    // 33 in × 25.4 = 838.2 mm; sidewall (838.2 − 15 × 25.4) ÷ 2 = 228.6 mm; 12.50 in × 25.4 = 317.5 mm.
    const reading = Object.fromEntries(metric.map((part) => [part.key, part.reading]));
    expect(reading.overallDiameter).toBe("33 in (838 mm) tall overall; sidewall 229 mm high");
    expect(reading.sectionWidth).toBe("12.50 in (318 mm) wide");
    expect(metric.find((part) => part.key === "overallDiameter")?.dimension).toBe("overall");
    const imperial = Object.fromEntries(describeMarking(marking, "imperial").map((part) => [part.key, part.reading]));
    expect(imperial.overallDiameter).toBe("33 in tall overall; sidewall 9.0 in high");
    expect(imperial.sectionWidth).toBe("12.50 in wide");
  });

  it("names the half-inch twin a rim diameter must never be mixed with (common practice)", () => {
    const rim = (text: string) => describeMarking(read(text), "metric").find((part) => part.key === "rimDiameter")?.reading;
    expect(rim("LT235/85R16 120/116Q")).toBe("fits 16-inch wheels only, never 16.5-inch ones");
    expect(rim("33x12.50R16.5LT")).toBe("fits 16.5-inch wheels only, never 16-inch ones");
    expect(rim("285/50R20")).toBe("fits 20-inch wheels only");
  });

  it("says when the aspect ratio was not marked (82 series, common practice)", () => {
    const parts = describeMarking(read("155R13"), "metric");
    expect(parts.find((part) => part.key === "aspectRatio")?.reading).toMatch(/82 series is assumed/);
  });
});
