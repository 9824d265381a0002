import { mkdirSync } from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import { drizzle as drizzleNodePg } from "drizzle-orm/node-postgres";
import { migrate as migrateNodePg } from "drizzle-orm/node-postgres/migrator";
import { drizzle as drizzlePglite } from "drizzle-orm/pglite";
import { migrate as migratePglite } from "drizzle-orm/pglite/migrator";
import * as schema from "./schema";
import { openServerPool } from "./server-pool";

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

/**
 * The process's one database: opened by `open` on first use and cached on globalThis, so dev-server
 * reloads reuse it; a failed open is forgotten so the next call retries. The app's settings, migration
 * and demo data are the caller's (lib/database); db/ reads no environment.
 */
export function lazyDatabase(open: () => Promise<DatabaseHandle>): () => Promise<DatabaseHandle> {
  return () => {
    const store = globalThis as GlobalWithDatabase;
    if (!store.__sidewiseDatabase) {
      store.__sidewiseDatabase = open().catch((error: unknown) => {
        store.__sidewiseDatabase = undefined;
        throw error;
      });
    }
    return store.__sidewiseDatabase;
  };
}
