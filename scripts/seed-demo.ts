import { migrateDatabase, openDatabase } from "@/db/client";
import { seedDemoData } from "@/lib/demo";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { seedDemoRequestsIfEmpty } from "@/lib/demo/requests";
import { readEnv } from "@/lib/env/env";

// Re-seeds the demo data on demand. With PGlite, stop the dev server first: one process per data folder.
const env = readEnv();
const handle = await openDatabase({ url: env.DATABASE_URL, dataDir: env.PGLITE_DATA_DIR });
try {
  await migrateDatabase(handle);
  await seedDemoData(handle.db);
  await seedDemoAccounts(handle.db);
  await seedDemoRequestsIfEmpty(handle.db);
  console.log(`Demo data seeded into ${handle.kind === "postgres" ? "the PostgreSQL server" : env.PGLITE_DATA_DIR}.`);
} finally {
  await handle.close();
}
