/**
 * `npm run bench:load`: the production build (built first if there is none) over a fresh embedded
 * database, under 50 connections for 30 s shared by three addresses at once: the finder's API, a
 * Size sheet page and the health check. Prints, for each, requests per second, p50 and p99 latency,
 * errors and non-2xx answers; and health's p99 under that load beside its p99 alone. Pass
 * `-- --server URL` to load a server that is already running. Quick mode (`npm run bench`) loads for 5 s.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import autocannon from "autocannon";
import { ensureProductionBuild, startProductionServer } from "./production-server";
import { type Bench, type BenchRow, runIfMain } from "./report";

const CONNECTIONS = 50;
const TARGETS = [
  { name: "GET /api/v1/alternatives", path: "/api/v1/alternatives?size=285-50R20&loadIndex=119&speedSymbol=S", connections: 17 },
  { name: "GET /size/285-50R20", path: "/size/285-50R20", connections: 17 },
  { name: "GET /api/health", path: "/api/health", connections: CONNECTIONS - 34 },
];

function load(url: string, connections: number, duration: number): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => {
    autocannon({ url, connections, duration }, (error, result) => (error ? reject(error) : resolve(result)));
  });
}

const ms = (value: number) => `${value.toFixed(1)} ms`;

export const run: Bench = async ({ quick }) => {
  const seconds = quick ? 5 : 30;
  const serverFlag = process.argv.indexOf("--server");
  const given = serverFlag >= 0 ? process.argv[serverFlag + 1] : undefined;
  let stop: () => Promise<void> = async () => undefined;
  let url = given;
  const dataDir = mkdtempSync(path.join(tmpdir(), "sidewise-load-"));
  if (!url) {
    ensureProductionBuild();
    const server = await startProductionServer(path.join(dataDir, "pglite"));
    url = server.url;
    stop = server.stop;
  }
  try {
    // Warm each address once, so that the first requests don't time the first compile of a route.
    for (const target of TARGETS) await fetch(`${url}${target.path}`);
    const alone = await load(`${url}/api/health`, 1, 5);
    console.log(`Load: ${CONNECTIONS} connections for ${seconds} s on ${url}, shared by three addresses at once\n`);
    const results = await Promise.all(TARGETS.map((target) => load(`${url}${target.path}`, target.connections, seconds)));
    console.log("address                                  conns  requests/s    p50        p99      errors  non-2xx");
    TARGETS.forEach((target, index) => {
      const result = results[index]!;
      console.log(
        `${target.name.padEnd(40)} ${String(target.connections).padStart(5)} ${result.requests.average.toFixed(0).padStart(11)} ${ms(result.latency.p50).padStart(10)} ${ms(result.latency.p99).padStart(10)} ${String(result.errors + result.timeouts).padStart(7)} ${String(result.non2xx).padStart(8)}`,
      );
    });
    const total = results.reduce((sum, result) => sum + result.requests.average, 0);
    const health = results[2]!;
    console.log(`\nall three: ${total.toFixed(0)} requests/s`);
    console.log(`GET /api/health p99: ${ms(health.latency.p99)} under load, ${ms(alone.latency.p99)} alone (1 connection, 5 s)`);
    const failed = results.reduce((sum, result) => sum + result.errors + result.timeouts + result.non2xx, 0);
    if (failed > 0) console.log("\nSome requests failed or answered other than 2xx: see the table.");
    const rows: BenchRow[] = [
      { figure: `load, ${CONNECTIONS} connections ${seconds} s: failed or non-2xx`, value: failed, unit: "requests", goal: "0", met: failed === 0 },
      { figure: "load: requests/s, three addresses together", value: total, unit: "/s", goal: "", met: null },
      {
        figure: "load: /api/health p99 under load",
        value: health.latency.p99,
        unit: "ms",
        floor: { name: "alone p99", value: alone.latency.p99 },
        ratio: health.latency.p99 / alone.latency.p99,
        goal: "",
        met: null,
      },
    ];
    return rows;
  } finally {
    await stop();
    rmSync(dataDir, { recursive: true, force: true });
  }
}

await runIfMain(import.meta.url, run);
