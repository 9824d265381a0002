import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { stockFitment, stockItem } from "@/db/schema";
import { planImport, readCatalogLines } from "@/lib/catalog-csv/import-plan";
import { applyWrites, CatalogMovedError, prepareWrites } from "@/lib/catalog-csv/import-write";
import { judgeRowLines, lineJudge } from "@/lib/catalog-csv/judge-lines";
import { readCatalogCsv } from "@/lib/catalog-csv/read-file";
import { writeCatalogCsv, type CatalogCsvItem } from "@/lib/catalog-csv/write-file";
import { isCheckViolation } from "@/lib/database/unique-violation";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { seedFixture } from "./fixtures";

const file = (items: readonly Partial<CatalogCsvItem>[]) =>
  writeCatalogCsv(
    items.map((item, i) => ({
      sku: `IW-${i}`, brand: "Testwell", line: "Fixture touring", designation: "205/55R16", loadIndex: 91, loadIndexDual: null,
      speedSymbol: "H", loadRange: null, extraLoad: false, priceCents: 10_000, quantity: 4, ...item,
    })),
  );

describe.each(testDatabaseKinds)("writing a planned import on %s", (kind) => {
  let database: TestDatabase;

  async function planned(text: string) {
    const read = readCatalogCsv(text);
    if (!read.ok) throw new Error(read.message);
    const plan = await planImport(database.db, judgeRowLines(read.rows, lineJudge(await readCatalogLines(database.db))).lined);
    return { plan, writes: await prepareWrites(database.db, plan) };
  }
  const write = (writes: Awaited<ReturnType<typeof planned>>["writes"]) => database.db.transaction((tx) => applyWrites(tx, writes));
  const priceOf = async (sku: string) => (await database.db.select({ price: stockItem.priceCents }).from(stockItem).where(eq(stockItem.sku, sku)))[0]?.price;

  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  beforeEach(async () => {
    await database.reset();
    await seedFixture(database.db, [{ sku: "IW-0", designation: "205/55R16", loadIndex: 91, speedSymbol: "H" }]);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("writes what was planned, each new item on the fitment of its facts", async () => {
    const { plan, writes } = await planned(file([{ priceCents: 12_000 }, { designation: "225/45R17", loadIndex: 94, extraLoad: true }]));
    expect([plan.added.length, plan.updated.length]).toEqual([1, 1]);
    await write(writes);
    expect(await priceOf("IW-0")).toBe(12_000);
    const fitments = await database.db.select({ items: stockFitment.itemCount }).from(stockFitment).orderBy(stockFitment.id);
    expect(fitments.map((fitment) => fitment.items)).toEqual([1, 1]);
  });

  it("undoes the whole write when an item changed after the plan, leaving the change as it was made", async () => {
    const { writes } = await planned(file([{ priceCents: 12_000 }, { sku: "IW-NEW" }]));
    await database.db.update(stockItem).set({ priceCents: 11_000 }).where(eq(stockItem.sku, "IW-0"));
    await expect(write(writes)).rejects.toBeInstanceOf(CatalogMovedError);
    expect(await priceOf("IW-0")).toBe(11_000);
    expect(await priceOf("IW-NEW")).toBeUndefined();
  });

  it("undoes the whole write when a planned new SKU was added by someone else meanwhile", async () => {
    const { writes } = await planned(file([{ priceCents: 12_000 }, { sku: "IW-NEW" }]));
    await database.db.execute(sql`insert into stock_item (sku, line_id, designation, size_kind, section_width_mm, aspect_ratio, rim_diameter_in, construction, zr,
        commercial, run_flat, load_index, speed_symbol, speed_rank, extra_load, service_type, overall_diameter_mm, price_cents, quantity_on_hand)
      select 'IW-NEW', line_id, designation, size_kind, section_width_mm, aspect_ratio, rim_diameter_in, construction, zr, commercial, run_flat,
        load_index, speed_symbol, speed_rank, extra_load, service_type, overall_diameter_mm, 9000, 1 from stock_item where sku = 'IW-0'`);
    await expect(write(writes)).rejects.toBeInstanceOf(CatalogMovedError);
    expect([await priceOf("IW-0"), await priceOf("IW-NEW")]).toEqual([10_000, 9_000]);
  });

  it("refuses a stock row that names a fitment of other facts, inserted or updated", async () => {
    const [other] = await database.db
      .insert(stockFitment)
      .values({ rimDiameterIn: 17, serviceType: "passenger", construction: "R", runFlat: false, overallDiameterMm: 600, loadIndex: 94, speedRank: 10 })
      .returning({ id: stockFitment.id });
    const refused = (error: unknown) => isCheckViolation(error, "stock_item_fitment_facts");
    const update = database.db.update(stockItem).set({ fitmentId: other!.id }).where(eq(stockItem.sku, "IW-0"));
    expect(await update.then(() => "written", (error: unknown) => refused(error))).toBe(true);
    const insert = database.db.execute(sql`insert into stock_item (sku, line_id, designation, size_kind, section_width_mm, aspect_ratio, rim_diameter_in, construction, zr,
        commercial, run_flat, load_index, speed_symbol, speed_rank, extra_load, service_type, overall_diameter_mm, price_cents, quantity_on_hand, fitment_id)
      select 'IW-WRONG', line_id, designation, size_kind, section_width_mm, aspect_ratio, rim_diameter_in, construction, zr, commercial, run_flat,
        load_index, speed_symbol, speed_rank, extra_load, service_type, overall_diameter_mm, 9000, 1, ${other!.id} from stock_item where sku = 'IW-0'`);
    expect(await insert.then(() => "written", (error: unknown) => refused(error))).toBe(true);
  });
});
