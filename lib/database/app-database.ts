import { lazyDatabase, migrateDatabase, openDatabase, type Database, type DatabaseHandle } from "@/db/client";
import { seedDemoDataIfEmpty } from "@/lib/demo";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { readEnv } from "@/lib/env/env";

/** Opens the database the environment names, migrates it, and fills in the demo data unless DEMO_SEED=off. */
async function openAppDatabase(): Promise<DatabaseHandle> {
  const env = readEnv();
  const handle = await openDatabase({ url: env.DATABASE_URL, dataDir: env.PGLITE_DATA_DIR });
  try {
    await migrateDatabase(handle);
    if (env.DEMO_SEED === "on") {
      await seedDemoDataIfEmpty(handle.db);
      await seedDemoAccounts(handle.db);
      // Loaded here, not at the top: the offers it makes read the shop through modules that import this one.
      const { seedDemoRequestsIfEmpty } = await import("@/lib/demo/requests");
      await seedDemoRequestsIfEmpty(handle.db);
    }
    return handle;
  } catch (error) {
    await handle.close().catch(() => undefined);
    throw error;
  }
}

/** The app's one database, opened, migrated and (unless DEMO_SEED=off) seeded on first use. */
export const getDatabaseHandle = lazyDatabase(openAppDatabase);

export async function getDb(): Promise<Database> {
  return (await getDatabaseHandle()).db;
}
