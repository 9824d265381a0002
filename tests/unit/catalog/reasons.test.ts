import { describe, expect, it } from "vitest";
import { readOriginal, type Original } from "@/lib/catalog/original";
import { failedRules, qualifyingReasons, type RuleFacts } from "@/lib/catalog/reasons";
import { speedSymbolRank, type SpeedSymbol } from "@/lib/tire";

function original(size: string, loadIndex: number, speedSymbol?: string, extra: { loadIndexDual?: number; loadRange?: "C" | "D" | "E" } = {}): Original {
  const read = readOriginal({ size, loadIndex, speedSymbol, ...extra });
  if (!read.ok) throw new Error(read.message);
  return read.original;
}

function candidate(overallDiameterMm: number, loadIndex: number, speedSymbol: SpeedSymbol, extra: Partial<RuleFacts> = {}): RuleFacts {
  return { overallDiameterMm, loadIndex, loadIndexDual: null, speedSymbol, speedRank: speedSymbolRank(speedSymbol), loadRange: null, loadRangePly: null, ...extra };
}

describe("reasons", () => {
  it("say why a tire qualifies, rule by rule", () => {
    const reference = original("285/50R20", 119, "S");
    // 1,450 kg for index 121 and 1,360 kg for 119 (ISO 4000-1 / ETRTO load index table).
    const reasons = qualifyingReasons(reference, candidate(796, 121, "T"), ((796 - 793) / 793) * 100);
    expect(reasons).toEqual([
      "same 20-inch rim",
      "same radial construction",
      "diameter +0.4 % (+3 mm)",
      "load index 121 ≥ 119: +90 kg",
      "speed T 190 km/h ≥ S 180 km/h",
      "passenger tire, as the original",
    ]);
  });

  it("name the dual index, the load range and run-flat when they apply", () => {
    const reference = original("LT265/75R16", 123, "R", { loadIndexDual: 120, loadRange: "E" });
    const reasons = qualifyingReasons(reference, candidate(803.9, 123, "S", { loadIndexDual: 120, loadRange: "E", loadRangePly: 10 }), 0);
    expect(reasons).toContain("dual load index 120 ≥ 120: +0 kg");
    expect(reasons).toContain("load range E ≥ E");
    expect(reasons).toContain("diameter 0.0 % (0 mm)");
    expect(reasons).toContain("light-truck (LT) tire, as the original");
    expect(qualifyingReasons(original("245/40RF18", 97, "W"), candidate(653.2, 97, "Y"), 0)).toContain("run-flat, as the original");
  });

  it("write (Y) as above 300 km/h and an unrated ZR size as above 240 km/h (ISO 4000-1 / ETRTO speed symbols)", () => {
    const reasons = qualifyingReasons(original("245/40ZR18", 97), candidate(653.2, 97, "(Y)"), 0);
    expect(reasons).toContain("speed (Y) above 300 km/h ≥ ZR above 240 km/h");
  });

  it("say which one rule a near miss fails", () => {
    const reference = original("285/50R20", 119, "S");
    expect(failedRules(reference, candidate(793, 116, "T"), 0, 3)).toEqual(["load index 116 < 119"]);
    expect(failedRules(reference, candidate(793, 121, "R"), 0, 3)).toEqual(["speed R 170 km/h < S 180 km/h"]);
    expect(failedRules(reference, candidate(769, 121, "T"), ((769 - 793) / 793) * 100, 3)).toEqual(["diameter −3.03 % (−24 mm) outside ±3 %"]);
    const truck = original("LT265/75R16", 123, "R", { loadIndexDual: 120, loadRange: "E" });
    expect(failedRules(truck, candidate(803.9, 123, "R", { loadIndexDual: 120, loadRange: "D", loadRangePly: 8 }), 0, 3)).toEqual(["load range D < E"]);
    expect(failedRules(truck, candidate(803.9, 123, "R", { loadIndexDual: 118, loadRange: "E", loadRangePly: 10 }), 0, 3)).toEqual(["dual load index 118 < 120"]);
  });
});
