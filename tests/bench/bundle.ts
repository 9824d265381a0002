/**
 * First-load JavaScript of each page of the production build: the sum of the gzip -9 sizes of every
 * script the page's HTML references. Builds first when there is no build; serves it on a spare port.
 *   npm run bench:bundle [-- /path /other-path]
 */
import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { gzipSync } from "node:zlib";

const BARE_NEXT_PAGE_KB = 174;
const budgets: Record<string, number> = { "/": BARE_NEXT_PAGE_KB * 1.25 };
const defaultPages = ["/", "/compare", "/plus", "/replace", "/learn", "/counter"];
const pages = process.argv.slice(2).filter((arg) => arg.startsWith("/"));
const port = 3290;
const base = `http://localhost:${port}`;

if (!existsSync(".next/BUILD_ID")) {
  const build = spawnSync("npm", ["run", "build"], { stdio: "inherit" });
  if (build.status !== 0) process.exit(build.status ?? 1);
}

const server = spawn(process.execPath, ["node_modules/next/dist/bin/next", "start", "-p", String(port)], {
  env: { ...process.env, PGLITE_DATA_DIR: path.join(mkdtempSync(path.join(tmpdir(), "sidewise-bundle-")), "db") },
  stdio: "ignore",
});

async function waitForServer(): Promise<void> {
  for (let attempt = 0; attempt < 120; attempt++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  throw new Error("the production server did not start");
}

const scriptCache = new Map<string, number>();

async function gzippedSize(src: string): Promise<number> {
  const cached = scriptCache.get(src);
  if (cached !== undefined) return cached;
  const body = Buffer.from(await (await fetch(new URL(src, base))).arrayBuffer());
  const size = gzipSync(body, { level: 9 }).length;
  scriptCache.set(src, size);
  return size;
}

async function measure(page: string) {
  const html = await (await fetch(`${base}${page}`)).text();
  const sources = [...new Set([...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((match) => match[1]!))];
  const sizes = await Promise.all(sources.map(gzippedSize));
  return { scripts: sources.length, kb: sizes.reduce((sum, size) => sum + size, 0) / 1024 };
}

try {
  await waitForServer();
  let overBudget = false;
  console.log("page".padEnd(28) + "scripts  first-load JS (gzip -9)  budget");
  for (const page of pages.length > 0 ? pages : defaultPages) {
    const { scripts, kb } = await measure(page);
    const budget = budgets[page];
    const verdict = budget === undefined ? "" : `${budget.toFixed(0)} KB ${kb <= budget ? "ok" : "OVER"}`;
    if (budget !== undefined && kb > budget) overBudget = true;
    console.log(`${page.padEnd(28)}${String(scripts).padStart(7)}  ${kb.toFixed(1).padStart(10)} KB            ${verdict}`);
  }
  process.exitCode = overBudget ? 1 : 0;
} finally {
  server.kill();
}
