import { and, count, countDistinct, eq, gt, like, min } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { auditEvent, stockItem, tireLine, user } from "@/db/schema";
import { seedCatalog } from "@/lib/demo/catalog";
import { DEMO_CATALOG } from "@/lib/demo/catalog-stock";
import { generatedCsvItems } from "../../fixtures/generated-csv-items";
import { exportCatalogCsv } from "@/lib/catalog-csv/export";
import { importCatalogCsv } from "@/lib/catalog-csv/import";
import type { ImportMode } from "@/lib/catalog-csv/import-report";
import { writeCatalogCsv, type CatalogCsvItem } from "@/lib/catalog-csv/write-file";
import { catalogFiltersSchema } from "@/lib/counter/catalog-filters";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const staff = { id: "staff-csv", email: "counter@example.test" };
const ROWS = 10_000;

const generatedItems = (prefix: string): CatalogCsvItem[] => generatedCsvItems(ROWS, { seed: 5, skuPrefix: prefix });

describe.each(testDatabaseKinds)("catalog CSV import on %s", (kind) => {
  let database: TestDatabase;
  let retiredSku = "";
  const run = (text: string, mode: ImportMode = "all-or-nothing", name = "stock.csv") => importCatalogCsv(database.db, { name, text }, mode, staff);
  const report = async (text: string, mode?: ImportMode) => {
    const result = await run(text, mode);
    if (!result.ok) throw new Error(result.message);
    return result.report;
  };
  const countWhere = async (prefix: string) =>
    (await database.db.select({ n: count() }).from(stockItem).where(like(stockItem.sku, `${prefix}-%`)))[0]?.n ?? 0;
  const importAudits = () => database.db.select().from(auditEvent).where(eq(auditEvent.action, "catalog_import"));

  beforeAll(async () => {
    database = await openTestDatabase(kind);
    await database.db.insert(user).values({ ...staff, name: "Counter", role: "staff" });
    await database.db.transaction((tx) => seedCatalog(tx, DEMO_CATALOG));
    const [retired] = await database.db.select({ sku: stockItem.sku }).from(stockItem).where(eq(stockItem.retired, true)).limit(1);
    retiredSku = retired?.sku ?? "";
  });
  afterAll(async () => {
    await database?.close();
  });

  it("imports a 10,000-row file in one transaction, with one audit entry", async () => {
    expect(await report(writeCatalogCsv(generatedItems("IMP")))).toEqual({ added: ROWS, updated: 0, unchanged: 0, refused: [], written: true });
    // now() is the transaction's start: every row and the audit entry carry the same instant.
    const [stamps] = await database.db
      .select({ rows: count(), instants: countDistinct(stockItem.createdAt), at: min(stockItem.createdAt) })
      .from(stockItem)
      .where(like(stockItem.sku, "IMP-%"));
    expect(stamps).toMatchObject({ rows: ROWS, instants: 1 });
    const audits = await importAudits();
    expect(audits).toHaveLength(1);
    expect(audits[0]).toMatchObject({ actorId: staff.id, actorEmail: staff.email, subject: "stock.csv", at: stamps?.at });
    expect(audits[0]?.summary).toBe("Imported 10,000 rows: 10,000 added, 0 updated, 0 unchanged, 0 refused");
  });

  it("changes nothing when the same file comes again", async () => {
    const items = generatedItems("IMP");
    expect(await report(writeCatalogCsv(items))).toEqual({ added: 0, updated: 0, unchanged: ROWS, refused: [], written: false });
    expect(await importAudits()).toHaveLength(1);
  });

  describe("a file with a few bad rows", () => {
    const items = generatedItems("MIX");
    const bad = (index: number, changes: Partial<CatalogCsvItem>) => Object.assign(items[index]!, changes);
    let text = "";
    beforeAll(() => {
      bad(9, { loadIndex: 999 });
      bad(99, { line: "No Such Line" });
      bad(4999, { sku: retiredSku });
      bad(8000, { loadRange: "Q" });
      text = writeCatalogCsv(items).replace(/^(MIX-07000,.*),\d+\.\d\d,(\d+)\r$/m, '$1,"12,50",$2\r');
    });
    const expectedRefusals = () => [
      { line: 11, column: "load_index", reason: "load index 999 is outside the published table (0–279)" },
      {
        line: 101,
        column: "line",
        reason: `the brand "${items[99]?.brand}" has no line "No Such Line"; add it on the Lines page (Counter → Lines), or correct the name`,
      },
      { line: 5001, column: "sku", reason: `SKU "${retiredSku}" is retired; give the item a new SKU` },
      { line: 7002, column: "price", reason: 'price "12,50" is not an amount in dollars such as 129.99' },
      { line: 8002, column: "load_range", reason: expect.stringContaining('load range "Q"') },
    ];

    it("writes nothing in all-or-nothing mode and names each bad row's line, column and reason", async () => {
      expect(retiredSku).not.toBe("");
      expect(await report(text)).toEqual({ added: ROWS - 5, updated: 0, unchanged: 0, refused: expectedRefusals(), written: false });
      expect(await countWhere("MIX")).toBe(0);
      expect(await importAudits()).toHaveLength(1);
    });

    it("writes only the good rows in valid-rows mode, and leaves the retired item as it was", async () => {
      const [before] = await database.db.select().from(stockItem).where(eq(stockItem.sku, retiredSku));
      expect(await report(text, "valid-rows")).toEqual({ added: ROWS - 5, updated: 0, unchanged: 0, refused: expectedRefusals(), written: true });
      expect(await countWhere("MIX")).toBe(ROWS - 5);
      expect((await database.db.select().from(stockItem).where(eq(stockItem.sku, retiredSku)))[0]).toEqual(before);
      const audits = await importAudits();
      expect(audits.at(-1)?.summary).toBe("Imported 10,000 rows: 9,995 added, 0 updated, 0 unchanged, 5 refused");
    });
  });

  it("updates the items whose price, quantity or line changed, and counts the rest unchanged", async () => {
    const items = generatedItems("IMP");
    items[0]!.priceCents += 1;
    items[1]!.quantity += 3;
    Object.assign(items[3]!, items[3]!.brand === "Kaldren" ? { brand: "Ashlund", line: "Ivelle Tour" } : { brand: "Kaldren", line: "Orrick Tour" });
    // A line named in other letters is the same line.
    items[2]!.line = items[2]!.line.toUpperCase();
    expect(await report(writeCatalogCsv(items))).toEqual({ added: 0, updated: 3, unchanged: ROWS - 3, refused: [], written: true });
    const [first] = await database.db.select().from(stockItem).where(eq(stockItem.sku, "IMP-00000"));
    expect(first?.priceCents).toBe(items[0]!.priceCents);
    expect(first?.updatedAt.getTime()).toBeGreaterThan(first?.createdAt.getTime() ?? Infinity);
  });

  it("exports the catalog as a file the import takes back unchanged", async () => {
    const [current] = await database.db.select({ n: count() }).from(stockItem).where(eq(stockItem.retired, false));
    const exported = await exportCatalogCsv(database.db, catalogFiltersSchema.parse({}));
    expect(exported.split("\r\n")[0]).toBe("sku,brand,line,size,load_index,load_index_dual,speed_symbol,load_range,extra_load,price,quantity");
    expect(await report(exported)).toEqual({ added: 0, updated: 0, unchanged: current?.n, refused: [], written: false });

    // The Counter's filters apply; its sort and page do not: every match, in SKU order.
    const winter = await exportCatalogCsv(database.db, catalogFiltersSchema.parse({ season: "winter", stock: "in", sort: "price", page: "3" }));
    const skus = winter.split("\r\n").slice(1).map((line) => line.split(",")[0] ?? "");
    const [matching] = await database.db
      .select({ n: count() })
      .from(stockItem)
      .innerJoin(tireLine, eq(stockItem.lineId, tireLine.id))
      .where(and(eq(stockItem.retired, false), eq(tireLine.season, "winter"), gt(stockItem.quantityOnHand, 0)));
    expect(skus.length).toBe(matching?.n);
    expect(skus.length).toBeGreaterThan(50);
    expect(skus).toEqual([...skus].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0)));
  });

  it("refuses a file that is not a CSV, writing nothing", async () => {
    expect(await run("\u0000\u0001PK")).toEqual({ ok: false, message: expect.stringContaining("This file is not a CSV") });
  });
});
