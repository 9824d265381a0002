/**
 * Replacement finder speed. Seeds 1,000 and 50,000 stock items into two fresh embedded databases and
 * times 500 alternatives searches (one page plus its total and near misses) for random originals, each
 * original searched in both. Then times 200 requests to GET /api/v1/alternatives beside 200 to
 * GET /api/health on the production server: the build in .next, started over a fresh embedded
 * database holding the demo shop and 50,000 items (or a server already running, with --server).
 * Targets: p95 ≤ 10 ms at 50,000 items, and p95(50,000) ÷ p95(1,000) ≤ 1.5. The same originals are then
 * searched for a set of four in stock (inStock=true, quantity 4), which counts the items of each
 * qualifying fitment rather than reading its counts, and timed apart.
 *
 *   npm run build && npm run bench:finder
 *   npm run bench:finder -- --server http://localhost:3000   # time the HTTP route of a running server instead
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { sql } from "drizzle-orm";
import { migrateDatabase, openDatabase, type Database } from "../../db/client";
import { shop } from "../../db/schema";
import { seedCatalog } from "../../lib/demo/catalog";
import { SIZE_OFFERS, type SizeOffer } from "../../lib/demo/catalog-sizes";
import { seededRandom, type Random } from "../../lib/demo/random";
import { demoShop } from "../../lib/demo/shop";
import { findAlternatives } from "../../lib/alternatives/find-alternatives";
import { readOriginal, type Original, type OriginalInput } from "../../lib/alternatives/original";
import { readFinderShopSettings } from "../../lib/shop/charges";
import { hasProductionBuild, startProductionServer } from "./production-server";

const SEARCHES = 500;
const WARM_UP = 50;
const HTTP_REQUESTS = 200;
const CATALOG_SIZES = [1_000, 50_000] as const;

function percentile(sorted: readonly number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] ?? Number.NaN;
}

/** An original as a customer would bring it: a stocked size, a load index near the usual, a common speed rating. */
function randomOriginal(random: Random): OriginalInput {
  const weighted = SIZE_OFFERS.flatMap((offer) => Array<SizeOffer>(offer.popularity).fill(offer));
  const offer = random.pick(weighted);
  const range = offer.loadRanges ? random.pick(offer.loadRanges) : undefined;
  const baseIndex = range?.[1] ?? offer.standardLoad ?? offer.service?.[0] ?? 100;
  const heavy = offer.group === "lt" || offer.group === "flotation" || offer.group === "trailer" || offer.group === "van";
  return {
    size: offer.designation,
    loadIndex: baseIndex - random.int(0, 3),
    speedSymbol: random.pick(heavy ? ["Q", "R", "S", "T"] : ["S", "T", "H", "V", "W"]),
    loadRange: range?.[0],
  };
}

/** A search as the API runs it: the shop's tolerance and charges read (one query), then one page with its total and near misses. */
async function timeSearch(db: Database, original: Original, inStock?: boolean): Promise<number> {
  const start = performance.now();
  const { tolerancePct, charges } = await readFinderShopSettings(db);
  await findAlternatives(db, original, { tolerancePct, quantity: 4, charges, inStock, sort: "diameter", limit: 50, cursor: null });
  return performance.now() - start;
}

async function openSeeded(itemCount: number) {
  const handle = await openDatabase({ dataDir: "memory://" });
  await migrateDatabase(handle);
  const seedStart = performance.now();
  await handle.db.transaction((tx) => seedCatalog(tx, { itemCount, seed: 7 }));
  await handle.db.execute(sql`vacuum analyze`);
  console.log(`${itemCount.toLocaleString("en-US").padStart(6)} items seeded in ${((performance.now() - seedStart) / 1000).toFixed(1)} s`);
  return handle;
}

/**
 * Both catalogs are open at once and every original is searched in both, in alternating order, so
 * that a busy moment on the machine weighs on both sides of the ratio alike.
 */
async function benchCatalogs(): Promise<void> {
  const handles = [await openSeeded(CATALOG_SIZES[0]), await openSeeded(CATALOG_SIZES[1])] as const;
  await benchSearches(handles, "", undefined);
  await benchSearches(handles, "in stock for a set of four: ", true);
  await Promise.all(handles.map((handle) => handle.close()));
}

