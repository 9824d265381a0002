import { describe, expect, it } from "vitest";
import { readOriginal, type OriginalInput } from "@/lib/alternatives/original";
import {
  failedRuleWords,
  isNearMiss,
  judgeCandidate,
  noteWords,
  qualifyingReasonWords,
  sizeFacts,
  measurableSizeFromSlug,
  type JudgedCandidate,
} from "@/lib/tire";

// The rules judged here are the shop's contract of equal-or-better (rules 1–7, the product brief);
// the load figures come from the ISO 4000-1 / ETRTO load index table, the speeds from its speed symbols.

function original(input: Partial<OriginalInput> & { size: string; loadIndex: number }) {
  const read = readOriginal({ speedSymbol: "S", ...input });
  if (!read.ok) throw new Error(read.message);
  return read.original;
}

function candidate(designation: string, loadIndex: number, speedSymbol: string, extra: Partial<JudgedCandidate> = {}): JudgedCandidate {
  const size = measurableSizeFromSlug(designation);
  if (!size) throw new Error(designation);
  return { ...sizeFacts(size), extraLoad: false, loadIndex, loadIndexDual: null, speedSymbol, loadRange: null, season: null, ...extra };
}

const judge = (o: ReturnType<typeof original>, c: JudgedCandidate, tolerancePct = 3) => judgeCandidate(o, c, { tolerancePct });

