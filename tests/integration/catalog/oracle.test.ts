import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seedDemoData } from "@/db/seed";
import { seedCatalog } from "@/db/seed/catalog";
import { findAlternatives, type AlternativesOptions } from "@/lib/catalog/alternatives";
import { decodeAlternativesCursor } from "@/lib/catalog/cursor";
import { readOriginal } from "@/lib/catalog/original";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { arbitrarySearch, bruteForce, loadWholeCatalog, type CatalogRow, type Search } from "./brute-force";

const responsesByKind = new Map<string, string[]>();

async function allPages(database: TestDatabase, search: Search) {
  const read = readOriginal(search.original);
  if (!read.ok) throw new Error(read.message);
  const options: AlternativesOptions = { ...search.filters, tolerancePct: search.tolerancePct, sort: search.sort, limit: search.limit, cursor: null };
  const pages = [];
  for (;;) {
    const page = await findAlternatives(database.db, read.original, options);
    pages.push(page);
    if (!page.nextCursor) return pages;
    options.cursor = decodeAlternativesCursor(page.nextCursor);
  }
}

/**
 * Two catalogs: the demo shop's, where most fitments (items that share their rule facts) hold one
 * to three items, and a larger one where products repeat under new SKUs, so that fitments hold
 * dozens and the finder's per-fitment and per-diameter reads both cut their lists short.
 */
const CATALOGS = [
  { name: "the demo catalog", runs: 45, seed: (database: TestDatabase) => seedDemoData(database.db) },
  {
    name: "a catalog of 12,000 items",
    runs: 30,
    seed: (database: TestDatabase) => database.db.transaction((tx) => seedCatalog(tx, { itemCount: 12_000, seed: 5 })),
  },
];

describe.each(testDatabaseKinds)("the finder against a brute-force reading of the rules on %s", (kind) => {
  describe.each(CATALOGS)("in $name", ({ name, runs, seed }) => {
    let database: TestDatabase;
    let catalog: CatalogRow[];

    beforeAll(async () => {
      database = await openTestDatabase(kind);
      await seed(database);
      catalog = await loadWholeCatalog(database.db);
    });
    afterAll(async () => {
      await database?.close();
    });

    it("finds the same tires, in the same order across pages, with the same total and near misses", async () => {
      const responses: string[] = [];
      await fc.assert(
        fc.asyncProperty(arbitrarySearch(catalog), async (search) => {
          const expected = bruteForce(catalog, search);
          const pages = await allPages(database, search);
          responses.push(JSON.stringify(pages));
          const results = pages.flatMap((page) => page.results);
          for (const page of pages) {
            expect(page.total).toBe(expected.results.length);
            expect(page.results.length).toBeLessThanOrEqual(search.limit);
          }
          expect(results.map((tire) => tire.sku)).toEqual(expected.results.map((row) => row.sku));
          expect(results.map((tire) => tire.diameterDiffPct)).toEqual(expected.results.map((row) => row.diffPct));
          expect(results.every((tire) => tire.reasons.length >= 5)).toBe(true);
          const nearMisses = pages[0]?.nearMisses ?? [];
          expect(nearMisses.map((tire) => tire.sku)).toEqual(expected.nearMisses.map((row) => row.sku));
          expect(nearMisses.every((tire) => tire.failed.length >= 1)).toBe(true);
        }),
        { seed: 20_260_612, numRuns: runs },
      );
      responsesByKind.set(`${kind} ${name}`, responses);
    });
  });
});

describe.runIf(testDatabaseKinds.length > 1).each(CATALOGS)("PGlite and the PostgreSQL server, in $name", ({ name }) => {
  it("answer the same searches identically, to the last digit", () => {
    expect(responsesByKind.get(`postgres ${name}`)).toEqual(responsesByKind.get(`pglite ${name}`));
  });
});
