import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { centsToDollarsText, formatPrice, MAX_PRICE_CENTS, parseDollars } from "@/lib/money/money";

describe("dollars and cents", () => {
  it("reads every amount to the exact cent, with no floating-point error", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: MAX_PRICE_CENTS }), (cents) => {
        expect(parseDollars(centsToDollarsText(cents))).toBe(cents);
      }),
      { seed: 7, numRuns: 2000 },
    );
    // 0.1 + 0.2 style traps: 19.99 × 100 is 1998.9999999999998 in floating point.
    expect(parseDollars("19.99")).toBe(1999);
    expect(parseDollars("1.15")).toBe(115);
    expect(parseDollars("4.35")).toBe(435);
  });

  it("takes whole dollars, one decimal, a dollar sign and spaces around", () => {
    expect(parseDollars("159")).toBe(15_900);
    expect(parseDollars("159.5")).toBe(15_950);
    expect(parseDollars(" $159.00 ")).toBe(15_900);
    expect(parseDollars("0.01")).toBe(1);
    expect(parseDollars("21474836.47")).toBe(MAX_PRICE_CENTS);
  });

  it("takes thousands commas in groups of three, as a person writes a price: $1,204.50", () => {
    expect(parseDollars("$1,204.50")).toBe(120_450);
    expect(parseDollars("1,204")).toBe(120_400);
    expect(parseDollars("21,474,836.47")).toBe(MAX_PRICE_CENTS);
    expect(parseDollars("159.")).toBe(15_900);
  });

  it("refuses commas out of their groups, three decimals, signs, words and amounts over the limit", () => {
    for (const text of ["12,50", "1,2345", ",159", "159.999", "-5", "+5", "", ".50", "ten", "1e3", "21474836.48", "99999999999"]) {
      expect(parseDollars(text), text).toBeNull();
    }
  });

  it("shows a price as a person reads it", () => {
    expect([formatPrice(120_450), formatPrice(5), formatPrice(0)]).toEqual(["$1,204.50", "$0.05", "$0.00"]);
  });

  it("writes every amount as Intl.NumberFormat's en-US dollars do, without loading Intl on the page", () => {
    const usd = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" });
    fc.assert(
      fc.property(fc.integer({ min: -MAX_PRICE_CENTS, max: MAX_PRICE_CENTS }), (cents) => {
        expect(formatPrice(cents)).toBe(usd.format(cents / 100));
      }),
      { seed: 8, numRuns: 5000 },
    );
  });

  it("writes two decimals", () => {
    expect([centsToDollarsText(0), centsToDollarsText(5), centsToDollarsText(15_900), centsToDollarsText(12_345)]).toEqual(["0.00", "0.05", "159.00", "123.45"]);
  });
});