async function benchSearches(handles: readonly [{ db: Database }, { db: Database }], label: string, inStock: boolean | undefined): Promise<void> {
  const random = seededRandom(11);
  const times: [number[], number[]] = [[], []];
  for (let i = 0; i < WARM_UP + SEARCHES; i++) {
    const read = readOriginal(randomOriginal(random));
    if (!read.ok) throw new Error(read.message);
    const order = i % 2 === 0 ? ([0, 1] as const) : ([1, 0] as const);
    for (const which of order) {
      const elapsed = await timeSearch(handles[which].db, read.original, inStock);
      if (i >= WARM_UP) times[which].push(elapsed);
    }
  }
  const p95s = times.map((list, which) => {
    list.sort((a, b) => a - b);
    const [p50, p95] = [percentile(list, 50), percentile(list, 95)];
    console.log(
      `${label}${CATALOG_SIZES[which]!.toLocaleString("en-US").padStart(6)} items: p50 ${p50.toFixed(2)} ms, p95 ${p95.toFixed(2)} ms, p95/p50 ${(p95 / p50).toFixed(2)} (${SEARCHES} searches)`,
    );
    return p95;
  });
  console.log(`${label}p95 at 50,000 ÷ p95 at 1,000 = ${(p95s[1]! / p95s[0]!).toFixed(2)} (target ≤ 1.5); p95 at 50,000 target ≤ 10 ms`);
}

async function timeRequests(urls: readonly string[]): Promise<number[]> {
  const times: number[] = [];
  for (const url of urls) {
    const start = performance.now();
    const response = await fetch(url);
    await response.arrayBuffer();
    if (!response.ok) throw new Error(`${url} answered ${response.status}`);
    times.push(performance.now() - start);
  }
  return times.sort((a, b) => a - b);
}

async function benchServer(base: string): Promise<void> {
  const random = seededRandom(13);
  const alternatives = Array.from({ length: HTTP_REQUESTS }, () => {
    const original = randomOriginal(random);
    const query = new URLSearchParams({ size: original.size, loadIndex: String(original.loadIndex), speedSymbol: original.speedSymbol ?? "T" });
    if (original.loadRange) query.set("loadRange", original.loadRange);
    return new URL(`/api/v1/alternatives?${query}`, base).toString();
  });
  const health = Array.from({ length: HTTP_REQUESTS }, () => new URL("/api/health", base).toString());
  await timeRequests([...alternatives.slice(0, 20), ...health.slice(0, 20)]);
  const alternativesTimes = await timeRequests(alternatives);
  const healthTimes = await timeRequests(health);
  console.log(`${base}: GET /api/v1/alternatives p50 ${percentile(alternativesTimes, 50).toFixed(2)} ms, p95 ${percentile(alternativesTimes, 95).toFixed(2)} ms`);
  console.log(`${base}: GET /api/health          p50 ${percentile(healthTimes, 50).toFixed(2)} ms, p95 ${percentile(healthTimes, 95).toFixed(2)} ms (${HTTP_REQUESTS} requests each)`);
}

/** An embedded database folder with the demo shop and a 50,000-item catalog, for the production server. */
async function largeCatalogFolder(): Promise<string> {
  const dataDir = path.join(mkdtempSync(path.join(tmpdir(), "sidewise-bench-")), "pglite");
  const handle = await openDatabase({ dataDir });
  await migrateDatabase(handle);
  await handle.db.transaction(async (tx) => {
    await tx.insert(shop).values(demoShop);
    await seedCatalog(tx, { itemCount: CATALOG_SIZES[1], seed: 7 });
  });
  await handle.close();
  return dataDir;
}

async function benchProductionBuild(): Promise<void> {
  if (!hasProductionBuild()) {
    console.log("HTTP route not timed: no production build in .next (run `npm run build` first, or pass --server URL).");
    return;
  }
  const dataDir = await largeCatalogFolder();
  const server = await startProductionServer(dataDir);
  try {
    console.log(`production server over ${CATALOG_SIZES[1].toLocaleString("en-US")} items:`);
    await benchServer(server.url);
  } finally {
    await server.stop();
    rmSync(path.dirname(dataDir), { recursive: true, force: true });
  }
}

const serverFlag = process.argv.indexOf("--server");
const server = serverFlag >= 0 ? process.argv[serverFlag + 1] : undefined;
if (serverFlag >= 0 && !server) throw new Error("--server needs a URL, e.g. --server http://localhost:3000");

await benchCatalogs();
if (server) await benchServer(server);
else await benchProductionBuild();
