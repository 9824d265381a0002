/**
 * `npm run bench`: every bench in its quick mode, one after another, then one table of every figure
 * with the floor measured in the same run, the ratio, the goal and a verdict. A bench that fails to
 * run gets a row saying so. The exit code is 0 whatever the verdicts: CI prints this table after the
 * tests so that a regression shows in every log, without failing the run.
 */
import { ensureProductionBuild } from "./production-server";
import { type Bench, type BenchRow, formatTable } from "./report";

const benches: { name: string; load: () => Promise<{ run: Bench }> }[] = [
  { name: "decode", load: () => import("./decode") },
  { name: "pages", load: () => import("./pages") },
  { name: "bundle", load: () => import("./bundle") },
  { name: "lighthouse", load: () => import("./lighthouse") },
  { name: "finder", load: () => import("./finder") },
  { name: "import", load: () => import("./import") },
  { name: "load", load: () => import("./load") },
  { name: "durability", load: () => import("./durability") },
];

ensureProductionBuild();
const rows: BenchRow[] = [];
for (const bench of benches) {
  const started = performance.now();
  console.log(`bench:${bench.name} (quick)…`);
  try {
    const { run } = await bench.load();
    rows.push(...(await run({ quick: true })));
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    console.log(`bench:${bench.name} could not run: ${reason}`);
    rows.push({ figure: `bench:${bench.name} could not run`, value: 0, unit: "", goal: "runs", met: false });
  }
  console.log(`bench:${bench.name} took ${((performance.now() - started) / 1000).toFixed(0)} s`);
}
console.log(`\n${formatTable(rows)}`);
// A bench that could not run may leave a handle open (a server that never answered): the table is out, so end here.
process.exit(0);
