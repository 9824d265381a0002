import { describe, expect, it } from "vitest";
import {
  compareSpeedSymbols,
  isSpeedSymbol,
  markedSpeedRank,
  SPEED_SYMBOLS,
  speedRank,
  speedSymbolInfo,
  speedSymbolRank,
  ZR_UNRATED_RANK,
} from "@/lib/tire";

// Speed symbols A1–V from the Arrêté of 24 October 1994, Annex I (ISO 4000-1 / ETRTO).
const ARRETE_ANNEX_I: ReadonlyArray<[string, number]> = [
  ["A1", 5], ["A2", 10], ["A3", 15], ["A4", 20], ["A5", 25], ["A6", 30], ["A7", 35], ["A8", 40],
  ["B", 50], ["C", 60], ["D", 65], ["E", 70], ["F", 80], ["G", 90], ["J", 100], ["K", 110],
  ["L", 120], ["M", 130], ["N", 140], ["P", 150], ["Q", 160], ["R", 170], ["S", 180], ["T", 190],
  ["U", 200], ["H", 210], ["V", 240],
];

describe("speed symbols", () => {
  it.each(ARRETE_ANNEX_I)("%s stands for %i km/h (Arrêté 24 Oct 1994, Annex I)", (symbol, kmh) => {
    expect(speedSymbolInfo(symbol)?.kmh).toBe(kmh);
    expect(speedSymbolInfo(symbol)?.above).toBe(false);
  });

  it("W is 270 km/h, Y 300 km/h, and (Y) above 300 km/h (EU tyre database, Regulation (EU) 2020/740)", () => {
    expect(speedSymbolInfo("W")).toMatchObject({ kmh: 270, above: false });
    expect(speedSymbolInfo("Y")).toMatchObject({ kmh: 300, above: false });
    expect(speedSymbolInfo("(Y)")).toMatchObject({ kmh: 300, above: true });
  });

  it.each([["S", 112], ["L", 75], ["H", 130], ["W", 168], ["V", 149]])(
    "%s is %i mph (common practice: km/h ÷ 1.609344, rounded)",
    (symbol, mph) => expect(speedSymbolInfo(symbol)?.mph).toBe(mph),
  );

  it("ranks H between U and V, by km/h rather than by letter (ISO 4000-1 speeds)", () => {
    expect(compareSpeedSymbols("U", "H")).toBeLessThan(0);
    expect(compareSpeedSymbols("H", "V")).toBeLessThan(0);
    expect(compareSpeedSymbols("S", "T")).toBeLessThan(0);
  });

  it("ranks (Y) > Y > W > V (EU tyre database speed classes)", () => {
    expect(speedSymbolRank("(Y)")).toBeGreaterThan(speedSymbolRank("Y"));
    expect(speedSymbolRank("Y")).toBeGreaterThan(speedSymbolRank("W"));
    expect(speedSymbolRank("W")).toBeGreaterThan(speedSymbolRank("V"));
  });

  it("places an unrated ZR size above V (Z: above 149 mph / 240 km/h, common practice) and below W", () => {
    expect(ZR_UNRATED_RANK).toBeGreaterThan(speedSymbolRank("V"));
    expect(ZR_UNRATED_RANK).toBeLessThan(speedSymbolRank("W"));
    expect(markedSpeedRank({ zr: true }, null)).toBe(ZR_UNRATED_RANK);
    expect(markedSpeedRank({ zr: true }, { speedSymbol: "Y" })).toBe(speedSymbolRank("Y"));
    expect(markedSpeedRank({ zr: false }, null)).toBeNull();
  });

  it("lists every symbol once, slowest first, with ranks matching km/h order (ISO 4000-1 speeds)", () => {
    const symbols = SPEED_SYMBOLS.map((s) => s.symbol);
    expect(new Set(symbols).size).toBe(30);
    expect(symbols[0]).toBe("A1");
    expect(symbols.at(-1)).toBe("(Y)");
    for (let i = 1; i < SPEED_SYMBOLS.length; i++) {
      const [a, b] = [SPEED_SYMBOLS[i - 1], SPEED_SYMBOLS[i]];
      expect(speedRank(b?.kmh ?? 0, b?.above)).toBeGreaterThan(speedRank(a?.kmh ?? 0, a?.above));
    }
  });

  it("knows no I, O, X or Z symbol (ISO 4000-1 speed symbols)", () => {
    for (const s of ["I", "O", "X", "Z", "A9", "y", ""]) expect(isSpeedSymbol(s)).toBe(false);
  });
});
