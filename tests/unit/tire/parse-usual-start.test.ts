/**
 * The shortcut that reads the usual start of a marking (a metric size, standard or forgiving, or a
 * flotation size, perhaps a service description, a DOT code) straight from the characters must read exactly what the token
 * readers read: the same result, key order included, on every text, whether it takes the text or not.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { newDraft, type Draft } from "@/lib/tire/parse/reader";
import { readUsualStart } from "@/lib/tire/parse/usual-start";
import { generateMarkings } from "../../bench/decode-markings";
import { readsAlike } from "./helpers";

const digits = (min: number, max: number) => fc.stringMatching(new RegExp(`^\\d{${min},${max}}$`));
/** Mostly `usual`, sometimes `odd`. */
const mostly = <T>(usual: fc.Arbitrary<T>, odd: fc.Arbitrary<T>) => fc.oneof({ arbitrary: usual, weight: 5 }, { arbitrary: odd, weight: 1 });
const number = (min: number, max: number, width: number) => fc.integer({ min, max }).map((n) => String(n).padStart(width, "0"));
const spaces = fc.constantFrom("", " ", "  ", "\t", "\u00a0");
const prefix = mostly(fc.constantFrom("", "P", "p", "LT", "lt", "ST", "T"), fc.constantFrom("Lt", "t", "L", "S", "X", "PP"));
const construction = mostly(fc.constantFrom("R", "r", "ZR", "zr"), fc.constantFrom("Zr", "RF", "ZRF", "D", "B", "-", "/", " ", "Z", "RR"));
/** The separators after the width and the aspect ratio: the standard form, the forgiving ones, and some that are neither. */
const separators = fc.oneof(
  { arbitrary: fc.tuple(fc.constant("/"), construction), weight: 4 },
  fc.tuple(fc.constantFrom("-", ""), construction),
  fc.tuple(fc.constantFrom("/", "-", ""), fc.constantFrom("/", "-", " ")),
  fc.tuple(fc.constantFrom(" ", "  ", "\t"), fc.constantFrom(" ", "  ", "\u00a0", "R", "/")),
);
const rim = mostly(number(8, 30, 2), fc.oneof(digits(1, 3), fc.constantFrom("16.5", "22.5", "20,5", "2O")));
const size = fc
  .tuple(spaces, prefix, mostly(number(60, 499, 3), digits(2, 4)), separators, mostly(number(20, 95, 2), digits(1, 3)), rim)
  .map(([gap, letters, width, [afterWidth, afterAspect], aspect, rimDigits]) => gap + letters + width + afterWidth + aspect + afterAspect + rimDigits);
const flotationSize = fc
  .tuple(
    spaces,
    mostly(number(28, 37, 2), digits(1, 3)),
    mostly(fc.constantFrom("x", "X", "×"), fc.constantFrom("*", " x", "")),
    mostly(
      fc.oneof(fc.constantFrom("10.50", "11.50", "12.50", "9.5", "13"), fc.integer({ min: 500, max: 2500 }).map((hundredths) => (hundredths / 100).toFixed(hundredths % 3))),
      fc.constantFrom("12.505", "4.50", "26.00", "12.", "1,250"),
    ),
    mostly(fc.constantFrom("R", "r"), fc.constantFrom("ZR", "-", "D", " R")),
    mostly(number(15, 22, 2), fc.constantFrom("16.5", "08", "35", "7")),
    mostly(fc.constantFrom("LT", "lt", ""), fc.constantFrom("LTE", "C", "E", "L", "LTX")),
  )
  .map((pieces) => pieces.join(""));
/** Speed symbols, letters that are not ones, and the letters that are also construction codes or UTQG grades. */
const speed = mostly(
  fc.constantFrom("S", "T", "H", "V", "W", "Y", "R", "D", "B", "C", "Q", "s", "h", "(Y)", "(y)"),
  fc.constantFrom("A", "A8", "X", "Z", "(V)", "( Y)", "(Y", ""),
);
const loadIndex = mostly(number(60, 130, 1), fc.oneof(digits(1, 4), number(260, 300, 1)));
const dualIndex = (single: string) => mostly(fc.integer({ min: 0, max: 4 }).map((below) => String(Number(single) - below)), loadIndex);
const service = fc
  .tuple(mostly(fc.constantFrom(" ", "  "), fc.constant("")), loadIndex, fc.boolean(), mostly(fc.constant(""), fc.constant(" ")), speed)
  .chain(([gap, single, dual, speedGap, symbol]) =>
    (dual ? dualIndex(single).map((d) => `/${d}`) : fc.constant("")).map((slashDual) => `${gap}${single}${slashDual}${speedGap}${symbol}`),
  );
