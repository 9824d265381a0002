import { count } from "drizzle-orm";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import * as schema from "@/db/schema";
import { clearCatalog, seedCatalog } from "./catalog";
import { DEMO_CATALOG } from "./catalog-stock";
import { demoShop } from "./shop";

type SeedableDatabase = PgDatabase<PgQueryResultHKT, typeof schema>;

/** Replaces the demo rows in one transaction: a failure leaves the previous data as it was. */
export async function seedDemoData(db: SeedableDatabase): Promise<void> {
  await db.transaction(async (tx) => {
    await clearCatalog(tx);
    await tx.delete(schema.shop);
    await tx.insert(schema.shop).values(demoShop);
    await seedCatalog(tx, DEMO_CATALOG);
  });
}

export async function seedDemoDataIfEmpty(db: SeedableDatabase): Promise<boolean> {
  const [row] = await db.select({ shops: count() }).from(schema.shop);
  if ((row?.shops ?? 0) > 0) return false;
  await seedDemoData(db);
  return true;
}
