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

describe("formatting and reading agree", () => {
  it("parseMarking(formatSize(x)).size equals x for every valid size", () => {
    fc.assert(
      fc.property(fc.oneof(metricSize, flotationSize), (size) => {
        const r = parseMarking(formatSize(size));
        expect(r.ok && r.size).toEqual(size);
        expect(r.ok && r.assumptions).toEqual([]);
      }),
      { numRuns: 5000 },
    );
  });

  it("a designation read back formats to itself", () => {
    fc.assert(
      fc.property(fc.oneof(metricSize, flotationSize), (size) => {
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

  it("speed order is total and consistent with km/h (ISO 4000-1; (Y) above Y)", () => {
    const symbol = fc.constantFrom(...SPEED_SYMBOLS);
    fc.assert(
      fc.property(symbol, symbol, symbol, (a, b, c) => {
        const [ra, rb, rc] = [speedSymbolRank(a.symbol), speedSymbolRank(b.symbol), speedSymbolRank(c.symbol)];
        expect(ra === rb).toBe(a.symbol === b.symbol);
        if (a.kmh !== b.kmh) expect(Math.sign(ra - rb)).toBe(Math.sign(a.kmh - b.kmh));
        if (ra <= rb && rb <= rc) expect(ra <= rc).toBe(true);
      }),
    );
  });
});
