/**
 * Lighthouse (mobile: its default form factor and simulated throttling) on the production build's
 * busiest public pages beside a bare Next.js page built in the same run (bare-next-app.ts), run in
 * turn so the machine's load falls on both alike; the median of 3 runs per page (1 with `quick`).
 * Goals: performance ≥ 90 and within 6 points of the bare page; accessibility, best practices and
 * SEO 100. LCP and TBT are reported beside the bare page's. Debian's Chromium, headless.
 *   npm run build && npm run bench:lighthouse
 * LIGHTHOUSE_REPORT_DIR=<folder> also writes each run's whole report there (`<page>-<round>.json`):
 * the LCP element and its phases, the long tasks and the network requests behind the figures.
 */
import { type ChildProcess, spawn } from "node:child_process";
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import lighthouse from "lighthouse";
import { type BareNextApp, startBareNextApp } from "./bare-next-app";
import { ensureProductionBuild, freePort, type RunningServer, startProductionServer, waitForAnswer } from "./production-server";
import { type Bench, type BenchRow, formatRange, formatTable, isMainModule, median } from "./report";

export const LIGHTHOUSE_PAGES = ["/", "/size/285-50R20", "/compare?sizes=265-70R17,285-70R17", "/replace?size=285-50R20&loadIndex=119&speedSymbol=S"] as const;
const CATEGORIES = ["performance", "accessibility", "best-practices", "seo"] as const;
const MIN_PERFORMANCE = 90;
const MAX_BEHIND_BARE = 6;
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const REPORT_DIR = process.env.LIGHTHOUSE_REPORT_DIR;

type Category = (typeof CATEGORIES)[number];

interface Audit {
  scores: Record<Category, number>;
  lcpMs: number;
  tbtMs: number;
  /** Titles of the audits that did not pass, with their figure where there is one: what to fix. */
  findings: string[];
}

interface Chromium {
  port: number;
  stop: () => Promise<void>;
}

