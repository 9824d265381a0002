import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { shop } from "@/db/schema";
import { seedDemoData, seedDemoDataIfEmpty } from "@/lib/demo";
import { getShopContact } from "@/lib/shop/queries";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

describe.each(testDatabaseKinds)("shop data on %s", (kind) => {
  let database: TestDatabase;

  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  afterAll(async () => {
    await database?.close();
  });
  beforeEach(async () => {
    await database.reset();
  });

  it("has no shop before seeding", async () => {
    expect(await getShopContact(database.db)).toBeNull();
  });

  it("seeds the demo shop once when empty, and not again", async () => {
    expect(await seedDemoDataIfEmpty(database.db)).toBe(true);
    expect(await seedDemoDataIfEmpty(database.db)).toBe(false);
    const contact = await getShopContact(database.db);
    expect(contact?.name).toBe("Marrowby Tire Works");
    expect(await database.db.$count(shop)).toBe(1);
  });

  it("re-seeding replaces rather than duplicates", async () => {
    await seedDemoData(database.db);
    await seedDemoData(database.db);
    expect(await database.db.$count(shop)).toBe(1);
  });

  it("refuses a default tolerance outside 1–5 %", async () => {
    await seedDemoData(database.db);
    await expect(database.db.update(shop).set({ defaultTolerancePct: 7 })).rejects.toThrow();
  });

  it("keeps only public contact fields in the contact query, the hours in one line", async () => {
    await seedDemoData(database.db);
    const contact = await getShopContact(database.db);
    expect(Object.keys(contact ?? {}).sort()).toEqual(
      ["email", "name", "openingHours", "phone", "postalCode", "region", "streetAddress", "town"].sort(),
    );
    expect(contact?.openingHours).toBe("Mon–Fri 07:30–18:00; Sat 08:00–14:00");
  });
});
