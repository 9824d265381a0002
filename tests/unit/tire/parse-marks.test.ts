import { describe, expect, it } from "vitest";
import { parts, read } from "./helpers";

describe("reading UTQG grades (49 CFR 575.104)", () => {
  it.each([
    "TREADWEAR 500 TRACTION A TEMPERATURE A",
    "Treadwear 500 Traction A Temp A",
    "TRACTION A TEMPERATURE A TREADWEAR 500",
    "500 A A",
    "UTQG 500 A A",
  ])("%s → 500 / A / A", (text) => {
    expect(read(text).utqg).toEqual({ treadwear: 500, traction: "A", temperature: "A" });
  });

  it.each(["500AA A", "500 AA A", "500AAA"])("%s → traction AA (49 CFR 575.104 grades AA, A, B, C)", (text) => {
    expect(read(text).utqg).toEqual({ treadwear: 500, traction: "AA", temperature: "A" });
  });

  it("refuses grades outside the regulation's letters (49 CFR 575.104)", () => {
    expect(read("205/55R16 500 D E").utqg).toBeNull();
  });

  it("warns about incomplete grades", () => {
    const m = read("TREADWEAR 500");
    expect(m.utqg).toBeNull();
    expect(m.warnings.join(" ")).toContain("traction and temperature");
  });
});

describe("reading winter marks", () => {
  it.each(["M+S", "M/S", "MS", "M&S", "m+s", "M + S", "Mud and Snow"])("%s is mud and snow (common practice)", (text) => {
    expect(read(text).winter).toEqual({ mudAndSnow: true, threePeak: false });
  });

  it.each(["3PMSF", "3 PMSF", "three peak mountain snowflake", "Three-Peak Mountain Snowflake", "3 peak mountain snow flake"])(
    "%s is the three-peak mountain snowflake (UN ECE R117 symbol, written out)",
    (text) => expect(read(text).winter).toEqual({ mudAndSnow: false, threePeak: true }),
  );

  it("reads both marks on one line", () => {
    expect(read("195/65R15 91H M+S 3PMSF").winter).toEqual({ mudAndSnow: true, threePeak: true });
  });
});

describe("reading load ranges and ply ratings", () => {
  it.each(["Load Range E", "LOAD RANGE: E", "LRE", "LR E", "LR-E"])("%s is load range E, 10-ply (common practice)", (text) => {
    const m = read(text);
    expect([m.loadRange, m.plyRating]).toEqual(["E", 10]);
  });

  it("reads a lone letter after a light-truck service description as its load range (common practice)", () => {
    expect(read("LT265/75R16 123/120S E").loadRange).toBe("E");
    expect(read("33x12.50R15LT 108Q C").loadRange).toBe("C");
  });

  // ST tires carry load ranges as LT tires do (TRA, common practice); D is 8-ply (common practice).
  it.each([
    "ST205/75R15D 107/102M",
    "ST205/75R15 D 107/102M",
    "ST205/75R15 107/102M D",
    "st205/75r15 107/102m d",
    "ST205/75R15 107/102M LR D",
    "ST205/75R15 107/102M LRD",
    "ST205/75R15 107/102M LOAD RANGE D",
    "ST205/75R15 107/102M Load Range: D",
  ])("%s reads load range D, 8-ply implied, with no warning (TRA, common practice)", (text) => {
    const m = read(text);
    expect([m.loadRange, m.plyRating, m.warnings]).toEqual(["D", 8, []]);
  });

  it("reads a trailer tire's load range beside its ply rating (TRA, common practice: E is 10-ply)", () => {
    const m = read("ST225/75R15 117/112L E 10PR");
    expect([m.loadRange, m.plyRating, m.warnings]).toEqual(["E", 10, []]);
  });

  it("does not take a lone letter after a passenger size for a load range", () => {
    const m = read("265/75R16 116S E");
    expect(m.loadRange).toBeNull();
    expect(m.warnings).toContain('Not read: "E".');
  });

  it.each(["10PR", "10 PLY", "10-ply", "10 ply rating"])("%s is ply rating 10, implying load range E (common practice)", (text) => {
    const m = read(text);
    expect([m.plyRating, m.loadRange]).toEqual([10, "E"]);
    expect(m.assumptions).toEqual(["Load range E is implied by the 10-ply rating."]);
  });

  it("keeps a marked ply rating and warns when it contradicts the load range (common practice)", () => {
    const m = read("LT265/75R16 LRE 8PR");
    expect([m.loadRange, m.plyRating]).toEqual(["E", 8]);
    expect(m.warnings.join(" ")).toContain("does not match load range E");
  });

  it("warns about a letter that is not a load range", () => {
    expect(read("205/55R16 LRK").warnings.join(" ")).toContain("Load range K");
  });
});

