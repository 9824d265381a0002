/**
 * `npm run bench:finder`: Replacement finder speed.
 *
 * In process: seeds 1,000 and 50,000 stock items into two fresh embedded databases and times 500
 * alternatives searches (one page plus its total and near misses) for random originals, each original
 * searched in both, in alternating order. Goals: p95 ≤ 10 ms at 50,000 items, and p95(50,000) ÷
 * p95(1,000) ≤ 1.5. The same originals searched for a set of four in stock (inStock=true, quantity 4),
 * which counts the items of each qualifying fitment rather than reading its counts, are reported apart.
 *
 * Over HTTP: the production build (built first if there is none) over a fresh embedded database with
 * the demo shop and catalog; GET /api/v1/alternatives and GET /api/health in alternation, three rounds.
 * Goal: the median round's alternatives p50 ≤ 1.5 × its health p50. The same searches asked for
 * uncompressed (Accept-Encoding: identity) are reported beside it: the difference is what Next.js's
 * gzip of the answer costs the server and the client, which a route handler cannot change.
 *
 *   npm run bench:finder
 *   npm run bench:finder -- --server http://localhost:3000   # time the HTTP routes of a running server instead
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { sql } from "drizzle-orm";
import { migrateDatabase, openDatabase, type Database } from "../../db/client";
import { seedCatalog } from "../../lib/demo/catalog";
import { SIZE_OFFERS, type SizeOffer } from "../../lib/demo/catalog-sizes";
import { seededRandom, type Random } from "../../lib/demo/random";
import { findAlternatives } from "../../lib/alternatives/find-alternatives";
import { readOriginal, type Original, type OriginalInput } from "../../lib/alternatives/original";
import { readFinderShopSettings } from "../../lib/shop/charges";
import { ensureProductionBuild, startProductionServer } from "./production-server";
import { formatRange, formatTable, isMainModule, median, percentile, ratioRow, type Bench, type BenchRow } from "./report";

const WARM_UP = 50;
const HTTP_ROUNDS = 3;

interface Sizes {
  searches: number;
  httpRequests: number;
  catalogs: readonly [number, number];
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

const items = (count: number) => `${count.toLocaleString("en-US")} items`;

/**
 * Both catalogs are open at once and every original is searched in both, in alternating order, so
 * that a busy moment on the machine weighs on both sides of the ratio alike.
 */
async function benchCatalogs(sizes: Sizes): Promise<BenchRow[]> {
  const handles = [await openSeeded(sizes.catalogs[0]), await openSeeded(sizes.catalogs[1])] as const;
  try {
    const [small, large] = await benchSearches(handles, sizes, "", undefined);
    const [smallInStock, largeInStock] = await benchSearches(handles, sizes, "in stock for a set of four: ", true);
    const smallFloor = { name: `p95 at ${items(sizes.catalogs[0])}`, value: small };
    return [
      { figure: `finder p95, ${items(sizes.catalogs[1])}`, value: large, unit: "ms", goal: "≤ 10 ms", met: large <= 10 },
      ratioRow(`finder p95, ${items(sizes.catalogs[1])} ÷ ${items(sizes.catalogs[0])}`, large, "ms", smallFloor, 1.5),
      { ...ratioRow(`finder p95 in stock for a set of four, ${items(sizes.catalogs[1])}`, largeInStock, "ms", { ...smallFloor, value: smallInStock }, 1.5), goal: "reported", met: null },
    ];
  } finally {
    await Promise.all(handles.map((handle) => handle.close()));
  }
}

async function benchSearches(handles: readonly [{ db: Database }, { db: Database }], sizes: Sizes, label: string, inStock: boolean | undefined) {
  const random = seededRandom(11);
  const times: [number[], number[]] = [[], []];
  for (let i = 0; i < WARM_UP + sizes.searches; i++) {
    const read = readOriginal(randomOriginal(random));
    if (!read.ok) throw new Error(read.message);
    const order = i % 2 === 0 ? ([0, 1] as const) : ([1, 0] as const);
    for (const which of order) {
      const elapsed = await timeSearch(handles[which].db, read.original, inStock);
      if (i >= WARM_UP) times[which].push(elapsed);
    }
  }
  const p95s = times.map((list, which) => {
    const [p50, p95] = [percentile(list, 50), percentile(list, 95)];
    console.log(`${label}${items(sizes.catalogs[which]!).padStart(12)}: p50 ${p50.toFixed(2)} ms, p95 ${p95.toFixed(2)} ms (${sizes.searches} searches)`);
    return p95;
  });
  return [p95s[0]!, p95s[1]!] as const;
}

