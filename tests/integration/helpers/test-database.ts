import { readFileSync } from "node:fs";
import { inject } from "vitest";
import { type DatabaseHandle, openDatabase } from "@/db/client";
import { createServerDatabase } from "./server-database";

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

/** A throw-away database on the server: a copy of the run's migrated template, dropped again on close. */
async function openServerDatabase(serverUrl: string): Promise<DatabaseHandle> {
  const created = await createServerDatabase(serverUrl, inject("postgresTemplate"));
  const handle = await openDatabase({ url: created.url });
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