async function startChromium(): Promise<Chromium> {
  const port = await freePort();
  const profile = mkdtempSync(path.join(tmpdir(), "sidewise-lighthouse-"));
  const child: ChildProcess = spawn(
    CHROMIUM,
    ["--headless=new", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", `--remote-debugging-port=${port}`, `--user-data-dir=${profile}`, "about:blank"],
    // Its own process group: Debian's chromium is a shell script, and the browser it starts must end with it.
    { stdio: "ignore", detached: true },
  );
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const stop = async () => {
    process.kill(-child.pid!, "SIGTERM");
    await exited;
    // Chromium's helpers may still be writing to the profile for a moment after the script exits.
    rmSync(profile, { recursive: true, force: true, maxRetries: 20, retryDelay: 250 });
  };
  try {
    await waitForAnswer(`http://127.0.0.1:${port}/json/version`, 30_000);
  } catch (error) {
    await stop();
    throw error;
  }
  return { port, stop };
}

/** The report's file name: the page's path with its query, in characters any file system takes. */
const reportName = (page: string, round: number) => `${page.replace(/^\//, "").replace(/[^\w.-]+/g, "_") || "home"}-${round + 1}.json`;

async function audit(url: string, port: number, reportFile?: string): Promise<Audit> {
  const result = await lighthouse(url, { port, output: "json", logLevel: "error", onlyCategories: [...CATEGORIES] });
  if (!result) throw new Error(`Lighthouse gave no result for ${url}`);
  const { lhr } = result;
  if (reportFile) writeFileSync(reportFile, JSON.stringify(lhr));
  if (lhr.runtimeError) throw new Error(`Lighthouse could not audit ${url}: ${lhr.runtimeError.message}`);
  const scores = Object.fromEntries(CATEGORIES.map((id) => [id, Math.round((lhr.categories[id]?.score ?? 0) * 100)])) as Record<Category, number>;
  const findings = Object.values(lhr.audits)
    .filter((item) => item.score !== null && item.score < 0.9 && item.scoreDisplayMode !== "informative" && item.scoreDisplayMode !== "notApplicable")
    .map((item) => `${item.title}${item.displayValue ? ` (${item.displayValue})` : ""}`);
  return { scores, lcpMs: lhr.audits["largest-contentful-paint"]?.numericValue ?? Number.NaN, tbtMs: lhr.audits["total-blocking-time"]?.numericValue ?? Number.NaN, findings };
}

interface PageRuns {
  page: string;
  runs: Audit[];
}

const medianOf = (runs: Audit[], pick: (run: Audit) => number) => median(runs.map(pick));
const spread = (runs: Audit[], pick: (run: Audit) => number) => formatRange(runs.map(pick));

function rowsFor({ page, runs }: PageRuns, bare: Audit[]): BenchRow[] {
  const performance = medianOf(runs, (run) => run.scores.performance);
  const barePerformance = medianOf(bare, (run) => run.scores.performance);
  const rows: BenchRow[] = [
    {
      figure: `${page} performance`,
      value: performance,
      unit: "",
      floor: { name: "bare page", value: barePerformance },
      ratio: performance / barePerformance,
      goal: `≥ ${MIN_PERFORMANCE} and ≥ bare − ${MAX_BEHIND_BARE}`,
      met: performance >= MIN_PERFORMANCE && performance >= barePerformance - MAX_BEHIND_BARE,
    },
  ];
  for (const category of ["accessibility", "best-practices", "seo"] as const) {
    const score = medianOf(runs, (run) => run.scores[category]);
    rows.push({ figure: `${page} ${category}`, value: score, unit: "", goal: "100", met: score === 100 });
  }
  for (const [name, pick] of [
    ["LCP", (run: Audit) => run.lcpMs],
    ["TBT", (run: Audit) => run.tbtMs],
  ] as const) {
    const value = medianOf(runs, pick);
    const floor = medianOf(bare, pick);
    rows.push({ figure: `${page} ${name}`, value, unit: "ms", floor: { name: "bare page", value: floor }, ratio: floor > 0 ? value / floor : undefined, goal: "reported", met: null });
  }
  return rows;
}

function printDetails(all: PageRuns[]): void {
  for (const { page, runs } of all) {
    console.log(`\n${page}`);
    for (const category of CATEGORIES) console.log(`  ${category.padEnd(15)} median ${medianOf(runs, (run) => run.scores[category])}  runs ${spread(runs, (run) => run.scores[category])}`);
    console.log(`  LCP ms          median ${Math.round(medianOf(runs, (run) => run.lcpMs))}  runs ${spread(runs, (run) => Math.round(run.lcpMs))}`);
    console.log(`  TBT ms          median ${Math.round(medianOf(runs, (run) => run.tbtMs))}  runs ${spread(runs, (run) => Math.round(run.tbtMs))}`);
    const findings = [...new Set(runs.flatMap((run) => run.findings))];
    if (findings.length > 0) console.log(`  not passed in some run:\n${findings.map((finding) => `    - ${finding}`).join("\n")}`);
  }
  console.log();
}

async function measure(quick: boolean, print: boolean): Promise<BenchRow[]> {
  ensureProductionBuild();
  const rounds = quick ? 1 : 3;
  const dataFolder = mkdtempSync(path.join(tmpdir(), "sidewise-lighthouse-db-"));
  let bare: BareNextApp | undefined;
  let app: RunningServer | undefined;
  let chromium: Chromium | undefined;
  try {
    bare = await startBareNextApp();
    app = await startProductionServer(path.join(dataFolder, "db"));
    chromium = await startChromium();
    const targets = [{ page: "bare page", url: `${bare.server.url}${bare.page}` }, ...LIGHTHOUSE_PAGES.map((page) => ({ page, url: `${app!.url}${page}` }))];
    // One unmeasured visit each, so the first audited load does not pay for the server's first render.
    for (const target of targets) await fetch(target.url);
    const runs = new Map(targets.map((target) => [target.page, [] as Audit[]]));
    if (REPORT_DIR) mkdirSync(REPORT_DIR, { recursive: true });
    for (let round = 0; round < rounds; round++) {
      for (const target of targets) {
        const reportFile = REPORT_DIR ? path.join(REPORT_DIR, reportName(target.page, round)) : undefined;
        runs.get(target.page)!.push(await audit(target.url, chromium.port, reportFile));
      }
    }
    const all = targets.map((target) => ({ page: target.page, runs: runs.get(target.page)! }));
    if (print) printDetails(all);
    const bareRuns = all[0]!.runs;
    return all.slice(1).flatMap((page) => rowsFor(page, bareRuns));
  } finally {
    await chromium?.stop();
    await app?.stop();
    await bare?.server.stop();
    rmSync(dataFolder, { recursive: true, force: true });
  }
}

export const run: Bench = async ({ quick }) => measure(quick, false);

if (isMainModule(import.meta.url)) {
  const rows = await measure(process.argv.includes("--quick"), true);
  console.log(formatTable(rows));
  process.exitCode = rows.every((row) => row.met !== false) ? 0 : 1;
}
