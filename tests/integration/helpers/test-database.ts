import { randomBytes } from "node:crypto";
import { readFileSync } from "node:fs";
import pg from "pg";
import { inject } from "vitest";
import { type DatabaseHandle, migrateDatabase, openDatabase } from "@/db/client";

export type TestDatabaseKind = "pglite" | "postgres";

/** The kinds to run integration tests on: PGlite always, a PostgreSQL server when TEST_DATABASE_URL is set. */
export const testDatabaseKinds: TestDatabaseKind[] = process.env.TEST_DATABASE_URL ? ["pglite", "postgres"] : ["pglite"];

export interface TestDatabase extends DatabaseHandle {
  /** Empties every application table, keeping the schema. */
  reset: () => Promise<void>;
}

async function truncateAll(handle: DatabaseHandle): Promise<void> {
  const { rows } = (await handle.db.execute(
    "select tablename from pg_tables where schemaname = 'public'",
  )) as unknown as { rows: { tablename: string }[] };
  if (rows.length === 0) return;
  const tables = rows.map((row) => `"${row.tablename}"`).join(", ");
  await handle.db.execute(`truncate ${tables} restart identity cascade`);
}

async function openPgliteFromSnapshot(): Promise<DatabaseHandle> {
  const bytes = readFileSync(inject("pgliteSnapshotPath"));
  return openDatabase({ dataDir: "memory://", loadDataDir: new Blob([bytes]) });
}

async function onServer(serverUrl: string, statement: string): Promise<void> {
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  try {
    await admin.query(statement);
  } finally {
    await admin.end();
  }
}

/** A new, empty database on the server: its address, and a way to drop it (ending any connection left to it). */
export async function createServerDatabase(serverUrl: string): Promise<{ name: string; url: string; drop: () => Promise<void> }> {
  const name = `sidewise_test_${randomBytes(6).toString("hex")}`;
  await onServer(serverUrl, `create database ${name}`);
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return { name, url: url.toString(), drop: () => onServer(serverUrl, `drop database if exists ${name} with (force)`) };
}

/** A throw-away database on the server: created, migrated, and dropped again on close. */
async function openServerDatabase(serverUrl: string): Promise<DatabaseHandle> {
  const created = await createServerDatabase(serverUrl);
  const handle = await openDatabase({ url: created.url });
  await migrateDatabase(handle);
  return {
    ...handle,
    close: async () => {
      await handle.close();
      await created.drop();
    },
  };
}

export async function openTestDatabase(kind: TestDatabaseKind): Promise<TestDatabase> {
  const serverUrl = process.env.TEST_DATABASE_URL;
  if (kind === "postgres" && !serverUrl) throw new Error("TEST_DATABASE_URL is not set");
  const handle = kind === "postgres" ? await openServerDatabase(serverUrl!) : await openPgliteFromSnapshot();
  return { ...handle, reset: () => truncateAll(handle) };
}
