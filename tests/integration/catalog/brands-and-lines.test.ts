import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { checkCsvFile } from "@/components/counter/import-csv-check";
import { stockItem, user } from "@/db/schema";
import { createBrand, renameBrand } from "@/lib/brands/brand-writes";
import { createLine, updateLine } from "@/lib/brands/line-writes";
import { listBrands } from "@/lib/brands/queries";
import { listCatalog } from "@/lib/catalog/list-catalog";
import { importCatalogCsv } from "@/lib/catalog-csv/import";
import { readCatalogLines } from "@/lib/catalog-csv/import-plan";
import { writeCatalogCsv, type CatalogCsvItem } from "@/lib/catalog-csv/write-file";
import { createStockItem, updateStockItem } from "@/lib/stock/item-writes";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const staff = { id: "staff-lines", email: "lines@example.test" };
const item = { brand: "Lumbrel", line: "Hayward Trail", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "R", loadRange: "E", extraLoad: false, priceCents: 21_000, quantity: 2 };
const csvItem = (sku: string, line: string, priceCents = 21_000): CatalogCsvItem => ({ ...item, sku, line, priceCents });
const retiredMessage =
  'The line "Lumbrel Hayward Trail" is retired and takes no new items; un-retire it on the Lines page (Counter → Lines), or pick another line.';

describe.each(testDatabaseKinds)("brands and lines on %s", (kind) => {
  let database: TestDatabase;
  let trailId = 0;
  const tireOf = async (sku: string) => (await listCatalog(database.db, { afterSku: null, limit: 500 })).items.find((tire) => tire.sku === sku);

  beforeAll(async () => {
    database = await openTestDatabase(kind);
    await database.db.insert(user).values({ ...staff, name: "Lines", role: "staff" });
    const made = await createBrand(database.db, { name: "Lumbrel" }, staff);
    if (!made.ok) throw new Error(made.message);
    const line = (name: string, terrain: "all-terrain" | "mud-terrain", treadDepth32: number | null) =>
      createLine(database.db, made.value.id, { name, season: "all-season", terrain, threePeak: false, treadDepth32 }, staff);
    const trail = await line("Hayward Trail", "all-terrain", 15);
    if (!trail.ok) throw new Error(trail.message);
    trailId = trail.value.id;
    await line("Hayward Mud", "mud-terrain", null);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("lets the database's unique index decide between two brands of one name, whatever their case", async () => {
    const [first, second] = await Promise.all([createBrand(database.db, { name: "Tessaly" }, staff), createBrand(database.db, { name: "TESSALY" }, staff)]);
    expect([first.ok, second.ok].sort()).toEqual([false, true]);
    expect([first, second].find((result) => !result.ok)).toMatchObject({ code: "already_exists", field: "name" });
    const tessaly = (await listBrands(database.db)).brands.find((brand) => brand.name.toLowerCase() === "tessaly")!;
    expect(await renameBrand(database.db, tessaly.id, { name: "lumbrel" }, staff)).toMatchObject({ ok: false, code: "already_exists" });
    expect(await createLine(database.db, tessaly.id, { name: "Hayward Trail", season: "winter", terrain: "highway", threePeak: true }, staff)).toMatchObject({ ok: true });
  });

  it("gives a Tire the item's own tread depth, else its line's, else none", async () => {
    expect(await createStockItem(database.db, { ...item, sku: "LMB-1" }, staff)).toMatchObject({ ok: true, tire: { treadDepth32: 15 } });
    expect(await createStockItem(database.db, { ...item, sku: "LMB-2", treadDepth32: 17 }, staff)).toMatchObject({ ok: true, tire: { treadDepth32: 17 } });
    expect(await createStockItem(database.db, { ...item, sku: "LMB-3", line: "Hayward Mud" }, staff)).toMatchObject({ ok: true, tire: { treadDepth32: null } });
    const cleared = await updateStockItem(database.db, "LMB-2", { treadDepth32: null }, staff);
    expect(cleared).toMatchObject({ ok: true, tire: { treadDepth32: 15 } });
    expect(await updateStockItem(database.db, "LMB-3", { treadDepth32: 19 }, staff)).toMatchObject({ ok: true, tire: { treadDepth32: 19 } });
  });

  it("refuses a new item on a retired line, and a move onto one, but keeps, lists and updates the items it has", async () => {
    expect(await updateLine(database.db, trailId, { retired: true }, staff)).toMatchObject({ ok: true, value: { retired: true } });
    expect(await createStockItem(database.db, { ...item, sku: "LMB-4" }, staff)).toEqual({ ok: false, code: "line_retired", message: retiredMessage, field: "line" });
    expect(await updateStockItem(database.db, "LMB-3", { line: "hayward trail" }, staff)).toMatchObject({ ok: false, code: "line_retired", field: "line" });
    expect(await updateStockItem(database.db, "LMB-1", { priceCents: 19_900 }, staff)).toMatchObject({ ok: true, tire: { line: "Hayward Trail", priceCents: 19_900 } });
    expect(await tireOf("LMB-1")).toMatchObject({ line: "Hayward Trail", inStock: true });
  });

  it("judges a CSV's brands and lines alike in the browser's preview and on the server", async () => {
    const items = [
      csvItem("LMB-1", "Hayward Trail", 18_900), // already on the retired line: updated
      csvItem("LMB-5", "hayward trail"), // new on the retired line: refused
      csvItem("LMB-3", "Hayward Trail"), // moving onto the retired line: refused
      csvItem("LMB-6", "Hayward Marsh"),
      { ...csvItem("LMB-7", "Hayward Mud"), brand: "Nobrand" },
      csvItem("LMB-8", "HAYWARD MUD"),
    ];
    const text = writeCatalogCsv(items);
    const preview = await checkCsvFile(new File([text], "lines.csv", { type: "text/csv" }), await readCatalogLines(database.db), () => {});
    const result = await importCatalogCsv(database.db, { name: "lines.csv", text }, "valid-rows", staff);
    if (!result.ok) throw new Error(result.message);
    expect(result.report).toMatchObject({ added: 1, updated: 1, unchanged: 0, written: true });
    expect(result.report.refused.map(({ line, column }) => [line, column])).toEqual([[3, "line"], [4, "line"], [5, "line"], [6, "brand"]]);
    expect(result.report.refused[0]?.reason).toBe(
      'the line "Lumbrel Hayward Trail" is retired and takes no new items; un-retire it on the Lines page (Counter → Lines), or pick another line',
    );
    expect(preview.problems).toEqual(result.report.refused);
    expect(preview).toMatchObject({ rowsRead: 6, validRows: 2, problemRows: 4 });
    const [kept] = await database.db.select({ priceCents: stockItem.priceCents }).from(stockItem).where(eq(stockItem.sku, "LMB-1"));
    expect(kept?.priceCents).toBe(18_900);
  });

  it("takes new items again once the line is un-retired", async () => {
    expect(await updateLine(database.db, trailId, { retired: false }, staff)).toMatchObject({ ok: true, value: { retired: false } });
    expect(await createStockItem(database.db, { ...item, sku: "LMB-4" }, staff)).toMatchObject({ ok: true, tire: { line: "Hayward Trail" } });
  });
});