describe("reading maximum load and pressure", () => {
  it("reads MAX LOAD and MAX PRESS in both units", () => {
    const m = read("MAX LOAD 1360 KG (2998 LBS) MAX PRESS 350 KPA (51 PSI)");
    expect(m.maxLoad).toEqual({ single: { kg: 1360, lb: 2998 }, dual: null });
    expect(m.maxPressure).toEqual({ kPa: 350, psi: 51 });
  });

  it("agrees with LI 119 = 1,360 kg / 2,998 lb without a warning (common practice)", () => {
    expect(read("285/50R20 119S MAX LOAD 1360 KG (2998 LBS) MAX PRESS 350 KPA (51 PSI)").warnings).toEqual([]);
  });

  it("warns when the maximum load disagrees with the load index (ISO 4000-1: LI 115 = 1,215 kg)", () => {
    const m = read("265/70R17 115T MAX LOAD 1400 KG (3086 LBS)");
    expect(m.warnings).toContain("The maximum load of 1,400 kg does not match load index 115 (1,215 kg).");
  });

  it("checks a pound-only maximum load against the load index (ISO 4000-1: LI 94 = 670 kg = 1,477 lb)", () => {
    expect(read("94V MAX LOAD 1477 LBS").warnings).toEqual([]);
    expect(read("94V MAX LOAD 1609 LBS").warnings.join(" ")).toContain("1,477 lb");
  });

  it("accepts the small rounding of US LT tables (LI 123 = 1,550 kg; 3,415 lb printed, common practice)", () => {
    const m = read("LT265/75R16 123/120S LOAD RANGE E MAX LOAD SINGLE 1550 KG (3415 LBS) AT 550 KPA (80 PSI) COLD MAX LOAD DUAL 1400 KG (3085 LBS)");
    expect(m.maxLoad).toEqual({ single: { kg: 1550, lb: 3415 }, dual: { kg: 1400, lb: 3085 } });
    expect(m.maxPressure).toEqual({ kPa: 550, psi: 80 });
    expect(m.warnings).toEqual([]);
  });

  it("warns when the two units of one figure disagree", () => {
    expect(read("MAX LOAD 1360 KG (3100 LBS)").warnings.join(" ")).toContain("do not agree");
    expect(read("MAX PRESS 350 KPA (44 PSI)").warnings.join(" ")).toContain("do not agree");
  });

  it.each([
    ["350 KPA (51 PSI) MAX. PRESS.", { kPa: 350, psi: 51 }],
    ["51 PSI MAX PRESSURE", { kPa: null, psi: 51 }],
    ["350 kPa max. inflation pressure", { kPa: 350, psi: null }],
    ["285/50R20 119S MAX LOAD 1360 KG (2998 LBS) 350 KPA (51 PSI) MAX. PRESS.", { kPa: 350, psi: 51 }],
    ["MAX LOAD 1360 KG (2998 LBS) AT 350 KPA (51 PSI) MAX PRESS", { kPa: 350, psi: 51 }],
  ])("reads a maximum pressure labelled after its figure: %s", (text, pressure) => {
    const m = read(text);
    expect(m.maxPressure).toEqual(pressure);
    expect(m.warnings).toEqual([]);
    expect(parts(m).filter((part) => part.startsWith("unread"))).toEqual([]);
  });

  it("still leaves a pressure with no maximum label unread", () => {
    expect(read("205/55R16 91V 44 PSI").warnings).toEqual(['Not read: "44 PSI".']);
  });

  // LI 115 = 1,215 kg (ISO 4000-1); 1,215 × 2.20462 = 2,678.6 lb.
  it.each(["265/70R17 115T MAX LOAD 1215 KG (2679 LBS)", "265/70R17 115T MAX LOAD 1215 KG (2680 LBS)", "115T MAX LOAD 2679 LBS"])(
    "reads %s as consistent (ISO 4000-1: LI 115 = 1,215 kg = 2,679 lb)",
    (text) => expect(read(text).warnings).toEqual([]),
  );

  it("accepts pound figures a few pounds low, from tables rounded down to 5 or 10 lb or converted at 2.2 lb/kg (common practice)", () => {
    // LI 62 = 265 kg = 584.2 lb, printed 580; LI 115: 1,215 kg × 2.2 = 2,673 lb.
    expect(read("62T MAX LOAD 265 KG (580 LBS)").warnings).toEqual([]);
    expect(read("115T MAX LOAD 1215 KG (2673 LBS)").warnings).toEqual([]);
    expect(read("115T MAX LOAD 2670 LBS").warnings).toEqual([]);
  });

  it("warns about a pound figure above what its kilograms carry beyond rounding (ISO 4000-1: LI 115 = 2,679 lb)", () => {
    expect(read("MAX LOAD 1215 KG (2690 LBS)").warnings).toEqual(["The maximum load reads 1,215 kg but 2,690 lb; the two do not agree."]);
    expect(read("115T MAX LOAD 2690 LBS").warnings).toEqual(["The maximum load of 2,690 lb does not match load index 115 (2,679 lb)."]);
    expect(read("115T MAX LOAD 2660 LBS").warnings).toEqual(["The maximum load of 2,660 lb does not match load index 115 (2,679 lb)."]);
  });

  it("reads thousands separators and dotted abbreviations", () => {
    expect(read("MAX. LOAD 1,360 KG (2,998 LBS)").maxLoad?.single).toEqual({ kg: 1360, lb: 2998 });
    expect(read("Max. Press. 44 psi").maxPressure).toEqual({ kPa: null, psi: 44 });
  });
});

