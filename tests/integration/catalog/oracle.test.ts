import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seedDemoData } from "@/lib/demo";
import { seedCatalog } from "@/lib/demo/catalog";
import { findAlternatives, type AlternativesOptions } from "@/lib/alternatives/find-alternatives";
import { decodeAlternativesCursor } from "@/lib/alternatives/cursor";
import { judgedCandidate } from "@/lib/alternatives/judged-candidate";
import { readOriginal, type Original } from "@/lib/alternatives/original";
import { cardTireVerdict } from "@/lib/fit-cards/tire-verdict";
import { isNearMiss, judgeCandidate } from "@/lib/tire";
import { estimateSet } from "@/lib/money/estimate";
import { demoShopCharges } from "@/lib/demo/shop";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { addSingleRatedTruckTires, arbitrarySearch, bruteForce, loadWholeCatalog, passesFilters, type CatalogRow, type Search } from "./brute-force";

const responsesByKind = new Map<string, string[]>();

const demoCharges = demoShopCharges;

function originalOf(search: Search): Original {
  const read = readOriginal(search.original);
  if (!read.ok) throw new Error(read.message);
  return read.original;
}

async function allPages(database: TestDatabase, search: Search) {
  const options: AlternativesOptions = {
    ...search.filters,
    tolerancePct: search.tolerancePct,
    quantity: search.quantity,
    charges: demoCharges,
    sort: search.sort,
    limit: search.limit,
    cursor: null,
  };
  const pages = [];
  for (;;) {
    const page = await findAlternatives(database.db, originalOf(search), options);
    pages.push(page);
    if (!page.nextCursor) return pages;
    options.cursor = decodeAlternativesCursor(page.nextCursor);
  }
}

/** The judge's own reading of every current item that passes the filters: the SKUs it accepts, and those it calls near misses. */
function judgeAll(catalog: readonly CatalogRow[], search: Search, passes: (row: CatalogRow) => boolean) {
  const original = originalOf(search);
  const qualifying = new Set<string>();
  const near = new Set<string>();
  for (const row of catalog) {
    if (row.retired || !passes(row)) continue;
    const verdict = judgeCandidate(original, judgedCandidate(row), { tolerancePct: search.tolerancePct });
    if (verdict.qualifies) qualifying.add(row.sku);
    if (isNearMiss(verdict)) near.add(row.sku);
  }
  return { qualifying, near };
}

/**
 * Two catalogs, each with single-rated and lower-rated copies of some dual-rated truck tires: the demo shop's, where most fitments (items that share their rule facts) hold one
 * to three items, and a larger one where products repeat under new SKUs, so that fitments hold
 * dozens and the finder's per-fitment and per-diameter reads both cut their lists short.
 */
const CATALOGS = [
  { name: "the demo catalog", runs: 60, seed: (database: TestDatabase) => seedDemoData(database.db) },
  {
    name: "a catalog of 12,000 items",
    runs: 40,
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
      await addSingleRatedTruckTires(database.db);
      catalog = await loadWholeCatalog(database.db);
    });
    afterAll(async () => {
      await database?.close();
    });

    it("finds the same tires as the judge and the brute force, in the same order across pages, with the same total and near misses", async () => {
      const responses: string[] = [];
      await fc.assert(
        fc.asyncProperty(arbitrarySearch(catalog), async (search) => {
          const expected = bruteForce(catalog, search);
          const judged = judgeAll(catalog, search, (row) => passesFilters(row, search.filters, search.quantity));
          const pages = await allPages(database, search);
          responses.push(JSON.stringify(pages));
          const results = pages.flatMap((page) => page.results);
          for (const page of pages) {
            expect(page.total).toBe(expected.results.length);
            expect(page.results.length).toBeLessThanOrEqual(search.limit);
          }
          expect(results.map((tire) => tire.sku)).toEqual(expected.results.map((row) => row.sku));
          expect(new Set(results.map((tire) => tire.sku))).toEqual(judged.qualifying);
          expect(results.map((tire) => tire.diameterDiffPct)).toEqual(expected.results.map((row) => row.diffPct));
          expect(results.every((tire) => tire.reasons.length >= 5)).toBe(true);
          // Each result says how many are on hand and what the search's quantity costs.
          const rows = new Map(catalog.map((row) => [row.sku, row]));
          for (const tire of results) {
            expect(tire.quantity).toBe(rows.get(tire.sku)!.quantityOnHand);
            expect(tire.inStock).toBe(tire.quantity >= 1);
            expect(tire.estimate).toEqual(estimateSet(tire.priceCents, search.quantity, demoCharges));
          }
          const nearMisses = pages[0]?.nearMisses ?? [];
          expect(nearMisses.map((tire) => tire.sku)).toEqual(expected.nearMisses.map((row) => row.sku));
          expect(nearMisses.every((tire) => tire.failed.length === 1)).toBe(true);
          expect(nearMisses.every((tire) => judged.near.has(tire.sku))).toBe(true);
          expect(expected.nearMissCount).toBe(judged.near.size);
          // A Fit card judges a tire exactly as the finder does.
          const original = originalOf(search);
          for (const tire of [...results, ...nearMisses]) {
            const card = cardTireVerdict(original, rows.get(tire.sku)!, search.tolerancePct);
            expect(card.equalOrBetter).toBe("reasons" in tire);
            expect(card.reasons).toEqual("reasons" in tire ? tire.reasons : tire.failed);
            if ("notes" in tire) expect(card.notes).toEqual(tire.notes);
          }
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
