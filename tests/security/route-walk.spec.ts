import type { APIRequestContext } from "@playwright/test";
import { expect, test } from "@playwright/test";
import { client, contractOf, errorShapeProblem, filesNamed, freshAddress } from "./http";
import {
  API_WALKS, type ApiWalk, BAD_BODIES, BAD_FIELD_VALUES, BAD_MULTIPART, BAD_PAGE_POSTS, BAD_PAGE_VALUES, BAD_QUERY_VALUES, BAD_SEGMENTS,
  type Caller, PAGE_WALKS,
} from "./route-walk-data";

// "Bad input never gets a 5xx": every route and page, walked with broken encodings, control
// characters, wrong types and oversize bodies, must answer below 500, and the API in its error shape
// with a status and body its OpenAPI document describes.
test.describe.configure({ mode: "serial" });
test.setTimeout(600_000);

interface Probe {
  method: string;
  url: string;
  as?: Caller;
  headers?: Record<string, string>;
  body?: string | Buffer;
}

const IN_FLIGHT = 4;
let walked = 0;
let clients: Record<Caller, APIRequestContext>;
let contractProblem: Awaited<ReturnType<typeof contractOf>>;

/** Sends the probes a few at a time and answers every one that got a 5xx or broke the error shape. */
async function walk(probes: Probe[]): Promise<string[]> {
  const problems: string[] = [];
  let next = 0;
  const worker = async () => {
    while (next < probes.length) {
      const probe = probes[next++]!;
      const response = await clients[probe.as ?? "anonymous"].fetch(probe.url, {
        method: probe.method,
        headers: { "x-forwarded-for": freshAddress(), ...probe.headers },
        data: probe.body,
        maxRedirects: 0,
        failOnStatusCode: false,
      });
      walked += 1;
      const label = `${probe.method} ${probe.url.slice(0, 140)}${probe.body === undefined ? "" : ` ${String(probe.body).slice(0, 60)}`}`;
      if (response.status() >= 500) problems.push(`${response.status()} ${label}`);
      const shape = await errorShapeProblem(probe.url, response);
      if (shape) problems.push(`${label}: ${shape}`);
      const contract = await contractProblem(probe.method, probe.url, response);
      if (contract) problems.push(contract);
    }
  };
  await Promise.all(Array.from({ length: IN_FLIGHT }, worker));
  return problems;
}

const withSegment = (path: string, segment: string) => path.replace(/\{\w+\}/g, segment);
const sample: Record<string, string> = { token: "not-a-token", sku: "NO-SUCH-SKU", slug: "N".repeat(24), id: "1", topic: "load-index", size: "285-50R20" };
const samplePath = (path: string) => path.replace(/\{(\w+)\}/g, (_, name: string) => sample[name] ?? "x");

function apiProbes({ method, path, as, query, body, multipart }: ApiWalk): Probe[] {
  const probes: Probe[] = [];
  const json = { "content-type": "application/json" };
  if (path.includes("{")) for (const segment of BAD_SEGMENTS) probes.push({ method, url: withSegment(path, segment), as, ...(body ? { headers: json, body: JSON.stringify(body) } : {}) });
  const url = samplePath(path);
  if (query) {
    for (const name of query.names) {
      for (const value of BAD_QUERY_VALUES) probes.push({ method, as, url: `${url}?${[query.base, `${name}=${value}`].filter(Boolean).join("&")}` });
    }
  }
  if (body) {
    for (const field of Object.keys(body)) {
      for (const value of BAD_FIELD_VALUES) probes.push({ method, url, as, headers: json, body: JSON.stringify({ ...body, [field]: value }) });
    }
    probes.push({ method, url, as, headers: json, body: JSON.stringify({ ...body, "extra\u0000field": 1 }) });
  }
  if (method !== "GET") {
    for (const bad of multipart ? BAD_MULTIPART : BAD_BODIES) probes.push({ method, url, as, headers: bad.type ? { "content-type": bad.type } : {}, body: bad.body });
  }
  // Methods the route does not take answer 405, never 5xx.
  if (method === "GET") for (const other of ["PUT", "OPTIONS"]) probes.push({ method: other, url, as });
  return probes;
}

function pageProbes({ path, as, names = [] }: { path: string; as?: Caller; names?: string[] }): Probe[] {
  const probes: Probe[] = [];
  if (path.includes("{")) for (const segment of BAD_SEGMENTS) probes.push({ method: "GET", url: withSegment(path, segment), as });
  const url = samplePath(path);
  for (const name of names) for (const value of BAD_PAGE_VALUES) probes.push({ method: "GET", url: `${url}?${name}=${value}`, as });
  for (const post of BAD_PAGE_POSTS) probes.push({ method: "POST", url, as, headers: post.headers, body: post.body });
  return probes;
}

test.beforeAll(async ({ baseURL }) => {
  clients = { anonymous: await client(baseURL!), staff: await client(baseURL!, "staff@sidewise.test"), admin: await client(baseURL!, "admin@sidewise.test") };
  const catalog = await (await clients.anonymous.get("/api/v1/catalog?limit=1")).json();
  sample.sku = catalog.items[0].sku;
  contractProblem = await contractOf(clients.anonymous);
});

test.afterAll(async () => {
  console.log(`Walked ${walked} malformed requests over HTTP: none answered 5xx.`);
  await Promise.all(Object.values(clients ?? {}).map((context) => context.dispose()));
});

test("every API route file and every page is in the walk", () => {
  expect(filesNamed("api", /^route\.ts$/)).toEqual(Object.keys(API_WALKS).sort());
  const pages = filesNamed(".", /^(page|opengraph-image)\.tsx$/).filter((file) => !file.startsWith("api/"));
  expect(pages).toEqual(Object.keys(PAGE_WALKS).sort());
});

for (const [file, walks] of Object.entries(API_WALKS)) {
  test(`app/api/${file} answers every malformed request below 500, in the error shape`, async () => {
    expect(await walk(walks.flatMap(apiProbes))).toEqual([]);
  });
}

test("every page answers broken addresses, bad parameters and foreign or malformed posts below 500", async () => {
  expect(await walk(Object.values(PAGE_WALKS).flatMap(pageProbes))).toEqual([]);
});
