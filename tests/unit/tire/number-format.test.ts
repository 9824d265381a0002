/**
 * The tire core writes its figures without Intl (see lib/tire/display.ts). The reference here is
 * ECMA-402's Intl.NumberFormat for en-US as Node's ICU implements it: the plain writing must agree
 * with it digit for digit, grouping and rounding alike, on integers, decimals and halves.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatDecimals, formatInteger, formatOneDecimal, formatUpToDecimals, groupThousands } from "@/lib/tire/display";

const exactly = (decimals: number) => new Intl.NumberFormat("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
const upTo = (decimals: number) => new Intl.NumberFormat("en-US", { maximumFractionDigits: decimals });
/** Intl keeps a minus on a value that rounds to zero ("-0.0"); the plain writing drops it, on purpose. */
const withoutNegativeZero = (text: string) => (/^-[0.,]+$/.test(text) ? text.slice(1) : text);

// Values across the ranges the app shows (millimetres, kilograms, percent, counts), and halves of each step.
const values = fc.oneof(
  fc.double({ min: -1e9, max: 1e9, noNaN: true, noDefaultInfinity: true }),
  fc.integer({ min: -2_000_000_000, max: 2_000_000_000 }),
  fc.integer({ min: -200_000, max: 200_000 }).map((n) => n / 2),
  fc.integer({ min: -200_000, max: 200_000 }).map((n) => n / 20),
  fc.integer({ min: -200_000, max: 200_000 }).map((n) => n / 2000),
);

describe("figures written without Intl", () => {
  it("groups thousands as en-US does", () => {
    expect(groupThousands("0")).toBe("0");
    expect(groupThousands("999")).toBe("999");
    expect(groupThousands("1000")).toBe("1,000");
    expect(groupThousands("1234567")).toBe("1,234,567");
  });

  it("agrees with Intl.NumberFormat (en-US) at 0 to 3 fixed decimals", () => {
    fc.assert(
      fc.property(values, fc.integer({ min: 0, max: 3 }), (value, decimals) => {
        expect(formatDecimals(value, decimals)).toBe(withoutNegativeZero(exactly(decimals).format(value)));
      }),
      { seed: 11, numRuns: 5000 },
    );
  });

  it("agrees with Intl.NumberFormat (en-US) at up to 1 and 3 decimals", () => {
    fc.assert(
      fc.property(values, fc.constantFrom(1, 3), (value, decimals) => {
        expect(formatUpToDecimals(value, decimals)).toBe(withoutNegativeZero(upTo(decimals).format(value)));
      }),
      { seed: 12, numRuns: 5000 },
    );
  });

  it("rounds halves away from zero and writes no minus on a zero", () => {
    expect(formatInteger(792.5)).toBe("793");
    expect(formatInteger(1359.5)).toBe("1,360");
    expect(formatOneDecimal(31.25)).toBe("31.3");
    expect(formatOneDecimal(-0.04)).toBe("0.0");
    expect(formatUpToDecimals(2.5, 1)).toBe("2.5");
    expect(formatUpToDecimals(3, 1)).toBe("3");
    expect(formatUpToDecimals(1234.0004, 3)).toBe("1,234");
  });
});
