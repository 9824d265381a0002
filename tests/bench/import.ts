/**
 * `npm run bench:import`: the catalog CSV import, its cost and the site while it runs.
 *
 * In process: the demo catalog in a fresh embedded database, then a 10,000-row file of new SKUs over
 * real standard sizes and the demo lines, the same file again (every row unchanged) and once more with
 * every price changed; CPU time of each (median of the runs). Goals: 10,000 new rows ≤ 3 s of CPU, the
 * unchanged file ≤ 1 s.
 *
 * On the production server (built first if there is none, over a fresh embedded database with the demo
 * shop): staff upload a 10,000-row file through POST /api/v1/catalog/import while a steady stream of
 * GET /api/v1/decode (no database) and GET /api/v1/alternatives (a database read) goes on, each request
 * sent on time whether or not the last has answered. p99 of each during the imports, beside the same
 * before the first import (the floor). Goals: no-database requests ≤ 200 ms, database reads ≤ 1,000 ms.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { migrateDatabase, openDatabase, type Database } from "../../db/client";
import { user } from "../../db/schema";
import { seedCatalog } from "../../lib/demo/catalog";
import { DEMO_CATALOG } from "../../lib/demo/catalog-stock";
import { importCatalogCsv } from "../../lib/catalog-csv/import";
import { writeCatalogCsv } from "../../lib/catalog-csv/write-file";
import { generatedCsvItems } from "../fixtures/generated-csv-items";
import { ensureProductionBuild, startProductionServer } from "./production-server";
import { median, percentile, runIfMain, type Bench, type BenchRow } from "./report";
import { signInAsStaff } from "./sign-in";

const actor = { id: "bench-staff", email: "bench@sidewise.test" };
const NO_DB_PATH = "/api/v1/decode?q=225%2F45R17%2094W";
const DB_READ_PATH = "/api/v1/alternatives?size=225%2F45R17&loadIndex=91&speedSymbol=V&limit=12";
const PACE_MS = 100;

function importFile(rows: number, skuPrefix: string, priceCentsOffset = 0): string {
  const items = generatedCsvItems(rows, { seed: 31, skuPrefix }).map((item) => ({ ...item, priceCents: item.priceCents + priceCentsOffset }));
  return writeCatalogCsv(items);
}

async function cpuOfImport(db: Database, text: string, expect: "added" | "updated" | "unchanged", rows: number): Promise<number> {
  const cpuStart = process.cpuUsage();
  const result = await importCatalogCsv(db, { name: "bench.csv", text }, "all-or-nothing", actor);
  const cpu = process.cpuUsage(cpuStart);
  if (!result.ok) throw new Error(result.message);
  if (result.report[expect] !== rows) throw new Error(`expected ${rows} ${expect}, got ${JSON.stringify({ ...result.report, refused: result.report.refused.slice(0, 3) })}`);
  return (cpu.user + cpu.system) / 1000;
}

/** CPU of each kind of import, one fresh database per run. */
async function inProcess(rows: number, runs: number) {
  const cpu = { added: [] as number[], unchanged: [] as number[], updated: [] as number[] };
  const fresh = importFile(rows, "IMP");
  const repriced = importFile(rows, "IMP", 100);
  for (let run = 0; run < runs; run++) {
    const handle = await openDatabase({ dataDir: "memory://" });
    await migrateDatabase(handle);
    await handle.db.transaction((tx) => seedCatalog(tx, DEMO_CATALOG));
    await handle.db.insert(user).values({ ...actor, name: "Bench", role: "staff" });
    cpu.added.push(await cpuOfImport(handle.db, fresh, "added", rows));
    cpu.unchanged.push(await cpuOfImport(handle.db, fresh, "unchanged", rows));
    cpu.updated.push(await cpuOfImport(handle.db, repriced, "updated", rows));
    await handle.close();
  }
  for (const [kind, times] of Object.entries(cpu)) {
    console.log(`in process, ${rows.toLocaleString("en-US")} rows ${kind}: CPU ${times.map((ms) => (ms / 1000).toFixed(2)).join(", ")} s`);
  }
  return { added: median(cpu.added), unchanged: median(cpu.unchanged), updated: median(cpu.updated) };
}

interface Timed {
  path: string;
  startedAt: number;
  ms: number;
}

