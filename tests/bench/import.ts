/**
 * Catalog CSV import speed. Seeds the demo catalog into a fresh embedded database, then imports a
 * 10,000-row file of new SKUs over real standard sizes and the demo lines, imports the same file again
 * (every row unchanged), and once more with every price changed (every row updated).
 * Target: each import ≤ 3 s.
 *
 *   npm run bench:import
 */
import { migrateDatabase, openDatabase, type Database } from "../../db/client";
import { user } from "../../db/schema";
import { seedCatalog } from "../../lib/demo/catalog";
import { DEMO_CATALOG } from "../../lib/demo/catalog-stock";
import { generatedCsvItems } from "../fixtures/generated-csv-items";
import { importCatalogCsv } from "../../lib/catalog-csv/import";
import { writeCatalogCsv } from "../../lib/catalog-csv/write-file";

const ROWS = 10_000;
const TARGET_MS = 3000;
const actor = { id: "bench-staff", email: "bench@sidewise.test" };

function importFile(priceCentsOffset: number): string {
  const items = generatedCsvItems(ROWS, { seed: 31, skuPrefix: "IMP" }).map((item) => ({ ...item, priceCents: item.priceCents + priceCentsOffset }));
  return writeCatalogCsv(items);
}

async function timeImport(db: Database, label: string, text: string): Promise<number> {
  // CPU time tells the import's own cost apart from waiting for a busy machine (PGlite runs in this process).
  const cpuStart = process.cpuUsage();
  const start = performance.now();
  const result = await importCatalogCsv(db, { name: "bench.csv", text }, "all-or-nothing", actor);
  const ms = performance.now() - start;
  const cpu = process.cpuUsage(cpuStart);
  const cpuMs = (cpu.user + cpu.system) / 1000;
  if (!result.ok) throw new Error(result.message);
  const { added, updated, unchanged, refused, written } = result.report;
  if (refused.length > 0) throw new Error(`refused: ${JSON.stringify(refused.slice(0, 3))}`);
  console.log(
    `${label.padEnd(22)} ${(ms / 1000).toFixed(2)} s, CPU ${(cpuMs / 1000).toFixed(2)} s  (${added} added, ${updated} updated, ${unchanged} unchanged, written ${written}; ` +
      `${(text.length / 1024 / 1024).toFixed(2)} MB)`,
  );
  return ms;
}

const handle = await openDatabase({ dataDir: "memory://" });
await migrateDatabase(handle);
await handle.db.transaction((tx) => seedCatalog(tx, DEMO_CATALOG));
await handle.db.insert(user).values({ ...actor, name: "Bench", role: "staff" });

const fresh = importFile(0);
const times = [
  await timeImport(handle.db, `${ROWS.toLocaleString("en-US")} new rows`, fresh),
  await timeImport(handle.db, "same file again", fresh),
  await timeImport(handle.db, "every price changed", importFile(100)),
];
await handle.close();
const slowest = Math.max(...times);
console.log(`slowest ${(slowest / 1000).toFixed(2)} s, target ≤ ${TARGET_MS / 1000} s: ${slowest <= TARGET_MS ? "met" : "MISSED"}`);
