import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { brand, stockItem, tireLine } from "@/db/schema";
import { createStockItem, retireStockItem, updateStockItem } from "@/lib/catalog/stock-writes";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const item = { sku: "LMB-1", brand: "lumbrel", line: "HAYWARD TRAIL", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "R", loadRange: "E", extraLoad: false, priceCents: 21_000, quantity: 2 };

describe.each(testDatabaseKinds)("stock writes on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    const [made] = await database.db.insert(brand).values({ name: "Lumbrel" }).returning({ id: brand.id });
    await database.db.insert(tireLine).values([
      { brandId: made?.id ?? 0, name: "Hayward Trail", season: "all-season", terrain: "all-terrain", threePeak: true },
      { brandId: made?.id ?? 0, name: "Hayward Mud", season: "all-season", terrain: "mud-terrain" },
    ]);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("create, change and retire an item, finding its line in any letter case", async () => {
    const created = await createStockItem(database.db, item);
    expect(created).toMatchObject({ ok: true, tire: { sku: "LMB-1", brand: "Lumbrel", line: "Hayward Trail", loadRange: "E", threePeak: true } });
    expect(await createStockItem(database.db, item)).toMatchObject({ ok: false, code: "already_exists" });

    const changed = await updateStockItem(database.db, "LMB-1", { line: "hayward mud", loadRange: null });
    expect(changed).toMatchObject({ ok: false, code: "invalid_parameter" });
    const moved = await updateStockItem(database.db, "LMB-1", { line: "hayward mud", quantity: 0 });
    expect(moved).toMatchObject({ ok: true, tire: { line: "Hayward Mud", terrain: "mud-terrain", inStock: false, loadIndexDual: 120 } });

    expect(await retireStockItem(database.db, "LMB-1")).toBe(true);
    expect(await retireStockItem(database.db, "LMB-1")).toBe(false);
    const rows = await database.db.select({ retired: stockItem.retired }).from(stockItem).where(eq(stockItem.sku, "LMB-1"));
    expect(rows).toEqual([{ retired: true }]);
  });
});