/** Sends both requests every PACE_MS until `stop` resolves, never waiting for an answer before the next. */
async function steadyRequests(url: string, stop: Promise<unknown>): Promise<Timed[]> {
  const timed: Timed[] = [];
  const pending: Promise<void>[] = [];
  const send = (requestPath: string) => {
    const startedAt = performance.now();
    pending.push(
      fetch(`${url}${requestPath}`).then(async (response) => {
        await response.arrayBuffer();
        if (!response.ok) throw new Error(`${requestPath} answered ${response.status}`);
        timed.push({ path: requestPath, startedAt, ms: performance.now() - startedAt });
      }),
    );
  };
  let stopped = false;
  void stop.finally(() => (stopped = true));
  while (!stopped) {
    send(NO_DB_PATH);
    send(DB_READ_PATH);
    await new Promise((resolve) => setTimeout(resolve, PACE_MS));
  }
  await Promise.all(pending);
  return timed;
}

async function upload(url: string, cookie: string, text: string) {
  const form = new FormData();
  form.set("file", new Blob([text], { type: "text/csv" }), "bench.csv");
  const response = await fetch(`${url}/api/v1/catalog/import`, { method: "POST", headers: { origin: url, cookie }, body: form });
  if (!response.ok) throw new Error(`the import answered ${response.status}: ${await response.text()}`);
  return (await response.json()) as { added: number };
}

/** p99 of each request while nothing else runs, then while each import runs. */
async function onServer(rows: number, imports: number) {
  ensureProductionBuild();
  const dataDir = path.join(mkdtempSync(path.join(tmpdir(), "sidewise-bench-import-")), "pglite");
  const server = await startProductionServer(dataDir);
  try {
    const cookie = await signInAsStaff(server.url);
    await steadyRequests(server.url, new Promise((resolve) => setTimeout(resolve, 1000)));
    const idle = await steadyRequests(server.url, new Promise((resolve) => setTimeout(resolve, 3000)));
    const during: Timed[] = [];
    for (let run = 0; run < imports; run++) {
      const started = performance.now();
      const imported = upload(server.url, cookie, importFile(rows, `SRV${run}`));
      during.push(...(await steadyRequests(server.url, imported)));
      const { added } = await imported;
      console.log(`on the server, import ${run + 1}: ${added.toLocaleString("en-US")} rows added in ${((performance.now() - started) / 1000).toFixed(2)} s`);
    }
    const p99 = (list: Timed[], requestPath: string) => percentile(list.filter((timed) => timed.path === requestPath).map((timed) => timed.ms), 99);
    const figures = {
      noDb: { idle: p99(idle, NO_DB_PATH), during: p99(during, NO_DB_PATH) },
      dbRead: { idle: p99(idle, DB_READ_PATH), during: p99(during, DB_READ_PATH) },
    };
    const count = (requestPath: string) => during.filter((timed) => timed.path === requestPath).length;
    console.log(`GET ${NO_DB_PATH}: p99 ${figures.noDb.idle.toFixed(1)} ms idle, ${figures.noDb.during.toFixed(1)} ms during the imports (${count(NO_DB_PATH)} requests)`);
    console.log(`GET ${DB_READ_PATH}: p99 ${figures.dbRead.idle.toFixed(1)} ms idle, ${figures.dbRead.during.toFixed(1)} ms during the imports (${count(DB_READ_PATH)} requests)`);
    return figures;
  } finally {
    await server.stop();
    rmSync(path.dirname(dataDir), { recursive: true, force: true });
  }
}

const withFloor = (figure: string, value: number, floorName: string, floor: number, limitMs: number): BenchRow => ({
  figure,
  value,
  unit: "ms",
  floor: { name: floorName, value: floor },
  ratio: value / floor,
  goal: `≤ ${limitMs.toLocaleString("en-US")} ms`,
  met: value <= limitMs,
});

export const run: Bench = async ({ quick }) => {
  const rows = quick ? 2_000 : 10_000;
  const label = rows.toLocaleString("en-US");
  const quickNote = quick ? " (quick: 2,000 rows)" : "";
  const cpu = await inProcess(rows, quick ? 1 : 3);
  const server = await onServer(rows, quick ? 1 : 3);
  return [
    { figure: `import CPU, ${label} new rows`, value: cpu.added, unit: "ms", goal: quick ? "reported" : "≤ 3,000 ms", met: quick ? null : cpu.added <= 3000 },
    { figure: `import CPU, the same ${label} rows again`, value: cpu.unchanged, unit: "ms", goal: quick ? "reported" : "≤ 1,000 ms", met: quick ? null : cpu.unchanged <= 1000 },
    { figure: `import CPU, ${label} prices changed`, value: cpu.updated, unit: "ms", goal: "reported", met: null },
    withFloor(`no-database request p99 during an import${quickNote}`, server.noDb.during, "idle p99", server.noDb.idle, 200),
    withFloor(`database read p99 during an import${quickNote}`, server.dbRead.during, "idle p99", server.dbRead.idle, 1000),
  ];
};

await runIfMain(import.meta.url, run);
