import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import type { TestProject } from "vitest/node";
import { migrateDatabase, openDatabase } from "../../db/client";

declare module "vitest" {
  export interface ProvidedContext {
    pgliteSnapshotPath: string;
  }
}

/**
 * Creating and migrating a PGlite database takes seconds; do it once per run and let every
 * test file start from the saved snapshot instead.
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
  return () => rmSync(folder, { recursive: true, force: true });
}
