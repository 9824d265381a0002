import { describe, expect, it } from "vitest";
import { DEMO_BRANDS } from "@/lib/demo/catalog-lines";
import { DEMO_CATALOG, generateStock } from "@/lib/demo/catalog-stock";
import { sizeFromSlug } from "@/lib/tire";
import { hiddenMarketNames, marketNameHash } from "../../fixtures/market-name-hashes";

describe("demo catalog", () => {
  const stock = generateStock(DEMO_CATALOG);

  it("uses only invented brand and line names: none holds a market name, even inside a longer word", () => {
    const names = DEMO_BRANDS.flatMap((brand) => [brand.name, ...brand.lines.map(([line]) => line)]);
    for (const name of names) expect(hiddenMarketNames(name), name).toEqual([]);
  });

  it("finds a listed name however it is spelled or wherever it sits in a longer name", () => {
    const listed = new Set([marketNameHash("oakridge")]);
    expect(hiddenMarketNames("Oak-Ridge Tour", listed)).toEqual(["oakridge"]);
    expect(hiddenMarketNames("Big OAKRIDGE AT", listed)).toEqual(["oakridge"]);
    expect(hiddenMarketNames("Oak Tour", listed)).toEqual([]);
  });

  it("has at least 12 brands, 60 lines and 2,000 stock items, the same on every run", () => {
    expect(DEMO_BRANDS.length).toBeGreaterThanOrEqual(12);
    expect(DEMO_BRANDS.flatMap((brand) => brand.lines).length).toBeGreaterThanOrEqual(60);
    expect(stock.length).toBeGreaterThanOrEqual(2000);
    expect(new Set(stock.map((item) => item.input.sku)).size).toBe(stock.length);
    expect(generateStock(DEMO_CATALOG)).toEqual(stock);
  });

  it("gives each popular size several lines in different load indices and speed ratings", () => {
    for (const size of ["205/55R16", "225/45R17", "235/65R17", "265/70R17", "275/55R20", "285/50R20", "LT265/75R16"]) {
      const items = stock.filter((item) => item.input.designation.replace(/^P/, "") === size);
      expect(new Set(items.map((item) => item.lineName)).size, size).toBeGreaterThanOrEqual(8);
      expect(new Set(items.map((item) => item.input.loadIndex)).size, size).toBeGreaterThanOrEqual(2);
      expect(new Set(items.map((item) => item.input.speedSymbol)).size, size).toBeGreaterThanOrEqual(3);
      expect(items.some((item) => item.input.quantity === 0), size).toBe(true);
    }
    const loadRangeE = stock.filter((item) => item.input.designation === "LT265/75R16" && item.input.loadRange === "E");
    expect(loadRangeE.length).toBeGreaterThanOrEqual(5);
  });

  it("spreads over real service types, speed ratings and constructions", () => {
    const sizes = stock.map((item) => sizeFromSlug(item.input.designation));
    expect(sizes.every((size) => size !== null)).toBe(true);
    const symbols = new Set(stock.map((item) => item.input.speedSymbol));
    for (const symbol of ["Q", "R", "S", "T", "H", "V", "W", "Y", "(Y)"]) expect(symbols).toContain(symbol);
    expect(sizes.some((size) => size?.zr)).toBe(true);
    expect(sizes.some((size) => size?.runFlat)).toBe(true);
    expect(sizes.some((size) => size?.kind === "flotation")).toBe(true);
    expect(sizes.some((size) => size?.commercial)).toBe(true);
    expect(new Set(stock.map((item) => item.input.loadRange))).toEqual(new Set([null, "C", "D", "E"]));
  });
});