describe("the judge of equal-or-better", () => {
  it("says why a tire qualifies, rule by rule, from codes with their figures", () => {
    const verdict = judge(original({ size: "285/50R20", loadIndex: 119 }), candidate("285/50R20", 121, "T"));
    expect(verdict.qualifies).toBe(true);
    expect(verdict.checks.find((check) => check.rule === "loadIndex")).toMatchObject({ number: 3, candidate: 121, required: 119, source: "original", marginKg: 90 });
    // 1,450 kg for index 121 and 1,360 kg for 119 (ISO 4000-1 / ETRTO load index table).
    expect(qualifyingReasonWords(verdict)).toEqual([
      "same 20-inch rim",
      "same radial construction",
      "diameter 0.0 % (0 mm)",
      "load index 121 ≥ 119: +90 kg",
      "speed T 190 km/h ≥ S 180 km/h",
      "passenger tire, as the original",
    ]);
  });

  it("orders speed by km/h, not by letter: H (210) sits between U (200) and V (240) (ISO 4000-1 speed symbols)", () => {
    const reference = original({ size: "225/45R17", loadIndex: 91, speedSymbol: "H" });
    expect(judge(reference, candidate("225/45R17", 91, "U")).failedRules).toEqual([4]);
    expect(judge(reference, candidate("225/45R17", 91, "V")).qualifies).toBe(true);
    const fastest = original({ size: "225/45R17", loadIndex: 91, speedSymbol: "Y" });
    expect(judge(fastest, candidate("225/45R17", 91, "(Y)")).qualifies).toBe(true);
    expect(failedRuleWords(judge(fastest, candidate("225/45R17", 91, "W")))).toEqual(["speed W 270 km/h < Y 300 km/h"]);
  });

  it("takes a ZR size without a service description as above 240 km/h: V falls short, W holds", () => {
    const reference = original({ size: "245/40ZR18", loadIndex: 97, speedSymbol: undefined });
    expect(failedRuleWords(judge(reference, candidate("245/40R18", 97, "V")))).toEqual(["speed V 240 km/h < ZR above 240 km/h"]);
    expect(qualifyingReasonWords(judge(reference, candidate("245/40R18", 97, "(Y)")))).toContain("speed (Y) above 300 km/h ≥ ZR above 240 km/h");
  });

  it("never offers a tire without a dual index for dual wheels, and says so in plain words", () => {
    const truck = original({ size: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "E" });
    const noDual = judge(truck, candidate("LT265/75R16", 126, "S", { loadRange: "E" }));
    expect(noDual.qualifies).toBe(false);
    expect(noDual.failedRules).toEqual([3]);
    expect(failedRuleWords(noDual)).toEqual(["no dual load index: not rated for dual wheels (needs a dual index of 120 or more)"]);
    expect(isNearMiss(noDual)).toBe(true);
    const rated = judge(truck, candidate("LT265/75R16", 123, "S", { loadIndexDual: 120, loadRange: "E" }));
    expect(qualifyingReasonWords(rated)).toContain("dual load index 120 ≥ 120: +0 kg");
    expect(qualifyingReasonWords(rated)).toContain("load range E ≥ E");
    expect(qualifyingReasonWords(rated)).toContain("light-truck (LT) tire, as the original");
  });

  it("turns every passenger tire away from a Placard check that asks for a dual minimum (common practice: passenger tires carry no dual rating)", () => {
    const car = original({ size: "P265/70R17", loadIndex: 113, minLoadIndexDual: 112 });
    const verdict = judge(car, candidate("P265/70R17", 115, "T"));
    expect(verdict.failedRules).toEqual([3]);
    expect(failedRuleWords(verdict)[0]).toMatch(/^no dual load index: not rated for dual wheels/);
  });

  it("counts a load index and a dual index that both fall short as one failed rule, in one line", () => {
    const truck = original({ size: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "E" });
    const verdict = judge(truck, candidate("LT265/75R16", 120, "S", { loadIndexDual: 116, loadRange: "E" }));
    expect(verdict.failedRules).toEqual([3]);
    expect(failedRuleWords(verdict)).toEqual(["load index 120 < 123; dual load index 116 < 120"]);
    expect(isNearMiss(verdict)).toBe(true);
  });

  it("takes the higher of the original's index and the Placard check's minimum, and says which one decided", () => {
    const reference = original({ size: "P265/70R17", loadIndex: 113, minLoadIndex: 122 });
    const short = judge(reference, candidate("P265/70R17", 121, "S"));
    expect(failedRuleWords(short)).toEqual(["load index 121 < 122 (Placard check)"]);
    // 1,500 kg for 122 and 1,550 kg for 123 (ISO 4000-1 / ETRTO load index table).
    expect(qualifyingReasonWords(judge(reference, candidate("P265/70R17", 123, "S")))).toContain("load index 123 ≥ 122 (Placard check): +50 kg");
    const lowMinimum = original({ size: "P265/70R17", loadIndex: 113, minLoadIndex: 110 });
    expect(judge(lowMinimum, candidate("P265/70R17", 112, "S")).failedRules).toEqual([3]);
  });

  it("keeps the load range at least as strong, and the rim, construction, service type and run-flat as the original", () => {
    const truck = original({ size: "LT265/75R16", loadIndex: 123, loadRange: "E" });
    expect(failedRuleWords(judge(truck, candidate("LT265/75R16", 123, "S", { loadRange: "D" })))).toEqual(["load range D < E"]);
    expect(failedRuleWords(judge(truck, candidate("LT265/75R16", 123, "S")))).toEqual(["load range none < E"]);
    expect(judge(truck, candidate("265/75R16", 123, "S", { loadRange: "E" })).failedRules).toEqual([6]);
    const car = original({ size: "225/45R17", loadIndex: 91, speedSymbol: "V" });
    expect(failedRuleWords(judge(car, candidate("225/40R18", 92, "W")))).toEqual(["18-inch rim, not 17-inch: a plus size needs other wheels"]);
    expect(judge(car, candidate("225/45-17", 91, "V")).failedRules).toEqual([1]);
    const runFlat = original({ size: "245/40RF18", loadIndex: 97, speedSymbol: "W" });
    expect(failedRuleWords(judge(runFlat, candidate("245/40R18", 97, "W")))).toEqual(["not run-flat, though the original is"]);
    expect(qualifyingReasonWords(judge(runFlat, candidate("245/40RF18", 97, "Y")))).toContain("run-flat, as the original");
  });

  it("never replaces a temporary spare, nor offers one", () => {
    const spare = original({ size: "T125/70R17", loadIndex: 98, speedSymbol: "M" });
    expect(judge(spare, candidate("T125/70R17", 98, "M")).failedRules).toEqual([6]);
    expect(judge(original({ size: "225/45R17", loadIndex: 91 }), candidate("T125/70R17", 98, "M")).failedRules).toContain(6);
  });

  it("writes a diameter just outside the tolerance with two decimals, so it never reads as on it", () => {
    const reference = original({ size: "285/50R20", loadIndex: 119 });
    // 285/50R20 is 793 mm; 275/45R20 is 755.5 mm: −4.73 %.
    const verdict = judge(reference, candidate("275/45R20", 121, "T"));
    expect(failedRuleWords(verdict)).toEqual(["diameter −4.73 % (−38 mm) outside ±3 %"]);
    expect(verdict.checks.find((check) => check.rule === "diameter")).toMatchObject({ passed: false, tolerancePct: 3 });
  });

  it("judges a plus size on its own rim when asked (the Plus planner), every other rule still holding", () => {
    const reference = original({ size: "225/45R17", loadIndex: 91, speedSymbol: "V" });
    const plus = candidate("225/40R18", 92, "W");
    expect(judgeCandidate(reference, plus, { tolerancePct: 3, ownRim: true }).qualifies).toBe(true);
    expect(judgeCandidate(reference, candidate("225/40R18", 88, "W"), { tolerancePct: 3, ownRim: true }).failedRules).toEqual([3]);
  });

  it("notes a change of season, and a different inflation for a Euro-metric or XL tire in place of a P-metric one (common practice)", () => {
    const reference = original({ size: "P225/60R16", loadIndex: 97, speedSymbol: "T", season: "all-season" });
    const winter = judge(reference, candidate("P225/60R16", 98, "T", { season: "winter" }));
    expect(noteWords(winter.notes)).toEqual(["season change: a winter tire in place of the all-season tire on the car now"]);
    const euro = judge(reference, candidate("225/60R16", 98, "T", { season: "all-season" }));
    expect(euro.notes).toEqual([{ note: "inflation", euroMetric: true, extraLoad: false }]);
    expect(noteWords(euro.notes)[0]).toMatch(/^inflation: a Euro-metric tire needs a different pressure .* load and inflation table and the placard$/);
    const xl = judge(reference, candidate("P225/60R16", 102, "T", { extraLoad: true, season: "all-season" }));
    expect(noteWords(xl.notes)[0]).toMatch(/^inflation: an extra-load \(XL\) tire/);
    expect(judge(reference, candidate("P225/60R16", 98, "T", { season: "all-season" })).notes).toEqual([]);
    expect(judge(original({ size: "225/60R16", loadIndex: 97, speedSymbol: "T" }), candidate("225/60R16", 100, "T", { extraLoad: true })).notes).toEqual([]);
  });
});