/** What may follow, chosen to reach the readers whose reading depends on the text before them. */
const tail = fc
  .array(
    fc.tuple(
      mostly(fc.constant(" "), fc.constant("")),
      fc.constantFrom(
        "XL", "RF", "M+S", "M", "S", "3PMSF", "10PR", "10", "17", "16.5", "B", "C", "A", "E", "D", "LT", "LTE", "lt", "×", "x", "X",
        "LOAD RANGE E", "DOT U2LL LMLR 3208", "DOT 3208", "dot XX 1611", "TIN 5508", "500 A A", "460AA A", "TREADWEAR 500", "(", ")", "/", "-", ",", ".", "日本", "R", "ZR", "20", "116T", "99(Y)",
      ),
    ),
    { maxLength: 6 },
  )
  .map((pieces) => pieces.map(([gap, piece]) => gap + piece).join(""));
/** DOT codes that read, and some that do not: a bad week, no date, a date that runs on, a dotless ı. */
const dotCode = fc
  .tuple(
    spaces,
    mostly(fc.constantFrom("DOT ", "dot ", "DOT", "Dot: ", "TIN ", "DOT# "), fc.constantFrom("TINA ", "tın ", "DO T ", "DOTS ")),
    mostly(fc.constantFrom("U2LL LMLR ", "4BA 1KL2 3M ", "XX ", "ZZ ", "", "U2LLLMLR"), fc.constantFrom("GIOQ ", "1234567890123 ", "AB-CD ")),
    mostly(number(1, 53, 2).chain((week) => number(0, 25, 2).map((year) => week + year)), fc.constantFrom("5508", "0008", "328", "3208.5", "3208,", "32", "")),
  )
  .map((pieces) => pieces.join(""));
const usualStart = fc
  .tuple(fc.oneof({ arbitrary: fc.tuple(fc.oneof({ arbitrary: size, weight: 3 }, flotationSize), fc.option(service, { freq: 4 })).map(([s, sd]) => s + (sd ?? "")), weight: 3 }, dotCode), tail)
  .map(([start, rest]) => start + rest);

describe("the shortcut for the usual start reads what the token readers read", () => {
  it("on generated sizes with and without service descriptions and what may follow them", () => {
    fc.assert(fc.property(usualStart, readsAlike), { numRuns: 20_000 });
  });

  it("on the bench's mixed markings", () => {
    for (const text of generateMarkings(20_000, 11)) readsAlike(text);
  });

  it("takes a good share of the generated texts, so the check above is not empty", () => {
    const drafts = fc.sample(usualStart, { numRuns: 4_000, seed: 1 }).map((text) => {
      const draft = newDraft();
      return readUsualStart(text, draft) >= 0 ? draft : null;
    });
    const share = (read: (draft: Draft) => boolean) => drafts.filter((draft) => draft !== null && read(draft)).length / drafts.length;
    expect(share(() => true)).toBeGreaterThan(0.25);
    expect(share((draft) => draft.service !== null)).toBeGreaterThan(0.05);
    expect(share((draft) => draft.dot !== null)).toBeGreaterThan(0.05);
    expect(share((draft) => draft.size?.kind === "flotation")).toBeGreaterThan(0.05);
    expect(share((draft) => draft.assumptions.length > 0)).toBeGreaterThan(0.05);
  });

  it.each([
    ["285/50R20 119S", "285/50R20 119S".length],
    ["LT265/70R17 121/118S M+S", "LT265/70R17 121/118S".length],
    ["235/35ZR19 99(Y)", "235/35ZR19 99(Y)".length],
    ["285/50R20 116 T", "285/50R20".length],
    ["285/50R20 100B C", "285/50R20".length],
    ["285/50R20 116R 17", "285/50R20".length],
    ["LT265/75R16 E", -1],
    ["285/50R20C", -1],
    ["285 50 20", "285 50 20".length],
    ["28550R20 116T", "28550R20 116T".length],
    ["285/50-20", -1],
    ["DOT U2LL LMLR 3208 XL", "DOT U2LL LMLR 3208".length],
    ["285/50R20 116T DOT 3208", "285/50R20 116T DOT 3208".length],
    ["DOT 3208.5", -1],
    ["33x12.50R15LT 108Q E", "33x12.50R15LT 108Q".length],
    ["33x12.50R15 E", -1],
  ])("%s: the token readers read on from character %i (-1: from the start)", (text, restFrom) => {
    expect(readUsualStart(text, newDraft())).toBe(restFrom);
    readsAlike(text);
  });
});
