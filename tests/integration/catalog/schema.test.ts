import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { brand, stockItem, tireLine, type NewStockItem } from "@/db/schema";
import { buildStockRow } from "@/lib/stock/build-stock-row";
import { insertStockRows } from "@/lib/stock/insert-stock-rows";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

describe.each(testDatabaseKinds)("catalog tables on %s", (kind) => {
  let database: TestDatabase;
  let validRow: NewStockItem;

  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  afterAll(async () => {
    await database?.close();
  });
  beforeEach(async () => {
    await database.reset();
    const [made] = await database.db.insert(brand).values({ name: "Testwell" }).returning({ id: brand.id });
    const [line] = await database.db
      .insert(tireLine)
      .values({ brandId: made!.id, name: "Fixture touring", season: "all-season", terrain: "highway" })
      .returning({ id: tireLine.id, runFlat: tireLine.runFlat });
    const built = buildStockRow({ sku: "OK-1", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "R", loadRange: "E", priceCents: 21_999, quantity: 8 }, line!);
    if (!built.ok) throw new Error(built.problem.reason);
    validRow = built.row;
  });

  it("stores a row built by the write path, decomposed", async () => {
    await insertStockRows(database.db, [validRow]);
    const [row] = await database.db
      .select({ designation: stockItem.designation, serviceType: stockItem.serviceType, loadRangePly: stockItem.loadRangePly, overallDiameterMm: stockItem.overallDiameterMm })
      .from(stockItem);
    expect(row).toEqual({ designation: "LT265/75R16", serviceType: "LT", loadRangePly: 10, overallDiameterMm: 803.9 });
  });

  it.each<[string, Partial<NewStockItem>]>([
    ["a negative price", { priceCents: -1 }],
    ["a negative quantity", { quantityOnHand: -1 }],
    ["a load index above 279 (ISO 4000-1 load index table)", { loadIndex: 280 }],
    ["a negative load index", { loadIndex: -1 }],
    ["a dual load index above the single one", { loadIndexDual: 124 }],
    ["a rim outside 8–30 in", { rimDiameterIn: 31 }],
    ["an aspect ratio outside 20–95", { aspectRatio: 10 }],
    ["an unknown service type", { serviceType: "bus" as NewStockItem["serviceType"] }],
    ["a load range without its ply rating", { loadRangePly: null }],
    ["a SKU with a space", { sku: "OK 1" }],
    ["a zero overall diameter", { overallDiameterMm: 0 }],
  ])("refuses %s", async (_, change) => {
    await expect(database.db.insert(stockItem).values({ ...validRow, ...change })).rejects.toThrow();
  });

  it("refuses a second item with the same SKU, and a multi-row write fails as a whole", async () => {
    await expect(insertStockRows(database.db, [validRow, { ...validRow, sku: "OK-2" }, validRow])).rejects.toThrow();
    expect(await database.db.$count(stockItem)).toBe(0);
  });

  it("refuses incomplete UTQG grades and an unknown season", async () => {
    const [made] = await database.db.select({ id: brand.id }).from(brand);
    await expect(
      database.db.insert(tireLine).values({ brandId: made!.id, name: "Half graded", season: "summer", terrain: "highway", utqgTreadwear: 300 }),
    ).rejects.toThrow();
    await expect(
      database.db.insert(tireLine).values({ brandId: made!.id, name: "Odd season", season: "monsoon" as "summer", terrain: "highway" }),
    ).rejects.toThrow();
  });
});
