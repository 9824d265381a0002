import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { asc, eq } from "drizzle-orm";
import { auditEvent, brand, stockItem, tireLine, user } from "@/db/schema";
import { createStockItem, retireStockItem, updateStockItem } from "@/lib/stock/item-writes";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const staff = { id: "staff-1", email: "counter@example.test" };
const item = { sku: "LMB-1", brand: "lumbrel", line: "HAYWARD TRAIL", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "R", loadRange: "E", extraLoad: false, priceCents: 21_000, quantity: 2 };

describe.each(testDatabaseKinds)("stock writes on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    await database.db.insert(user).values({ ...staff, name: "Counter", role: "staff" });
    const [made] = await database.db.insert(brand).values({ name: "Lumbrel" }).returning({ id: brand.id });
    await database.db.insert(tireLine).values([
      { brandId: made?.id ?? 0, name: "Hayward Trail", season: "all-season", terrain: "all-terrain", threePeak: true },
      { brandId: made?.id ?? 0, name: "Hayward Mud", season: "all-season", terrain: "mud-terrain" },
    ]);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("create, change and retire an item, finding its line in any letter case", async () => {
    const created = await createStockItem(database.db, item, staff);
    expect(created).toMatchObject({ ok: true, tire: { sku: "LMB-1", brand: "Lumbrel", line: "Hayward Trail", loadRange: "E", threePeak: true } });
    expect(await createStockItem(database.db, item, staff)).toMatchObject({ ok: false, code: "already_exists" });

    const changed = await updateStockItem(database.db, "LMB-1", { line: "hayward mud", loadRange: null }, staff);
    expect(changed).toMatchObject({ ok: false, code: "invalid_parameter" });
    const moved = await updateStockItem(database.db, "LMB-1", { line: "hayward mud", quantity: 0 }, staff);
    expect(moved).toMatchObject({ ok: true, tire: { line: "Hayward Mud", terrain: "mud-terrain", inStock: false, loadIndexDual: 120 } });

    expect(await retireStockItem(database.db, "LMB-1", staff)).toBe(true);
    expect(await retireStockItem(database.db, "LMB-1", staff)).toBe(false);
    const rows = await database.db.select({ retired: stockItem.retired }).from(stockItem).where(eq(stockItem.sku, "LMB-1"));
    expect(rows).toEqual([{ retired: true }]);
  });

  it("records who added, changed and retired the item, and nothing for refused writes", async () => {
    const events = await database.db
      .select({ action: auditEvent.action, subject: auditEvent.subject, actorEmail: auditEvent.actorEmail, changes: auditEvent.changes, summary: auditEvent.summary })
      .from(auditEvent)
      .orderBy(asc(auditEvent.id));
    expect(events.map((event) => event.action)).toEqual(["item_added", "item_changed", "item_retired"]);
    expect(events.every((event) => event.subject === "LMB-1" && event.actorEmail === staff.email)).toBe(true);
    expect(events[1]?.changes).toMatchObject({ quantityOnHand: { from: 2, to: 0 } });
    expect(Object.keys(events[1]?.changes ?? {}).sort()).toEqual(["lineId", "quantityOnHand"]);
    expect(events[1]?.summary).toBe("quantity 2 → 0; line Lumbrel Hayward Trail → Lumbrel Hayward Mud");
  });
});
