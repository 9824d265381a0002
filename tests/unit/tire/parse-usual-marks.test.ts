/**
 * The shortcut that reads the usual marks (XL, RF, M+S, 3PMSF, LOAD RANGE E, 10PR, DOT codes, UTQG
 * grades) straight from the characters must read exactly what the token readers read: the same
 * result, key order included, whether it takes a mark or leaves it to them.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { newDraft } from "@/lib/tire/parse/reader";
import { readUsualMarks } from "@/lib/tire/parse/usual-marks";
import { readsAlike } from "./helpers";

/** Mostly `usual`, sometimes `odd`. */
const mostly = <T>(usual: fc.Arbitrary<T>, odd: fc.Arbitrary<T>) => fc.oneof({ arbitrary: usual, weight: 4 }, { arbitrary: odd, weight: 1 });
const start = fc.constantFrom(
  "", "", "285/50R20", "285/50R20 119S", "LT265/75R16 123/120S", "ST205/75R15 107/102M", "33x12.50R15LT 108Q", "11R22.5 146/143L",
  "DOT XX 1220", "285 50 20", "hello",
);
const grade = fc.constantFrom("A", "AA", "B", "C", "D", "a", "AAA", "×");
/** Marks the shortcut reads, in the spellings it takes and in near ones it must leave alone. */
const mark = fc.oneof(
  mostly(fc.constantFrom("XL", "SL", "RF", "MS", "M+S", "M/S", "M&S", "3PMSF"), fc.constantFrom("xl", "Rf", "m+s", "M+", "M-S", "3 PMSF", "03PMSF", "3PMSFX", "LR E", "LRE")),
  fc.tuple(mostly(fc.constantFrom("LOAD RANGE ", "load range "), fc.constantFrom("LOAD RANGE: ", "LOAD-RANGE ", "LOAD  RANGE\t", "LOAD RANGE")), fc.constantFrom("C", "D", "E", "Q", "EE", ""))
    .map(([words, letter]) => words + letter),
  fc.tuple(mostly(fc.integer({ min: 2, max: 40 }), fc.integer({ min: 0, max: 120 })), mostly(fc.constantFrom("PR", "pr"), fc.constantFrom(" PR", "PLY", "-PR", "PR RATING")))
    .map(([plies, word]) => `${plies}${word}`),
  mostly(fc.constantFrom("DOT AB CD EFG 1220", "dot XX 1220", "DOT ZZ 915", "DOT 4BA 1KL2 3M 1220", "TIN 3208"), fc.constantFrom("DOT", "DOT 5608", "DOT 3208.5", "DOTU2LL3208", "DOT O2LL 3208")),
  fc.tuple(mostly(fc.integer({ min: 10, max: 999 }), fc.integer({ min: 0, max: 99_999 })), fc.constantFrom(" ", "", "  "), grade, fc.constantFrom(" ", "", "\t"), grade)
    .map(([treadwear, gap, traction, gap2, temperature]) => `${treadwear}${gap}${traction}${gap2}${temperature}`),
  fc.tuple(fc.constantFrom("UTQG ", "utqg ", "UTQG: "), fc.integer({ min: 100, max: 800 }), fc.constantFrom(" A A", "AA A", " B C", " D"))
    .map(([word, treadwear, grades]) => `${word}${treadwear}${grades}`),
  fc.tuple(mostly(fc.constantFrom("TREADWEAR ", "TRACTION ", "TEMPERATURE ", "TEMP ", "treadwear "), fc.constantFrom("TREADWEAR: ", "TEMP", "TRACTION")), fc.constantFrom("500", "60", "A", "AA", "B", "C", "D", "500.5", "5,000"))
    .map(([word, value]) => word + value),
  fc.constantFrom("E", "C", "LT", "116T", "99(Y)", "(", ")", "/", "-", ",", "×", "x", "R", "20", "16.5", "日本", "RUN FLAT", "EXTRA LOAD", "RATING", "MAX LOAD 1360 KG"),
);
const gap = mostly(fc.constant(" "), fc.constantFrom("", "  ", "\t", "\u00a0"));
const marking = fc
  .tuple(start, fc.array(fc.tuple(gap, mark), { maxLength: 5 }), fc.constantFrom("", "", " "))
  .map(([text, marks, end]) => text + marks.map(([space, piece]) => (text === "" && space === " " ? "" : space) + piece).join("") + end);

describe("the shortcut for the usual marks reads what the token readers read", () => {
  it("on generated marks after the usual starts, in spellings it takes and near ones it leaves", () => {
    fc.assert(fc.property(marking, readsAlike), { numRuns: 10_000 });
  });

  it("takes a good share of the generated marks, so the check above is not empty", () => {
    const texts = fc.sample(fc.tuple(gap, mark).map(([space, piece]) => space + piece), { numRuns: 2_000, seed: 1 });
    const taken = texts.filter((text) => readUsualMarks(text, newDraft(), 0) > 0).length;
    expect(taken / texts.length).toBeGreaterThan(0.4);
  });

  it.each([
    ["285/50R20 119S XL M+S 3PMSF", "285/50R20 119S".length, "285/50R20 119S XL M+S 3PMSF".length],
    ["TREADWEAR 500 TRACTION A TEMPERATURE B", 0, "TREADWEAR 500 TRACTION A TEMPERATURE B".length],
    ["500 A A XL", 0, "500 A A XL".length],
    ["UTQG 460 AA A", 0, "UTQG 460 AA A".length],
    ["XL 10PR RATING", 0, "XL".length],
    ["LOAD RANGE E DOT XX 1220", 0, "LOAD RANGE E DOT XX 1220".length],
    ["LOAD RANGE: E", 0, 0],
    ["500 AA ×", 0, 0],
    ["M+S, XL", 0, 0],
  ])("%s from %i: the token readers read on from character %i", (text, from, restFrom) => {
    expect(readUsualMarks(text, newDraft(), from)).toBe(restFrom);
    readsAlike(text);
  });
});