describe("reading RF (common practice)", () => {
  it("after the service description, RF means reinforced: extra load", () => {
    const m = read("225/45R17 94W RF");
    expect([m.extraLoad, m.runFlat]).toEqual([true, false]);
    expect(parts(m)).toContain("loadType:RF");
  });

  it("inside the size, RF means run-flat", () => {
    const m = read("225/45RF17 94W");
    expect([m.extraLoad, m.runFlat, m.size?.runFlat]).toEqual([false, true, true]);
  });

  it("right after the size, before a service description, RF means run-flat", () => {
    expect([read("225/45R17 RF 94W").runFlat, read("225/45R17 RF 94W").extraLoad]).toEqual([true, false]);
  });
});

describe("reading a full sidewall line", () => {
  it("finds every part and where it sits", () => {
    const line = "LT265/75R16 123/120S LRE M+S DOT U2LL LMLR 3208 TREADWEAR 500 TRACTION A TEMPERATURE B";
    const m = read(line);
    expect(parts(m)).toEqual([
      "size:LT265/75R16", "service:123/120S", "loadRange:LRE", "winter:M+S", "dot:DOT U2LL LMLR 3208",
      "utqg:TREADWEAR 500", "utqg:TRACTION A", "utqg:TEMPERATURE B",
    ]);
  });

  it("reports words it cannot read without failing", () => {
    const m = read("ACME Roadfarer 205/55R16 91V");
    expect(m.warnings).toEqual(['Not read: "ACME Roadfarer".']);
    expect(m.spans[0]).toEqual({ part: "unread", start: 0, end: 14 });
  });
});
