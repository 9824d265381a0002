import fc from "fast-check";
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { stockFitment, stockItem, user } from "@/db/schema";
import { importCatalogCsv } from "@/lib/catalog-csv/import";
import { sellableQuantity } from "@/lib/catalog/columns";
import { retireStockItem, updateStockItem } from "@/lib/stock/item-writes";
import { speedSymbolRank } from "@/lib/tire";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { seedFixture, type FixtureItem } from "./fixtures";

const staff = { id: "staff-1", email: "staff@example.test" };

/**
 * Fitments whose counts differ from a fresh count of their items, and items whose fitment holds other
 * facts. In stock means what every query means by it: at least one to sell now (`sellableQuantity`),
 * so a change to that definition that the triggers do not follow shows here.
 */
async function inconsistencies(database: TestDatabase) {
  const { rows } = (await database.db.execute(sql`
    select 'count' as problem, f.id::text as subject from ${stockFitment} f
    left join ${stockItem} on ${stockItem.fitmentId} = f.id and not ${stockItem.retired}
    group by f.id, f.item_count, f.in_stock_count
    having f.item_count <> count(${stockItem.id}) or f.in_stock_count <> count(${stockItem.id}) filter (where ${sellableQuantity} >= 1)
    union all
    select 'facts', s.sku from ${stockItem} s join ${stockFitment} f on f.id = s.fitment_id
    where (s.rim_diameter_in, s.service_type, s.construction, s.run_flat, s.overall_diameter_mm, s.load_index, s.speed_rank)
      is distinct from (f.rim_diameter_in, f.service_type, f.construction, f.run_flat, f.overall_diameter_mm, f.load_index, f.speed_rank)
      or s.load_index_dual is distinct from f.load_index_dual or s.load_range_ply is distinct from f.load_range_ply`)) as unknown as {
    rows: { problem: string; subject: string }[];
  };
  return rows;
}

const SIZES = [
  { designation: "205/55R16", loadIndex: 91 },
  { designation: "205/55R16", loadIndex: 94, extraLoad: true },
  { designation: "225/45R17", loadIndex: 94, extraLoad: true },
  { designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "E" as const },
];

const item = (n: number, size: number, speedSymbol: string, quantity: number): FixtureItem => ({
  sku: `FT-${n}`,
  speedSymbol,
  quantity,
  ...SIZES[size % SIZES.length]!,
});

type Write =
  | { kind: "price"; sku: number; priceCents: number }
  | { kind: "quantity"; sku: number; quantity: number }
  | { kind: "speed"; sku: number; speedSymbol: string }
  | { kind: "size"; sku: number; size: number }
  | { kind: "retire"; sku: number }
  | { kind: "unretire"; sku: number }
  | { kind: "delete"; sku: number }
  | { kind: "bulk-quantity"; quantity: number };

const sku = fc.integer({ min: 0, max: 11 });
const write: fc.Arbitrary<Write> = fc.oneof(
  fc.record({ kind: fc.constant("price" as const), sku, priceCents: fc.integer({ min: 1, max: 40_000 }) }),
  fc.record({ kind: fc.constant("quantity" as const), sku, quantity: fc.integer({ min: 0, max: 3 }) }),
  fc.record({ kind: fc.constant("speed" as const), sku, speedSymbol: fc.constantFrom("T", "H", "V") }),
  fc.record({ kind: fc.constant("size" as const), sku, size: fc.integer({ min: 0, max: 2 }) }),
  fc.record({ kind: fc.constant("retire" as const), sku }),
  fc.record({ kind: fc.constant("unretire" as const), sku }),
  fc.record({ kind: fc.constant("delete" as const), sku }),
  fc.record({ kind: fc.constant("bulk-quantity" as const), quantity: fc.integer({ min: 0, max: 2 }) }),
);

