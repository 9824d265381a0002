import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { catalogFiltersSchema, type CatalogFilters } from "@/lib/counter/catalog-filters";
import { CATALOG_TABLE_PAGE_SIZE, catalogQueryString, getCatalogTablePage, readCatalogFilters } from "@/lib/counter/catalog-table";
import { listBrands } from "@/lib/brands/queries";
import { getEditableItem } from "@/lib/counter/queries";
import { seedFixture, skus, type FixtureItem } from "../catalog/fixtures";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const filters = (values: Record<string, unknown> = {}): CatalogFilters => catalogFiltersSchema.parse(values);

// 120 items in two rims, three prices (many ties), some out of stock, one retired.
const manyItems: FixtureItem[] = Array.from({ length: 120 }, (_, index) => ({
  sku: `T-${String(index).padStart(3, "0")}`,
  designation: index % 2 === 0 ? "205/55R16" : "225/45R17",
  loadIndex: 91,
  speedSymbol: "V",
  priceCents: 10_000 + (index % 3) * 1_000,
  quantity: index % 4 === 0 ? 0 : 4,
  line: index % 5 === 0 ? "winter" : "touring",
}));
const specialItems: FixtureItem[] = [
  { sku: "a-lower", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "R", loadRange: "E", line: "trail", priceCents: 25_000 },
  { sku: "Z-upper", designation: "265/70R17", loadIndex: 115, speedSymbol: "T", line: "trail", priceCents: 25_000 },
  { sku: "OLD-1", designation: "205/55R16", loadIndex: 91, speedSymbol: "V", retired: true },
];

describe.each(testDatabaseKinds)("the Counter's catalog table on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    await seedFixture(database.db, [...manyItems, ...specialItems]);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("pages 50 rows at a time with one total, leaving retired items out", async () => {
    const first = await getCatalogTablePage(database.db, filters());
    expect(first).toMatchObject({ total: 122, page: 1, pageCount: 3 });
    expect(first.rows).toHaveLength(CATALOG_TABLE_PAGE_SIZE);
    const third = await getCatalogTablePage(database.db, filters({ page: 3 }));
    expect(third.rows).toHaveLength(22);
    const all = [...first.rows, ...(await getCatalogTablePage(database.db, filters({ page: 2 }))).rows, ...third.rows];
    expect(new Set(skus(all)).size).toBe(122);
    expect(skus(all)).not.toContain("OLD-1");
    // Plain character order: upper case before lower case.
    expect(skus(all).slice(0, 2)).toEqual(["T-000", "T-001"]);
    expect(skus(all).slice(-2)).toEqual(["Z-upper", "a-lower"]);
  });

  it("shows the columns a row needs, with the line's season and terrain, and how many can be sold now beside the count staff edit", async () => {
    const { rows } = await getCatalogTablePage(database.db, filters({ q: "a-lower" }));
    expect(rows).toEqual([
      {
        sku: "a-lower", brand: "Testwell", line: "Fixture trail", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120,
        speedSymbol: "R", loadRange: "E", extraLoad: false, season: "all-season", terrain: "all-terrain", priceCents: 25_000, quantity: 4, sellable: 4,
      },
    ]);
  });

  it("filters by search text, season, terrain, rim and stock", async () => {
    expect((await getCatalogTablePage(database.db, filters({ q: "225/45 r17" }))).total).toBe(60);
    expect((await getCatalogTablePage(database.db, filters({ q: "fixture WINTER" }))).total).toBe(24);
    expect((await getCatalogTablePage(database.db, filters({ season: "winter", rim: "16" }))).total).toBe(12);
    expect(skus((await getCatalogTablePage(database.db, filters({ terrain: "all-terrain" }))).rows)).toEqual(["Z-upper", "a-lower"]);
    expect((await getCatalogTablePage(database.db, filters({ stock: "out" }))).total).toBe(30);
    expect((await getCatalogTablePage(database.db, filters({ stock: "in", brand: "testwell" }))).total).toBe(92);
    expect(await getCatalogTablePage(database.db, filters({ q: "nothing like this" }))).toMatchObject({ rows: [], total: 0, pageCount: 1 });
  });

  it("sorts by price with ties broken by SKU, the same way on every page", async () => {
    const pages = await Promise.all([1, 2, 3].map((page) => getCatalogTablePage(database.db, filters({ sort: "price", page }))));
    const rows = pages.flatMap((page) => page.rows);
    const expected = [...rows].sort((a, b) => a.priceCents - b.priceCents || (a.sku < b.sku ? -1 : 1));
    expect(skus(rows)).toEqual(skus(expected));
    const descending = (await getCatalogTablePage(database.db, filters({ sort: "price", dir: "desc" }))).rows;
    expect(skus(descending).slice(0, 3)).toEqual(["a-lower", "Z-upper", "T-119"]);
  });

  it("offers each brand with its lines, and finds current items only", async () => {
    const { brands } = await listBrands(database.db);
    expect(brands.map((brand) => ({ name: brand.name, lines: brand.lines.map((line) => line.name) }))).toEqual([
      { name: "Testwell", lines: ["Fixture flat", "Fixture touring", "Fixture trail", "Fixture winter"] },
    ]);
    expect(await getEditableItem(database.db, "a-lower")).toMatchObject({ brand: "Testwell", loadIndexDual: 120, quantity: 4 });
    expect(await getEditableItem(database.db, "OLD-1")).toBeNull();
  });
});

describe("the table's address", () => {
  it("drops values that do not fit and keeps the rest", () => {
    expect(readCatalogFilters({ q: "205", season: "spring", page: "-3", rim: ["17", "18"] })).toEqual(filters({ q: "205", rim: 17 }));
    expect(readCatalogFilters({})).toEqual(filters());
  });

  it("leaves defaults out of links", () => {
    expect(catalogQueryString(filters({ q: "205" }), { page: 2 })).toBe("q=205&page=2");
    expect(catalogQueryString(filters({ sort: "price", dir: "desc", page: 3 }), { page: 1 })).toBe("sort=price&dir=desc");
  });
});
