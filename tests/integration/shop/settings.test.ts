import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { auditEvent, shop, user } from "@/db/schema";
import { demoShop } from "@/lib/demo/shop";
import { readShopTimeZone } from "@/lib/shop/queries";
import { readShopSettings, updateShopSettings } from "@/lib/shop/settings";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const admin = { id: "admin-1", email: "admin@example.test" };

describe.each(testDatabaseKinds)("the shop's settings on %s", (kind) => {
  let database: TestDatabase;

  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  afterAll(async () => {
    await database?.close();
  });
  beforeEach(async () => {
    await database.reset();
    await database.db.insert(shop).values(demoShop);
    await database.db.insert(user).values({ id: admin.id, name: "Admin", email: admin.email, emailVerified: true, role: "admin" });
  });

  it("writes the change and its audit entry together", async () => {
    const result = await updateShopSettings(database.db, admin, { fittingPerTireCents: 3_000, taxServices: false });
    expect(result.ok && result.changes.map((change) => change.field)).toEqual(["fittingPerTireCents", "taxServices"]);
    expect(await readShopSettings(database.db)).toMatchObject({ fittingPerTireCents: 3_000, taxServices: false, disposalPerTireCents: 400 });
    const audits = await database.db.select().from(auditEvent);
    expect(audits).toHaveLength(1);
    expect(audits[0]).toMatchObject({ action: "shop_changed", actorId: admin.id, summary: "Fitting $25.00 → $30.00 per tire; fitting and disposal taxed → not taxed" });
  });

  it("writes nothing when the audit entry cannot be written: the transaction rolls the change back", async () => {
    // The audit row refers to its actor: an account that does not exist fails that insert, after the shop's update.
    await expect(updateShopSettings(database.db, { id: "no-such-account", email: "ghost@example.test" }, { taxRateBp: 900 })).rejects.toThrow();
    expect((await readShopSettings(database.db))?.taxRateBp).toBe(725);
    expect(await database.db.$count(auditEvent)).toBe(0);
  });

  it("leaves the database's own checks as the last word on charges and tax", async () => {
    await expect(database.db.update(shop).set({ taxRateBp: 10_001 })).rejects.toThrow();
    await expect(database.db.update(shop).set({ disposalPerTireCents: -1 })).rejects.toThrow();
  });

  it("answers not_found, and the Counter falls back to UTC, before the shop is set up", async () => {
    await database.db.delete(shop);
    expect(await updateShopSettings(database.db, admin, { taxRateBp: 900 })).toMatchObject({ ok: false, code: "not_found" });
    expect(await readShopSettings(database.db)).toBeNull();
    expect(await readShopTimeZone(database.db)).toBe("UTC");
  });

  it("reads the time zone the Counter writes its times in, and UTC for one this runtime cannot use", async () => {
    expect(await readShopTimeZone(database.db)).toBe("America/New_York");
    await database.db.update(shop).set({ timeZone: "Mars/Olympus" }).where(eq(shop.name, demoShop.name));
    expect(await readShopTimeZone(database.db)).toBe("UTC");
  });
});
