import { describe, expect, it } from "vitest";
import { buildStockRow, type StockItemInput } from "@/lib/stock/build-stock-row";

const line = { id: 7, runFlat: false };
const item = (overrides: Partial<StockItemInput>): StockItemInput => ({
  sku: "TST-1",
  designation: "285/50R20",
  loadIndex: 116,
  speedSymbol: "H",
  extraLoad: true,
  priceCents: 23_999,
  quantity: 4,
  ...overrides,
});

function built(input: StockItemInput, onLine = line) {
  const result = buildStockRow(input, onLine);
  if (!result.ok) throw new Error(`${result.problem.field}: ${result.problem.reason}`);
  return result.row;
}

function refusal(input: StockItemInput) {
  const result = buildStockRow(input, line);
  return result.ok ? null : result.problem;
}

describe("buildStockRow", () => {
  it("stores the designation normalized and taken apart, with the nominal diameter (20 × 25.4 + 2 × 285 × 0.50 = 793 mm)", () => {
    expect(built(item({ designation: "285-50r20" }))).toMatchObject({
      sku: "TST-1",
      lineId: 7,
      designation: "285/50R20",
      sizeKind: "metric",
      prefix: null,
      sectionWidthMm: 285,
      aspectRatio: 50,
      rimDiameterIn: 20,
      construction: "R",
      zr: false,
      commercial: false,
      runFlat: false,
      serviceType: "passenger",
      overallDiameterMm: 793,
      extraLoad: true,
      quantityOnHand: 4,
    });
  });

  it("ranks speed symbols by km/h: H (210) above U (200), (Y) above Y (ISO 4000-1 / ETRTO speed symbol table)", () => {
    const rank = (speedSymbol: string) => built(item({ speedSymbol })).speedRank;
    expect(rank("H")).toBeGreaterThan(rank("U"));
    expect(rank("V")).toBeGreaterThan(rank("H"));
    expect(rank("(y)")).toBeGreaterThan(rank("Y"));
    expect(built(item({ speedSymbol: "(y)" })).speedSymbol).toBe("(Y)");
  });

  it("reads LT metric and flotation sizes as light truck, with the load range as a ply rating (E = 10 ply, common practice)", () => {
    const metric = built(item({ designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "R", loadRange: "e", extraLoad: false }));
    expect(metric).toMatchObject({ designation: "LT265/75R16", prefix: "LT", serviceType: "LT", loadRange: "E", loadRangePly: 10, loadIndexDual: 120 });
    expect(metric.overallDiameterMm).toBeCloseTo(803.9, 9);
    // Flotation: the overall diameter is the first number, 33 in = 838.2 mm.
    const flotation = built(item({ designation: "33x12.50R15LT", loadIndex: 108, speedSymbol: "Q", loadRange: "C", extraLoad: false }));
    expect(flotation).toMatchObject({ sizeKind: "flotation", serviceType: "LT", aspectRatio: null, loadRangePly: 6 });
    expect(flotation.overallDiameterMm).toBeCloseTo(838.2, 9);
  });

  it("marks run-flat from the designation or from the line", () => {
    expect(built(item({ designation: "245/40RF18", loadIndex: 97 })).runFlat).toBe(true);
    expect(built(item({ designation: "245/40R18", loadIndex: 97 }), { id: 3, runFlat: true }).runFlat).toBe(true);
  });

  it("refuses what the tire core cannot read", () => {
    expect(refusal(item({ designation: "285/50R20 116H" }))?.field).toBe("designation");
    expect(refusal(item({ designation: "hello" }))?.field).toBe("designation");
    expect(refusal(item({ loadIndex: 280 }))?.field).toBe("loadIndex");
    expect(refusal(item({ speedSymbol: "X" }))?.field).toBe("speedSymbol");
    expect(refusal(item({ loadRange: "Q", designation: "LT265/75R16", extraLoad: false }))?.field).toBe("loadRange");
  });

  it("refuses combinations no sidewall carries (common practice)", () => {
    expect(refusal(item({ loadRange: "E" }))?.field).toBe("loadRange");
    expect(refusal(item({ designation: "LT265/75R16", extraLoad: false }))?.field).toBe("loadRange");
    expect(refusal(item({ designation: "LT265/75R16", loadRange: "E" }))?.field).toBe("extraLoad");
    expect(refusal(item({ designation: "215/65R16C", loadIndex: 107, loadIndexDual: 109, extraLoad: false }))?.field).toBe("loadIndexDual");
    expect(refusal(item({ loadIndexDual: 113 }))?.field).toBe("loadIndexDual");
  });

  it("refuses a negative price or quantity and a SKU with spaces", () => {
    expect(refusal(item({ priceCents: -1 }))?.field).toBe("priceCents");
    expect(refusal(item({ quantity: -2 }))?.field).toBe("quantity");
    expect(refusal(item({ sku: "TST 1" }))?.field).toBe("sku");
  });
});
