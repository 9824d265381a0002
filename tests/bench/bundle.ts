/**
 * First-load JavaScript of each public page of the production build beside a bare Next.js page built
 * in the same run with the same next and react (bare-next-app.ts): the sum of the gzip -9 sizes of
 * every script the page's HTML references. Goal: each page ≤ 1.15 × the bare page. Sizes do not vary
 * from run to run, so one measurement per page is the figure. Builds the app first when there is no
 * build; a Fit card for /s/{slug} is saved by the demo staff account.
 *   npm run bench:bundle            # prints every page's largest scripts, then the table
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { gzipSync } from "node:zlib";
import { startBareNextApp } from "./bare-next-app";
import { ensureProductionBuild, type RunningServer, startProductionServer } from "./production-server";
import { signInAsStaff } from "./sign-in";
import { type Bench, type BenchRow, formatTable, isMainModule, ratioRow } from "./report";

const MAX_RATIO = 1.15;
const FIT_CARD_PAGE = "/s/{slug}";
export const PUBLIC_PAGES = [
  "/",
  "/size/285-50R20",
  "/compare?sizes=265-70R17,285-70R17",
  "/plus?size=285-50R20",
  "/replace?size=285-50R20&loadIndex=119&speedSymbol=S",
  "/learn",
  FIT_CARD_PAGE,
  "/sign-in",
] as const;

interface Script {
  src: string;
  gzipBytes: number;
}

export interface FirstLoad {
  bytes: number;
  scripts: Script[];
}

const gzipCache = new Map<string, Promise<number>>();

const gzippedSize = (url: string): Promise<number> => {
  let size = gzipCache.get(url);
  if (!size) {
    size = fetch(url).then(async (answer) => gzipSync(Buffer.from(await answer.arrayBuffer()), { level: 9 }).length);
    gzipCache.set(url, size);
  }
  return size;
};

/** Every script the page's HTML references (the `noModule` polyfill included), gzip -9. */
export async function measureFirstLoad(base: string, page: string): Promise<FirstLoad> {
  const answer = await fetch(`${base}${page}`);
  if (!answer.ok) throw new Error(`${page} answered ${answer.status}`);
  const html = await answer.text();
  const sources = [...new Set([...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((match) => match[1]!))];
  const scripts = await Promise.all(sources.map(async (src) => ({ src, gzipBytes: await gzippedSize(new URL(src, base).href) })));
  return { bytes: scripts.reduce((sum, script) => sum + script.gzipBytes, 0), scripts };
}

/** Signs the demo staff account in and saves a Fit card, for a real /s/{slug} page. */
async function saveDemoFitCard(base: string): Promise<string> {
  const cookie = await signInAsStaff(base);
  const saved = await fetch(`${base}/api/v1/fit-cards`, {
    method: "POST",
    headers: { origin: base, "content-type": "application/json", "x-forwarded-for": "10.99.0.1", cookie },
    body: JSON.stringify({ sizes: ["285/50R20"], loadIndex: 119, speedSymbol: "S" }),
  });
  if (saved.status !== 201) throw new Error(`saving a Fit card answered ${saved.status}: ${await saved.text()}`);
  const { slug } = (await saved.json()) as { slug: string };
  return slug;
}

const kb = (bytes: number) => bytes / 1024;

export async function measurePages(app: RunningServer, bareUrl: string): Promise<{ floor: FirstLoad; pages: [string, FirstLoad][] }> {
  const floor = await measureFirstLoad(bareUrl, "/");
  const slug = await saveDemoFitCard(app.url);
  const pages: [string, FirstLoad][] = [];
  for (const page of PUBLIC_PAGES) pages.push([page, await measureFirstLoad(app.url, page.replace("{slug}", slug))]);
  return { floor, pages };
}

function printDetails(floor: FirstLoad, pages: [string, FirstLoad][]): void {
  console.log(`bare Next.js page: ${floor.scripts.length} scripts, ${kb(floor.bytes).toFixed(1)} KB`);
  for (const [page, load] of pages) {
    console.log(`\n${page}: ${load.scripts.length} scripts, ${kb(load.bytes).toFixed(1)} KB; largest:`);
    const largest = [...load.scripts].sort((a, b) => b.gzipBytes - a.gzipBytes).slice(0, 6);
    for (const script of largest) console.log(`  ${kb(script.gzipBytes).toFixed(1).padStart(6)} KB  ${script.src}`);
  }
  console.log();
}

async function measure(print: boolean): Promise<BenchRow[]> {
  ensureProductionBuild();
  const bare = await startBareNextApp();
  const dataFolder = mkdtempSync(path.join(tmpdir(), "sidewise-bundle-"));
  let app: RunningServer | undefined;
  try {
    app = await startProductionServer(path.join(dataFolder, "db"));
    const { floor, pages } = await measurePages(app, bare.server.url);
    if (print) printDetails(floor, pages);
    const floorRow = { name: "bare page", value: kb(floor.bytes) };
    return pages.map(([page, load]) => ratioRow(`first-load JS ${page}`, kb(load.bytes), "KB", floorRow, MAX_RATIO));
  } finally {
    await app?.stop();
    await bare.server.stop();
    rmSync(dataFolder, { recursive: true, force: true });
  }
}

/** Sizes do not change between runs, so quick and full measure the same once. */
export const run: Bench = async () => measure(false);

if (isMainModule(import.meta.url)) {
  const rows = await measure(true);
  console.log(formatTable(rows));
  process.exitCode = rows.every((row) => row.met) ? 0 : 1;
}