async function timeRequest(url: string, headers?: HeadersInit): Promise<number> {
  const start = performance.now();
  const response = await fetch(url, { headers });
  await response.arrayBuffer();
  if (!response.ok) throw new Error(`${url} answered ${response.status}`);
  return performance.now() - start;
}

/** Rounds of alternatives and health requests in alternation; the round with the median ratio of p50s is the figure. */
async function benchServer(base: string, sizes: Sizes): Promise<BenchRow[]> {
  const random = seededRandom(13);
  const alternatives = Array.from({ length: sizes.httpRequests }, () => {
    const original = randomOriginal(random);
    const query = new URLSearchParams({ size: original.size, loadIndex: String(original.loadIndex), speedSymbol: original.speedSymbol ?? "T" });
    if (original.loadRange) query.set("loadRange", original.loadRange);
    return new URL(`/api/v1/alternatives?${query}`, base).toString();
  });
  const health = new URL("/api/health", base).toString();
  for (const url of alternatives.slice(0, 20)) await Promise.all([timeRequest(url), timeRequest(health)]);
  const rounds: { alternatives: number; uncompressed: number; health: number; ratio: number }[] = [];
  for (let round = 0; round < HTTP_ROUNDS; round++) {
    const times = { alternatives: [] as number[], uncompressed: [] as number[], health: [] as number[] };
    for (const [i, url] of alternatives.entries()) {
      const requests = [
        async () => times.alternatives.push(await timeRequest(url)),
        async () => times.health.push(await timeRequest(health)),
        async () => times.uncompressed.push(await timeRequest(url, { "accept-encoding": "identity" })),
      ];
      for (const request of i % 2 === 0 ? requests : requests.toReversed()) await request();
    }
    const p50s = { alternatives: percentile(times.alternatives, 50), uncompressed: percentile(times.uncompressed, 50), health: percentile(times.health, 50) };
    rounds.push({ ...p50s, ratio: p50s.alternatives / p50s.health });
    console.log(
      `round ${round + 1}: GET /api/v1/alternatives p50 ${p50s.alternatives.toFixed(2)} ms (uncompressed ${p50s.uncompressed.toFixed(2)} ms), GET /api/health p50 ${p50s.health.toFixed(2)} ms (${sizes.httpRequests} each)`,
    );
  }
  const ratios = rounds.map((round) => round.ratio);
  const middle = rounds.find((round) => round.ratio === median(ratios)) ?? rounds[0]!;
  console.log(`alternatives ÷ health p50: median ${middle.ratio.toFixed(2)}, spread ${formatRange(ratios, (ratio) => ratio.toFixed(2))} over ${HTTP_ROUNDS} rounds`);
  const floor = { name: "/api/health p50", value: middle.health };
  return [
    ratioRow("GET /api/v1/alternatives p50, demo catalog", middle.alternatives, "ms", floor, 1.5),
    { ...ratioRow("GET /api/v1/alternatives p50 uncompressed, demo catalog", middle.uncompressed, "ms", floor, 1.5), goal: "reported", met: null },
  ];
}

async function benchProductionBuild(sizes: Sizes): Promise<BenchRow[]> {
  ensureProductionBuild();
  const dataDir = path.join(mkdtempSync(path.join(tmpdir(), "sidewise-bench-finder-")), "pglite");
  const server = await startProductionServer(dataDir);
  try {
    return await benchServer(server.url, sizes);
  } finally {
    await server.stop();
    rmSync(path.dirname(dataDir), { recursive: true, force: true });
  }
}

export const run: Bench = async ({ quick }) => {
  const sizes: Sizes = quick
    ? { searches: 150, httpRequests: 100, catalogs: [1_000, 10_000] }
    : { searches: 500, httpRequests: 200, catalogs: [1_000, 50_000] };
  return [...(await benchCatalogs(sizes)), ...(await benchProductionBuild(sizes))];
};

if (isMainModule(import.meta.url)) {
  const serverFlag = process.argv.indexOf("--server");
  const quick = process.argv.includes("--quick");
  if (serverFlag >= 0) {
    const server = process.argv[serverFlag + 1];
    if (!server) throw new Error("--server needs a URL, e.g. --server http://localhost:3000");
    console.log(`\n${formatTable(await benchServer(server, { searches: 0, httpRequests: 200, catalogs: [0, 0] }))}`);
  } else {
    console.log(`\n${formatTable(await run({ quick }))}`);
  }
}
