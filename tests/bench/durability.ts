/**
 * `npm run bench:durability`: nothing the app acknowledged is lost when its process dies. Starts
 * the production build (built first if there is none) over a fresh embedded database; 16 clients
 * write catalog items (as staff) and Ask the shop requests at once; the server is killed with
 * SIGKILL mid-load three times and restarted on the same folder. Then every acknowledged write
 * (201) must be found. Prints acknowledged vs found, the writes whose answer the kill cut off, and
 * how long each restart took to answer again. Quick mode (`npm run bench`) kills once.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { ensureProductionBuild, type RunningServer, startProductionServer } from "./production-server";
import { type Bench, type BenchRow, runIfMain } from "./report";
import { signInAsStaff } from "./sign-in";

const CLIENTS = 16;
const WRITES_BEFORE_KILL = 150;
const SERVER_ENV = { QUOTE_LIMIT_PER_ADDRESS: "10000", RESEND_BASE_URL: "", RESEND_API_KEY: "" };

interface Acknowledged {
  skus: Set<string>;
  emails: Set<string>;
}

/** A form token at least 3 s old, which the server then takes for a day. */
async function agedFormToken(url: string): Promise<string> {
  const { renderedAt } = (await (await fetch(`${url}/api/v1/quote-requests/form-token`)).json()) as { renderedAt: string };
  const openedAt = Number(renderedAt.split(".")[0]);
  while (Date.now() - openedAt < 3100) await new Promise((resolve) => setTimeout(resolve, 100));
  return renderedAt;
}

/** One client: writes until the server stops answering, counting only what it acknowledged. */
async function client(index: number, url: string, cookie: string, token: string, line: { brand: string; line: string }, round: number, ack: Acknowledged, written: { count: number }) {
  const headers = { origin: url, "content-type": "application/json", "x-forwarded-for": `10.98.${index}.1` };
  for (let n = 0; ; n += 1) {
    const sku = `DUR-${round}-${index}-${n}`;
    const email = `durable.${round}.${index}.${n}@example.test`;
    try {
      const item = await fetch(`${url}/api/v1/catalog`, {
        method: "POST",
        headers: { ...headers, cookie },
        body: JSON.stringify({ sku, ...line, designation: "205/55R16", loadIndex: 91, speedSymbol: "V", priceCents: 10_000 + n, quantity: 4 }),
      });
      if (item.status === 201) ack.skus.add(sku);
      const quote = await fetch(`${url}/api/v1/quote-requests`, {
        method: "POST",
        headers,
        body: JSON.stringify({ name: "Durable Driver", email, vehicle: "2019 family SUV", tires: "205/55R16", source: "finder", website: "", renderedAt: token }),
      });
      if (quote.status === 201) ack.emails.add(email);
      written.count += 2;
    } catch {
      return; // The server is gone: whatever was in flight is neither acknowledged nor counted.
    }
  }
}

async function timedStart(dataDir: string): Promise<{ server: RunningServer; seconds: number }> {
  const started = performance.now();
  const server = await startProductionServer(dataDir, SERVER_ENV);
  return { server, seconds: (performance.now() - started) / 1000 };
}

async function allSkus(url: string): Promise<Set<string>> {
  const found = new Set<string>();
  let cursor = "";
  for (;;) {
    const page = (await (await fetch(`${url}/api/v1/catalog?limit=500${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ""}`)).json()) as { items: { sku: string }[]; nextCursor: string | null };
    for (const item of page.items) found.add(item.sku);
    if (!page.nextCursor) return found;
    cursor = page.nextCursor;
  }
}

async function allRequestEmails(url: string, cookie: string): Promise<Set<string>> {
  const found = new Set<string>();
  for (let page = 1; ; page += 1) {
    const listing = (await (await fetch(`${url}/api/v1/quote-requests?page=${page}`, { headers: { cookie } })).json()) as { requests: { email: string }[]; pageCount: number };
    for (const request of listing.requests) found.add(request.email);
    if (page >= listing.pageCount) return found;
  }
}

export const run: Bench = async ({ quick }) => {
  const kills = quick ? 1 : 3;
  ensureProductionBuild();
  const folder = mkdtempSync(path.join(tmpdir(), "sidewise-durability-"));
  const dataDir = path.join(folder, "pglite");
  const ack: Acknowledged = { skus: new Set(), emails: new Set() };
  const restarts: number[] = [];
  let { server, seconds } = await timedStart(dataDir);
  console.log(`First start on a fresh database (migrate and seed): ${seconds.toFixed(1)} s`);
  try {
    for (let round = 1; round <= kills; round += 1) {
      const cookie = await signInAsStaff(server.url);
      const { items } = (await (await fetch(`${server.url}/api/v1/catalog?limit=1`)).json()) as { items: { brand: string; line: string }[] };
      const line = { brand: items[0]!.brand, line: items[0]!.line };
      const token = await agedFormToken(server.url);
      const written = { count: 0 };
      const clients = Array.from({ length: CLIENTS }, (_, index) => client(index, server.url, cookie, token, line, round, ack, written));
      while (written.count < WRITES_BEFORE_KILL) await new Promise((resolve) => setTimeout(resolve, 20));
      await server.kill();
      await Promise.all(clients);
      ({ server, seconds } = await timedStart(dataDir));
      restarts.push(seconds);
      console.log(`kill -9 #${round} after ${written.count}+ writes; restarted on the same folder, answering in ${seconds.toFixed(1)} s`);
    }
    const cookie = await signInAsStaff(server.url);
    const [skus, emails] = [await allSkus(server.url), await allRequestEmails(server.url, cookie)];
    const lostSkus = [...ack.skus].filter((sku) => !skus.has(sku));
    const lostEmails = [...ack.emails].filter((email) => !emails.has(email));
    const unacknowledged = [...skus].filter((sku) => sku.startsWith("DUR-") && !ack.skus.has(sku)).length + [...emails].filter((email) => email.startsWith("durable.") && !ack.emails.has(email)).length;
    console.log(`\ncatalog items:  acknowledged ${ack.skus.size}, found ${ack.skus.size - lostSkus.length}`);
    console.log(`quote requests: acknowledged ${ack.emails.size}, found ${ack.emails.size - lostEmails.length}`);
    console.log(`written but cut off before the answer (found, not acknowledged): ${unacknowledged}`);
    console.log(`restart after kill -9: ${restarts.map((value) => `${value.toFixed(1)} s`).join(", ")}`);
    const lost = lostSkus.length + lostEmails.length;
    if (lost > 0) console.log(`LOST: ${[...lostSkus, ...lostEmails].slice(0, 20).join(", ")}`);
    const rows: BenchRow[] = [
      { figure: `writes lost to ${kills} × kill -9 (of ${ack.skus.size + ack.emails.size} acknowledged)`, value: lost, unit: "writes", goal: "0", met: lost === 0 },
      { figure: "restart after kill -9, slowest", value: Math.max(...restarts), unit: "s", goal: "", met: null },
    ];
    return rows;
  } finally {
    await server.stop();
    rmSync(folder, { recursive: true, force: true });
  }
}

await runIfMain(import.meta.url, run);
