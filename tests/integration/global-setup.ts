import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import type { TestProject } from "vitest/node";
import { migrateDatabase, openDatabase } from "../../db/client";
import { createServerDatabase } from "./helpers/server-database";

declare module "vitest" {
  export interface ProvidedContext {
    pgliteSnapshotPath: string;
    /** A migrated database on the TEST_DATABASE_URL server that each test file copies; "" without one. */
    postgresTemplate: string;
  }
}

/** Migrates one database on the server for the run; each test file then creates its own as a copy of it. */
async function migratedServerTemplate(serverUrl: string | undefined): Promise<{ name: string; drop: () => Promise<void> }> {
  if (!serverUrl) return { name: "", drop: async () => undefined };
  const template = await createServerDatabase(serverUrl);
  const handle = await openDatabase({ url: template.url });
  await migrateDatabase(handle);
  // A database is copied only while nobody is connected to it.
  await handle.close();
  return template;
}

/**
 * Creating and migrating a database takes seconds; do it once per run and let every test file
 * start from a copy instead: PGlite's saved snapshot, and on a server a template database.
 */
export default async function setup(project: TestProject) {
  const folder = mkdtempSync(path.join(tmpdir(), "sidewise-vitest-"));
  const handle = await openDatabase({ dataDir: "memory://" });
  await migrateDatabase(handle);
  const client = (handle.db as unknown as { $client: PGlite }).$client;
  const snapshot = await client.dumpDataDir("none");
  const snapshotPath = path.join(folder, "migrated.tar");
  writeFileSync(snapshotPath, Buffer.from(await snapshot.arrayBuffer()));
  await handle.close();
  project.provide("pgliteSnapshotPath", snapshotPath);
  const template = await migratedServerTemplate(process.env.TEST_DATABASE_URL);
  project.provide("postgresTemplate", template.name);
  return async () => {
    rmSync(folder, { recursive: true, force: true });
    await template.drop();
  };
}
