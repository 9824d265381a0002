import { describe, expect, it } from "vitest";
import { parseMarking } from "@/lib/tire";
import { parts, read } from "./helpers";

describe("reading service descriptions", () => {
  it("215/65R16C 109/107T carries 1030 kg single, 975 kg dual, at 190 km/h (EU tyre database example)", () => {
    const m = read("215/65R16C 109/107T");
    expect(m.service).toEqual({
      loadIndex: 109, loadIndexDual: 107, speedSymbol: "T", loadKg: 1030, loadLb: 2271,
      speedKmh: 190, speedMph: 118, speedAbove: false,
    });
  });

  it("116T after 285/50R20: LI 116 is 1,250 kg, T is 190 km/h (ISO 4000-1 tables)", () => {
    expect(read("285/50R20 116T").service).toMatchObject({ loadIndex: 116, loadKg: 1250, speedKmh: 190 });
  });

  it("LI 119 S: 1,360 kg (2,998 lb), 180 km/h (112 mph) (common practice)", () => {
    expect(read("119S").service).toMatchObject({ loadKg: 1360, loadLb: 2998, speedKmh: 180, speedMph: 112 });
  });

  it.each(["(99Y)", "99(Y)", "99 (Y)"])("reads %s as (Y): 300 km/h and above (EU tyre database speed classes)", (text) => {
    expect(read(`235/35ZR19 ${text}`).service).toMatchObject({ loadIndex: 99, speedSymbol: "(Y)", speedKmh: 300, speedAbove: true });
  });

  it("reads a bracketed description with another symbol as the plain one, with a note (common practice)", () => {
    const m = read("(94W)");
    expect(m.service?.speedSymbol).toBe("W");
    expect(m.assumptions).toEqual(['Read "(94W)" as 94W.']);
  });

  it("reads A1–A8 symbols (Arrêté 24 Oct 1994, Annex I)", () => {
    expect(read("100A8").service).toMatchObject({ speedSymbol: "A8", speedKmh: 40 });
  });

  it("reads a speed symbol spaced from its load index (common practice)", () => {
    expect(read("285/50R20 116 T").service).toMatchObject({ loadIndex: 116, speedSymbol: "T" });
  });

  it("reads lower-case descriptions (common practice)", () => {
    expect(read("91v").service?.speedSymbol).toBe("V");
  });

  it("warns when the dual index is above the single one (common practice: dual is lower)", () => {
    expect(read("120/123S").warnings.join(" ")).toContain("dual load index 123");
  });

  it("reads XL, Extra Load, Reinforced and RF after the service description as extra load (ETRTO, common practice)", () => {
    for (const mark of ["XL", "Extra Load", "REINFORCED", "RF", "xl"]) {
      const m = read(`225/45R17 94W ${mark}`);
      expect(m.extraLoad).toBe(true);
      expect(m.loadType).toBe("XL");
      expect(m.runFlat).toBe(false);
    }
    expect(read("225/45R17XL 94W").extraLoad).toBe(true);
  });

  it("reads SL as standard load (ETRTO)", () => {
    const m = read("205/55R16 91V SL");
    expect([m.loadType, m.extraLoad]).toEqual(["SL", false]);
  });

  it("warns when the ZR speed symbol is below V (ZR: above 240 km/h, common practice)", () => {
    expect(read("245/40ZR18 97H").warnings.join(" ")).toContain("ZR");
    expect(read("245/40ZR18 97Y").warnings).toEqual([]);
  });

  it("rejects a load index outside 0–279 as unknown_load_index (ISO 4000-1 range)", () => {
    const r = parseMarking("285/50R20 300T");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatchObject({ code: "unknown_load_index" });
    const dual = parseMarking("LT285/75R16 295/290T");
    expect(!dual.ok && dual.error.code).toBe("unknown_load_index");
  });

  it.each(["116Z", "94I", "94O"])("rejects %s as unknown_speed_symbol (ISO 4000-1 symbols)", (text) => {
    const r = parseMarking(`285/50R20 ${text}`);
    expect(!r.ok && r.error.code).toBe("unknown_speed_symbol");
    expect(!r.ok && r.error.suggestion).toContain("ZR");
  });

  it("does not take a half-typed flotation size for a speed symbol", () => {
    const r = parseMarking("33x");
    expect(!r.ok && r.error.code).toBe("unreadable");
  });

  it("reads a dual index only when it sits close below the single one, so 285/50R stays a size (common practice)", () => {
    expect(read("98/95R").service).toMatchObject({ loadIndex: 98, loadIndexDual: 95, speedSymbol: "R" });
    const r = parseMarking("285/50R");
    expect(!r.ok && r.error.code).toBe("unreadable");
  });

  it("marks where the service description and its pieces sit", () => {
    const m = read("LT265/75R16 123/120S");
    expect(parts(m)).toEqual(["size:LT265/75R16", "service:123/120S"]);
    expect(m.details.slice(-3).map((d) => `${d.detail}:${m.input.slice(d.start, d.end)}`)).toEqual([
      "loadIndex:123", "loadIndexDual:120", "speedSymbol:S",
    ]);
    const bracketed = read("(99Y)");
    expect(bracketed.details.map((d) => bracketed.input.slice(d.start, d.end))).toEqual(["99", "Y"]);
    const trailing = read("99(Y)");
    expect(trailing.details.map((d) => trailing.input.slice(d.start, d.end))).toEqual(["99", "(Y)"]);
  });
});
