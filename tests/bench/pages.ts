/**
 * `npm run bench:pages`: how long the pages that change with nothing a visitor sends take to answer,
 * against `/api/health` (which queries the database on every request) in the same run. The production
 * build (built first if there is none) over a fresh embedded database; each address is warmed, then
 * requested one at a time, the addresses interleaved (a different order each pass), for several
 * rounds. Prints each round's p50 per address, and rows with the median of the rounds' p50s, the
 * ratio to health's, and the spread of that ratio across rounds. Goal: ≤ 1.3 × for the Size sheet,
 * Sidewall school and a lesson; the home page (dynamic: it reads the address) is only reported.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { ensureProductionBuild, startProductionServer } from "./production-server";
import { type Bench, type BenchRow, formatRange, isMainModule, median, percentile, ratioRow, runIfMain } from "./report";

const FLOOR = "/api/health";
const GOAL_PAGES = ["/size/285-50R20", "/learn", "/learn/load-index"];
const REPORTED_PAGES = ["/"];
const PATHS = [FLOOR, ...GOAL_PAGES, ...REPORTED_PAGES];
const MAX_RATIO = 1.3;

interface Figures {
  /** Per address, each round's p50 in ms. */
  p50s: Map<string, number[]>;
  /** Per address, each round's p50 divided by the floor's p50 in that round. */
  ratios: Map<string, number[]>;
}

async function timeRequest(url: string): Promise<number> {
  const started = performance.now();
  const response = await fetch(url);
  await response.arrayBuffer();
  const elapsed = performance.now() - started;
  if (response.status !== 200) throw new Error(`${url} answered ${response.status}`);
  return elapsed;
}

/** Rotates the order each pass, so that no address always follows the same one. */
const rotated = <T>(values: readonly T[], by: number): T[] => values.map((_, index) => values[(index + by) % values.length]!);

async function measure(url: string, rounds: number, passes: number): Promise<Figures> {
  for (const address of PATHS) for (let i = 0; i < 5; i += 1) await timeRequest(`${url}${address}`);
  const p50s = new Map(PATHS.map((address) => [address, [] as number[]]));
  const ratios = new Map(PATHS.map((address) => [address, [] as number[]]));
  for (let round = 0; round < rounds; round += 1) {
    const samples = new Map(PATHS.map((address) => [address, [] as number[]]));
    for (let pass = 0; pass < passes; pass += 1) {
      for (const address of rotated(PATHS, pass)) samples.get(address)!.push(await timeRequest(`${url}${address}`));
    }
    const floor = percentile(samples.get(FLOOR)!, 50);
    for (const address of PATHS) {
      const p50 = percentile(samples.get(address)!, 50);
      p50s.get(address)!.push(p50);
      ratios.get(address)!.push(p50 / floor);
    }
  }
  return { p50s, ratios };
}

function rowsOf({ p50s, ratios }: Figures): BenchRow[] {
  const floor = { name: `${FLOOR} p50`, value: median(p50s.get(FLOOR)!) };
  const spread = (address: string) => `${formatRange(ratios.get(address)!, (ratio) => ratio.toFixed(2))} ×`;
  return [
    ...GOAL_PAGES.map((address) => ({ ...ratioRow(`GET ${address} p50 (ratio spread ${spread(address)})`, median(p50s.get(address)!), "ms", floor, MAX_RATIO) })),
    ...REPORTED_PAGES.map((address) => {
      const value = median(p50s.get(address)!);
      return { figure: `GET ${address} p50, dynamic (ratio spread ${spread(address)})`, value, unit: "ms", floor, ratio: value / floor.value, goal: "reported", met: null };
    }),
  ];
}

export const run: Bench = async ({ quick }) => {
  ensureProductionBuild();
  const dataDir = mkdtempSync(path.join(tmpdir(), "sidewise-bench-pages-"));
  const server = await startProductionServer(path.join(dataDir, "pglite"));
  try {
    const figures = await measure(server.url, quick ? 3 : 5, quick ? 40 : 120);
    if (isMainModule(import.meta.url)) printDetails(figures);
    return rowsOf(figures);
  } finally {
    await server.stop();
    rmSync(dataDir, { recursive: true, force: true });
  }
};

function printDetails({ p50s, ratios }: Figures): void {
  console.log("p50 per round, in ms (ratio to /api/health in the same round):");
  for (const address of PATHS) {
    const rounds = p50s.get(address)!.map((p50, round) => `${p50.toFixed(2)} (${ratios.get(address)![round]!.toFixed(2)} ×)`);
    console.log(`  ${address.padEnd(20)} ${rounds.join("  ")}`);
  }
  console.log("");
}

await runIfMain(import.meta.url, run);
