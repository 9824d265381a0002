import { describe, expect, it } from "vitest";
import { readOriginal } from "@/lib/alternatives/original";
import { ZR_UNRATED_RANK, speedSymbolRank } from "@/lib/tire";

describe("readOriginal", () => {
  it("reads the URL slug and the usual spellings alike", () => {
    for (const size of ["285-50R20", "285/50R20", "285/50 R20", "285 50 20"]) {
      const read = readOriginal({ size, loadIndex: 119, speedSymbol: "s" });
      expect(read.ok && read.original).toMatchObject({ designation: "285/50R20", serviceType: "passenger", rimDiameterIn: 20, overallDiameterMm: 793, speedSymbol: "S" });
    }
    const flotation = readOriginal({ size: "33x12.50R15LT", loadIndex: 108, speedSymbol: "Q", loadRange: "C" });
    expect(flotation.ok && flotation.original).toMatchObject({ serviceType: "LT", loadRangePly: 6 });
  });

  it("takes a ZR size without a speed symbol as rated above 240 km/h (rule 4)", () => {
    const read = readOriginal({ size: "245/40ZR18", loadIndex: 97 });
    expect(read.ok && read.original.speedRank).toBe(ZR_UNRATED_RANK);
    expect(ZR_UNRATED_RANK).toBeGreaterThan(speedSymbolRank("V"));
    expect(ZR_UNRATED_RANK).toBeLessThan(speedSymbolRank("W"));
  });

  it("marks a run-flat original from its size or from runFlat", () => {
    const fromSize = readOriginal({ size: "245/40RF18", loadIndex: 97, speedSymbol: "W" });
    const fromFlag = readOriginal({ size: "245/40R18", loadIndex: 97, speedSymbol: "W", runFlat: true });
    expect(fromSize.ok && fromSize.original.runFlat).toBe(true);
    expect(fromFlag.ok && fromFlag.original.runFlat).toBe(true);
  });

  it("names what it cannot read with the API's error codes", () => {
    expect(readOriginal({ size: "not a size", loadIndex: 100, speedSymbol: "H" })).toMatchObject({ ok: false, code: "unreadable" });
    expect(readOriginal({ size: "285/50R20 119S", loadIndex: 119, speedSymbol: "S" })).toMatchObject({ ok: false, code: "unreadable" });
    // Load indices run 0–279 (ISO 4000-1 / ETRTO load index table).
    expect(readOriginal({ size: "285/50R20", loadIndex: 280, speedSymbol: "S" })).toMatchObject({ ok: false, code: "unknown_load_index" });
    expect(readOriginal({ size: "LT265/75R16", loadIndex: 123, loadIndexDual: 300, speedSymbol: "R" })).toMatchObject({ ok: false, code: "unknown_load_index" });
    expect(readOriginal({ size: "285/50R20", loadIndex: 119, speedSymbol: "X" })).toMatchObject({ ok: false, code: "unknown_speed_symbol" });
    expect(readOriginal({ size: "285/50R20", loadIndex: 119 })).toMatchObject({ ok: false, code: "missing_parameter" });
  });
});
