import { mkdirSync } from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import { drizzle as drizzleNodePg } from "drizzle-orm/node-postgres";
import { migrate as migrateNodePg } from "drizzle-orm/node-postgres/migrator";
import { drizzle as drizzlePglite } from "drizzle-orm/pglite";
import { migrate as migratePglite } from "drizzle-orm/pglite/migrator";
import { readServerEnv } from "@/lib/env/server-env";
import * as schema from "./schema";
import { openServerPool } from "./server-pool";
import { seedDemoDataIfEmpty } from "./seed";
import { seedDemoAccounts } from "./seed/accounts";

export type Database = PgDatabase<PgQueryResultHKT, typeof schema>;
export type DatabaseKind = "pglite" | "postgres";

export interface DatabaseHandle {
  db: Database;
  kind: DatabaseKind;
  close: () => Promise<void>;
}

export interface DatabaseOptions {
  /** A PostgreSQL server; when absent the embedded PGlite is used. */
  url?: string;
  /** PGlite folder, or "memory://" for a database that lives only in this process. */
  dataDir?: string;
  /** A PGlite snapshot (from `dumpDataDir`) to start from; tests use it to skip migrating. */
  loadDataDir?: Blob;
}

const migrationsFolder = path.join(process.cwd(), "db", "migrations");

export async function openDatabase(options: DatabaseOptions): Promise<DatabaseHandle> {
  if (options.url) {
    const { pool, close } = openServerPool(options.url);
    const db = drizzleNodePg({ client: pool, schema, casing: "snake_case" });
    return { db, kind: "postgres", close };
  }
  const dataDir = options.dataDir ?? "memory://";
  if (!dataDir.startsWith("memory://")) mkdirSync(dataDir, { recursive: true });
  const client = new PGlite(dataDir, options.loadDataDir ? { loadDataDir: options.loadDataDir } : {});
  const db = drizzlePglite({ client, schema, casing: "snake_case" });
  return { db, kind: "pglite", close: () => client.close() };
}

export async function migrateDatabase(handle: DatabaseHandle): Promise<void> {
  if (handle.kind === "postgres") {
    await migrateNodePg(handle.db as Parameters<typeof migrateNodePg>[0], { migrationsFolder });
  } else {
    await migratePglite(handle.db as Parameters<typeof migratePglite>[0], { migrationsFolder });
  }
}

type GlobalWithDatabase = typeof globalThis & { __sidewiseDatabase?: Promise<DatabaseHandle> };

async function openFromEnvironment(): Promise<DatabaseHandle> {
  const env = readServerEnv();
  const handle = await openDatabase({ url: env.DATABASE_URL, dataDir: env.PGLITE_DATA_DIR });
  try {
    await migrateDatabase(handle);
    if (env.DEMO_SEED === "on") {
      await seedDemoDataIfEmpty(handle.db);
      await seedDemoAccounts(handle.db);
    }
    return handle;
  } catch (error) {
    await handle.close().catch(() => undefined);
    throw error;
  }
}

/**
 * The app's one database, opened, migrated and (unless DEMO_SEED=off) seeded on first use.
 * Cached on globalThis so dev-server reloads reuse it; a failed open is forgotten so the next call retries.
 */
export function getDatabaseHandle(): Promise<DatabaseHandle> {
  const store = globalThis as GlobalWithDatabase;
  if (!store.__sidewiseDatabase) {
    store.__sidewiseDatabase = openFromEnvironment().catch((error: unknown) => {
      store.__sidewiseDatabase = undefined;
      throw error;
    });
  }
  return store.__sidewiseDatabase;
}

export async function getDb(): Promise<Database> {
  return (await getDatabaseHandle()).db;
}