/** Each write as staff or a script would make it: through the write path where there is one, else straight in SQL. */
async function apply(database: TestDatabase, change: Write): Promise<void> {
  const { db } = database;
  const target = "sku" in change ? `FT-${change.sku}` : "";
  const size = change.kind === "size" ? SIZES[change.size]! : undefined;
  switch (change.kind) {
    case "price":
      return void (await updateStockItem(db, target, { priceCents: change.priceCents }, staff));
    case "quantity":
      return void (await updateStockItem(db, target, { quantity: change.quantity }, staff));
    case "speed":
      return void (await updateStockItem(db, target, { speedSymbol: change.speedSymbol }, staff));
    case "size":
      return void (await updateStockItem(db, target, { designation: size!.designation, loadIndex: size!.loadIndex, extraLoad: size!.extraLoad ?? false }, staff));
    case "retire":
      return void (await retireStockItem(db, target, staff));
    case "unretire":
      return void (await db.update(stockItem).set({ retired: false }).where(eq(stockItem.sku, target)));
    case "delete":
      return void (await db.delete(stockItem).where(eq(stockItem.sku, target)));
    case "bulk-quantity":
      return void (await db.update(stockItem).set({ quantityOnHand: change.quantity }).where(sql`${stockItem.sku} like 'FT-1%'`));
  }
}

describe.each(testDatabaseKinds)("stock fitments on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  afterAll(async () => {
    await database?.close();
  });
  const reset = async () => {
    await database.reset();
    await database.db.insert(user).values({ ...staff, name: "Counter", role: "staff" });
  };
  beforeEach(reset);

  it("gives items with the same rule facts one fitment, counting current items and those on hand", async () => {
    await seedFixture(database.db, [item(1, 0, "H", 4), item(2, 0, "H", 0), item(3, 0, "V", 2), { ...item(4, 0, "H", 5), retired: true }, item(5, 3, "R", 1)]);
    const fitments = await database.db
      .select({ speedRank: stockFitment.speedRank, loadRangePly: stockFitment.loadRangePly, itemCount: stockFitment.itemCount, inStockCount: stockFitment.inStockCount })
      .from(stockFitment)
      .orderBy(stockFitment.id);
    expect(fitments).toEqual([
      { speedRank: speedSymbolRank("H"), loadRangePly: null, itemCount: 2, inStockCount: 1 },
      { speedRank: speedSymbolRank("V"), loadRangePly: null, itemCount: 1, inStockCount: 1 },
      { speedRank: speedSymbolRank("R"), loadRangePly: 10, itemCount: 1, inStockCount: 1 },
    ]);
  });

  it("keeps every count right through any sequence of edits, retirements, deletions and bulk updates", async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(write, { minLength: 1, maxLength: 12 }), async (writes) => {
        await reset();
        await seedFixture(database.db, Array.from({ length: 12 }, (_, n) => item(n, n, n % 3 === 0 ? "V" : "H", n % 4)));
        for (const change of writes) await apply(database, change);
        expect(await inconsistencies(database)).toEqual([]);
      }),
      { seed: 20_261_202, numRuns: 25 },
    );
  });

  it("counts what a CSV import adds and rewrites, in the same transaction", async () => {
    await seedFixture(database.db, [item(1, 0, "H", 4), item(2, 1, "V", 0)]);
    const header = "sku,brand,line,size,load_index,load_index_dual,speed_symbol,load_range,extra_load,price,quantity";
    const csv = [header, "FT-1,Testwell,Fixture touring,225/45R17,94,,W,,yes,129.00,0", "FT-9,Testwell,Fixture touring,205/55R16,91,,H,,no,99.00,3"].join("\n");
    const imported = await importCatalogCsv(database.db, { name: "stock.csv", text: csv }, "all-or-nothing", staff);
    expect(imported.ok && imported.report.written).toBe(true);
    expect(await inconsistencies(database)).toEqual([]);
    const [fitment] = await database.db
      .select({ itemCount: stockFitment.itemCount, inStockCount: stockFitment.inStockCount })
      .from(stockFitment)
      .innerJoin(stockItem, eq(stockItem.fitmentId, stockFitment.id))
      .where(eq(stockItem.sku, "FT-1"));
    expect(fitment).toEqual({ itemCount: 1, inStockCount: 0 });
  });

  it("empties the fitments when the stock table is truncated", async () => {
    await seedFixture(database.db, [item(1, 0, "H", 4)]);
    await database.db.execute(sql`truncate ${stockItem} cascade`);
    expect(await database.db.select({ id: stockFitment.id }).from(stockFitment)).toEqual([]);
  });
});
