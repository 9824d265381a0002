import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { centsToDollars, dollarsToCents, MAX_PRICE_CENTS } from "@/lib/catalog-csv/money";

describe("dollars and cents", () => {
  it("reads every amount to the exact cent, with no floating-point error", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: MAX_PRICE_CENTS }), (cents) => {
        expect(dollarsToCents(centsToDollars(cents))).toBe(cents);
      }),
      { seed: 7, numRuns: 2000 },
    );
    // 0.1 + 0.2 style traps: 19.99 × 100 is 1998.9999999999998 in floating point.
    expect(dollarsToCents("19.99")).toBe(1999);
    expect(dollarsToCents("1.15")).toBe(115);
    expect(dollarsToCents("4.35")).toBe(435);
  });

  it("takes whole dollars, one decimal, a dollar sign and spaces around", () => {
    expect(dollarsToCents("159")).toBe(15_900);
    expect(dollarsToCents("159.5")).toBe(15_950);
    expect(dollarsToCents(" $159.00 ")).toBe(15_900);
    expect(dollarsToCents("0.01")).toBe(1);
    expect(dollarsToCents("21474836.47")).toBe(MAX_PRICE_CENTS);
  });

  it("refuses commas, three decimals, signs, words and amounts over the limit", () => {
    for (const text of ["12,50", "1,159.00", "159.999", "-5", "+5", "", ".50", "159.", "ten", "1e3", "21474836.48"]) {
      expect(dollarsToCents(text), text).toBeNull();
    }
  });

  it("writes two decimals", () => {
    expect([centsToDollars(0), centsToDollars(5), centsToDollars(15_900), centsToDollars(12_345)]).toEqual(["0.00", "0.05", "159.00", "123.45"]);
  });
});
