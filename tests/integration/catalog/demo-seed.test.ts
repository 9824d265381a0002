import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { brand, stockItem, tireLine } from "@/db/schema";
import { seedDemoData } from "@/lib/demo";
import { DEMO_CATALOG } from "@/lib/demo/catalog-stock";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

describe.each(testDatabaseKinds)("demo catalog seed on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("writes the invented brands, lines and stock in the shop's seed, and replaces them on a second run", async () => {
    await seedDemoData(database.db);
    await seedDemoData(database.db);
    expect(await database.db.$count(brand)).toBe(14);
    expect(await database.db.$count(tireLine)).toBe(70);
    expect(await database.db.$count(stockItem)).toBe(DEMO_CATALOG.itemCount);
  });
});
