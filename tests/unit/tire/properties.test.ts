import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  formatSize,
  LOAD_INDEX_MAX,
  loadIndexKg,
  parseMarking,
  SIZE_BOUNDS,
  SPEED_SYMBOLS,
  speedSymbolRank,
  type TireSize,
} from "@/lib/tire";

const codeUnit = fc.integer({ min: 0, max: 0xffff }).map((c) => String.fromCharCode(c));
/** Pieces of real markings, so that generated text reaches deep into the parser. */
const fragment = fc.constantFrom(
  "285", "/", "50", "R", "20", " ", "LT", "P", "ST", "T", "C", "ZR", "RF", "x", "12.50", "16.5", "-", "(", ")",
  "Y", "116", "123/120", "S", "XL", "DOT", "3208", "328", "U2LL", "TREADWEAR", "500", "AA", "A", "M+S", "3PMSF",
  "LOAD", "RANGE", "E", "PLY", "MAX", "KG", "LBS", "PSI", "KPA", ",", ".", "0", "9", "99",
);
const markingLike = fc.array(fragment, { maxLength: 30 }).map((parts) => parts.join(""));

function neverThrows(text: string): void {
  const r = parseMarking(text, { today: new Date("2025-06-01") });
  expect(typeof r.ok).toBe("boolean");
  if (r.ok) for (const s of [...r.spans, ...r.details]) expect(s.start < s.end && s.end <= text.length).toBe(true);
}

describe("the parser never throws", () => {
  it("on any string", () => fc.assert(fc.property(fc.string(), neverThrows), { numRuns: 2000 }));
  // fast-check 4 spells fullUnicodeString as string({ unit: "binary" }).
  it("on any full-Unicode string", () => fc.assert(fc.property(fc.string({ unit: "binary" }), neverThrows), { numRuns: 2000 }));
  it("on any UTF-16 text, lone surrogates included", () => fc.assert(fc.property(fc.string({ unit: codeUnit }), neverThrows), { numRuns: 2000 }));
  it("on text made of marking fragments", () => fc.assert(fc.property(markingLike, neverThrows), { numRuns: 5000 }));
});

const between = ([min, max]: readonly [number, number]) => fc.integer({ min, max });
const halfInches = ([min, max]: readonly [number, number]) => fc.integer({ min: min * 2, max: max * 2 }).map((h) => h / 2);
const constructionCode = fc.oneof(
  fc.record({ construction: fc.constant("R" as const), zr: fc.boolean(), runFlat: fc.boolean() }),
  fc.record({ construction: fc.constantFrom("D" as const, "B" as const), zr: fc.constant(false), runFlat: fc.constant(false) }),
);

const metricSize: fc.Arbitrary<TireSize> = fc
  .record({
    prefix: fc.constantFrom(null, "P", "LT", "ST", "T"),
    commercial: fc.boolean(),
    sectionWidthMm: between(SIZE_BOUNDS.sectionWidthMm),
    aspectRatio: fc.option(between(SIZE_BOUNDS.aspectRatio), { freq: 6 }),
    code: constructionCode,
    rimDiameterIn: halfInches(SIZE_BOUNDS.rimDiameterIn),
  })
  .map(({ prefix, commercial, sectionWidthMm, aspectRatio, code, rimDiameterIn }) => ({
    kind: "metric" as const,
    prefix,
    commercial: commercial && prefix === null,
    // Sizes without an aspect ratio have three-digit widths.
    sectionWidthMm: aspectRatio === null ? Math.max(sectionWidthMm, 100) : sectionWidthMm,
    aspectRatio,
    ...code,
    rimDiameterIn,
    flotationDiameterIn: null,
  }));

