import { describe, expect, it } from "vitest";
import { parseMarking } from "@/lib/tire";
import { parts, read } from "./helpers";

const today = new Date("2025-06-01T00:00:00Z");

describe("reading DOT / TIN codes (49 CFR 574.5)", () => {
  it("3208 is week 32 of 2008 (49 CFR 574.5 date code: week then year)", () => {
    expect(read("DOT U2LL LMLR 3208").dot).toMatchObject({ week: 32, year: 2008, yearAmbiguous: false });
  });

  it("reads a 2-symbol plant code from an older TIN (49 CFR 574.5 before the April 2015 rule)", () => {
    expect(read("DOT U2LL LMLR 3208").dot).toMatchObject({ plantCode: "U2", tin: "U2LLLMLR3208" });
  });

  it("reads a 3-symbol plant code from a 13-symbol TIN (49 CFR 574.5 after the April 2015 rule)", () => {
    const dot = read("DOT 4B9 T1WB CX 2515").dot;
    expect(dot).toMatchObject({ plantCode: "4B9", week: 25, year: 2015 });
    expect(dot?.tin).toHaveLength(13);
  });

  it("reads a TIN typed without spaces, in lower case, or after TIN (49 CFR 574.5)", () => {
    expect(read("DOTU2LLLMLR3208").dot).toMatchObject({ plantCode: "U2", week: 32, year: 2008 });
    expect(read("dot u2ll lmlr 3208").dot?.plantCode).toBe("U2");
    expect(read("TIN: U2LL LMLR 3208").dot?.week).toBe(32);
  });

  it("reads a bare date code after DOT", () => {
    expect(read("DOT 0119").dot).toMatchObject({ plantCode: "", week: 1, year: 2019 });
  });

  it("reads a 3-digit pre-2000 date code as a guessed 199x year (49 CFR 574.5 before the 2000 four-digit rule)", () => {
    const m = read("DOT XX XX 328");
    expect(m.dot).toMatchObject({ week: 32, year: 1998, yearAmbiguous: true });
    expect(m.assumptions.join(" ")).toContain("1988");
  });

  it("refuses a week outside 01–53 (49 CFR 574.5 weeks)", () => {
    const r = parseMarking("DOT XX XX 5608");
    expect(!r.ok && r.error).toMatchObject({ code: "unreadable" });
    expect(!r.ok && r.error.message).toContain("01 to 53");
    const withSize = read("205/55R16 DOT XX XX 5608");
    expect(withSize.dot).toBeNull();
    expect(withSize.warnings.join(" ")).toContain("5608");
  });

  it("says when DOT has no date code", () => {
    const r = parseMarking("DOT");
    expect(!r.ok && r.error.message).toContain("no date code");
  });

  it("warns about letters a TIN never uses, such as O for 0 (49 CFR 574.5, from memory)", () => {
    expect(read("DOT O2LL LMLR 3208").warnings.join(" ")).toContain("G, I, O, Q, S or Z");
  });

  it("stops the TIN at the date code so the rest of the line is read too", () => {
    const m = read("DOT U2LL LMLR 3208 500 AA A");
    expect(m.dot?.year).toBe(2008);
    expect(m.utqg).toEqual({ treadwear: 500, traction: "AA", temperature: "A" });
    expect(parts(read("205/55R16 91V DOT 4B9 T1WB CX 2515 XL"))).toEqual([
      "size:205/55R16", "service:91V", "dot:DOT 4B9 T1WB CX 2515", "loadType:XL",
    ]);
  });

  describe("age", () => {
    it("is worked out only when today is given", () => {
      expect(read("DOT 3208").dot?.ageYears).toBeNull();
      expect(read("DOT 3208", { today }).dot?.ageYears).toBeCloseTo(16.8, 1);
    });

    it("asks for an inspection past about 6 years (common practice)", () => {
      const m = read("DOT 2218", { today });
      expect(m.warnings.join(" ")).toMatch(/about 7 years ago.*inspected/);
    });

    it("mentions replacement at 10 years, as many makers advise (common practice)", () => {
      expect(read("DOT 3208", { today }).warnings.join(" ")).toMatch(/about 16 years ago.*replacing tires 10 years/);
    });

    it("says nothing for a young tire", () => {
      expect(read("DOT 0123", { today }).warnings).toEqual([]);
    });

    it("flags a date code that has not come yet", () => {
      expect(read("DOT 4030", { today }).warnings.join(" ")).toContain("has not come yet");
    });
  });
});
