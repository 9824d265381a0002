import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seedDemoData } from "@/lib/demo";
import { finderAnswerSchema } from "@/lib/alternatives/answer-rows";
import { decodeAlternativesCursor } from "@/lib/alternatives/cursor";
import { finderAnswer, findAlternatives, type AlternativesOptions } from "@/lib/alternatives/find-alternatives";
import { readOriginal } from "@/lib/alternatives/original";
import { demoShopCharges } from "@/lib/demo/shop";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { addSingleRatedTruckTires, arbitrarySearch, loadWholeCatalog, type CatalogRow } from "./brute-force";

// The request path takes the finder statement's JSON as it comes; this holds every shape of it to the schema.
describe.each(testDatabaseKinds)("the finder statement's answer on %s", (kind) => {
  let database: TestDatabase;
  let catalog: CatalogRow[];

  beforeAll(async () => {
    database = await openTestDatabase(kind);
    await seedDemoData(database.db);
    await addSingleRatedTruckTires(database.db);
    catalog = await loadWholeCatalog(database.db);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("has exactly the fields and types of finderAnswerSchema, on a first page and on the page after it", async () => {
    await fc.assert(
      fc.asyncProperty(arbitrarySearch(catalog), async (search) => {
        const read = readOriginal(search.original);
        if (!read.ok) throw new Error(read.message);
        const options: AlternativesOptions = {
          ...search.filters,
          tolerancePct: search.tolerancePct,
          quantity: search.quantity,
          charges: demoShopCharges,
          sort: search.sort,
          limit: search.limit,
          cursor: null,
        };
        expect(finderAnswerSchema.safeParse(await finderAnswer(database.db, read.original, options)).error).toBeUndefined();
        const first = await findAlternatives(database.db, read.original, options);
        if (first.nextCursor) {
          const after = { ...options, cursor: decodeAlternativesCursor(first.nextCursor) };
          expect(finderAnswerSchema.safeParse(await finderAnswer(database.db, read.original, after)).error).toBeUndefined();
        }
      }),
      { seed: 20_261_205, numRuns: 40 },
    );
  });
});