const flotationSize: fc.Arbitrary<TireSize> = fc
  .record({
    lt: fc.boolean(),
    widthIn: fc.integer({ min: SIZE_BOUNDS.flotationWidthIn[0] * 4, max: SIZE_BOUNDS.flotationWidthIn[1] * 4 }).map((q) => q / 4),
    diameterIn: halfInches(SIZE_BOUNDS.flotationDiameterIn),
    code: constructionCode,
    rimDiameterIn: halfInches(SIZE_BOUNDS.rimDiameterIn),
  })
  .filter(({ diameterIn, rimDiameterIn }) => diameterIn - rimDiameterIn >= 2)
  .map(({ lt, widthIn, diameterIn, code, rimDiameterIn }) => ({
    kind: "flotation" as const,
    prefix: lt ? ("LT" as const) : null,
    commercial: false,
    sectionWidthMm: widthIn * 25.4,
    aspectRatio: null,
    ...code,
    rimDiameterIn,
    flotationDiameterIn: diameterIn,
  }));

/** Truck and inch-width sizes: widths in quarter inches with two decimals, or whole inches; R or bias; LT, ST or none. */
const inchSize: fc.Arbitrary<TireSize> = fc
  .record({
    prefix: fc.constantFrom(null, "LT" as const, "ST" as const),
    quarters: fc.integer({ min: SIZE_BOUNDS.inchWidthIn[0] * 4, max: SIZE_BOUNDS.inchWidthIn[1] * 4 }),
    construction: fc.constantFrom("R" as const, "D" as const),
    rimDiameterIn: halfInches(SIZE_BOUNDS.rimDiameterIn),
  })
  .filter(({ quarters, rimDiameterIn }) => rimDiameterIn > quarters / 4)
  .map(({ prefix, quarters, construction, rimDiameterIn }) => ({
    kind: "inch" as const,
    prefix,
    commercial: prefix === null,
    sectionWidthMm: (quarters * 25 * 254) / 1000,
    aspectRatio: null,
    construction,
    zr: false,
    runFlat: false,
    rimDiameterIn,
    flotationDiameterIn: null,
  }));

describe("formatting and reading agree", () => {
  it("parseMarking(formatSize(x)).size equals x for every valid size", () => {
    fc.assert(
      fc.property(fc.oneof(metricSize, flotationSize, inchSize), (size) => {
        const r = parseMarking(formatSize(size));
        expect(r.ok && r.size).toEqual(size);
        expect(r.ok && r.assumptions).toEqual([]);
      }),
      { numRuns: 5000 },
    );
  });

  it("a designation read back formats to itself", () => {
    fc.assert(
      fc.property(fc.oneof(metricSize, flotationSize, inchSize), (size) => {
        const designation = formatSize(size);
        const r = parseMarking(designation.toLowerCase());
        expect(r.ok && r.size && formatSize(r.size)).toBe(designation);
      }),
      { numRuns: 2000 },
    );
  });
});

describe("table invariants", () => {
  it("load capacity rises strictly with the load index, 0–279 (ISO 4000-1)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: LOAD_INDEX_MAX - 1 }), (li) => {
        expect(loadIndexKg(li + 1)).toBeGreaterThan(loadIndexKg(li) ?? Number.POSITIVE_INFINITY);
      }),
      { numRuns: 1000 },
    );
  });

  it("speed ranks follow the published table's order, each symbol its own rank (ISO 4000-1 / ETRTO speed symbols; (Y) above Y)", () => {
    // The table's order, slowest first, typed here apart from the code: H sits between U and V.
    const published = ["A1", "A2", "A3", "A4", "A5", "A6", "A7", "A8", "B", "C", "D", "E", "F", "G", "J", "K", "L", "M", "N", "P", "Q", "R", "S", "T", "U", "H", "V", "W", "Y", "(Y)"];
    const byRank = [...SPEED_SYMBOLS].sort((a, b) => speedSymbolRank(a.symbol) - speedSymbolRank(b.symbol)).map((info) => info.symbol);
    expect(byRank).toEqual(published);
    expect(new Set(SPEED_SYMBOLS.map((info) => speedSymbolRank(info.symbol))).size).toBe(published.length);
  });
});
