import { type APIRequestContext, expect, test } from "@playwright/test";
import { demoShopCharges } from "../../lib/demo/shop";
import { client, contractOf } from "./http";

// How many are on hand and what a set costs, seen from outside: over HTTP, against the production
// build seeded with the demo shop. The arithmetic is written out here from the demo shop's invented
// charges, not taken from the app's own estimate function.
const SEARCH = "/api/v1/alternatives?size=225-65R17&loadIndex=102&speedSymbol=H&tolerancePct=5&limit=500";

interface Tire {
  sku: string;
  priceCents: number;
  quantity: number;
  inStock: boolean;
  estimate?: Record<string, number>;
}
interface Answer {
  quantity: number;
  total: number;
  results: Tire[];
  nearMisses: Tire[];
  nextCursor: string | null;
  error?: { code: string; message: string; field?: string };
}

/** The estimate by hand: per-tire charges × quantity, 7.25 % on the tires, fitting and disposal (taxServices), half-up once. */
function byHand(priceCents: number, quantity: number) {
  const { fittingPerTireCents: fitting, disposalPerTireCents: disposal, tireFeePerTireCents: fee, taxRateBp: rate, taxServices } = demoShopCharges;
  const tiresCents = priceCents * quantity;
  const taxable = tiresCents + (taxServices ? (fitting + disposal) * quantity : 0);
  const taxCents = Math.floor((taxable * rate + 5_000) / 10_000);
  return { quantity, tiresCents, servicesCents: fitting * quantity, feesCents: (disposal + fee) * quantity, taxCents, totalCents: tiresCents + fitting * quantity + (disposal + fee) * quantity + taxCents };
}

let api: APIRequestContext;
let contractProblem: Awaited<ReturnType<typeof contractOf>>;

test.beforeAll(async ({ baseURL }) => {
  api = await client(baseURL!);
  contractProblem = await contractOf(api);
});

async function get(url: string): Promise<{ status: number; body: Answer }> {
  const response = await api.get(url);
  expect(await contractProblem("GET", url, response), `${url} as the OpenAPI document describes it`).toBeNull();
  return { status: response.status(), body: (await response.json()) as Answer };
}

test("every result says how many can be sold now and prices a set of four out the door from the shop's charges", async () => {
  const { status, body } = await get(SEARCH);
  expect(status).toBe(200);
  expect(body.quantity).toBe(4);
  expect(body.results.length).toBeGreaterThan(10);
  for (const tire of body.results) {
    expect(Number.isInteger(tire.quantity) && tire.quantity >= 0, tire.sku).toBe(true);
    expect(tire.inStock, tire.sku).toBe(tire.quantity >= 1);
    expect(tire.estimate, tire.sku).toEqual(byHand(tire.priceCents, 4));
  }
  // The demo shop's first line worked through: 4 × $182.99 → 73,196 + 10,000 fitting + 2,000 disposal and fees
  // + 6,148 tax (84,796 × 7.25 % = 6,147.71) = 91,344.
  expect(byHand(18_299, 4)).toEqual({ quantity: 4, tiresCents: 73_196, servicesCents: 10_000, feesCents: 2_000, taxCents: 6_148, totalCents: 91_344 });
});

/** Every page of a search, following nextCursor (other specs add items to the catalog as they run). */
async function everyPage(url: string): Promise<{ total: number; quantity: number; results: Tire[] }> {
  const first = await get(url);
  expect(first.status, url).toBe(200);
  const results = [...first.body.results];
  for (let cursor = first.body.nextCursor; cursor; ) {
    const page = await get(`${url}&cursor=${encodeURIComponent(cursor)}`);
    results.push(...page.body.results);
    cursor = page.body.nextCursor;
  }
  return { total: first.body.total, quantity: first.body.quantity, results };
}

for (const quantity of [1, 2, 4, 6, 8]) {
  test(`quantity=${quantity}: inStock=true keeps tires with ${quantity} or more, inStock=false those with fewer, and estimates are for ${quantity}`, async () => {
    const all = await everyPage(`${SEARCH}&quantity=${quantity}`);
    const enough = await everyPage(`${SEARCH}&quantity=${quantity}&inStock=true`);
    const short = await everyPage(`${SEARCH}&quantity=${quantity}&inStock=false`);
    for (const answer of [all, enough, short]) {
      expect(answer.quantity).toBe(quantity);
      expect(answer.results).toHaveLength(answer.total);
      for (const tire of answer.results) expect(tire.estimate, tire.sku).toEqual(byHand(tire.priceCents, quantity));
    }
    expect(enough.results.every((tire) => tire.quantity >= quantity)).toBe(true);
    expect(short.results.every((tire) => tire.quantity < quantity)).toBe(true);
    expect(enough.total + short.total).toBe(all.total);
    expect(enough.results.map((tire) => tire.sku)).toEqual(all.results.filter((tire) => tire.quantity >= quantity).map((tire) => tire.sku));
    expect(enough.total, "some tires have enough").toBeGreaterThan(0);
  });
}

for (const quantity of ["0", "9", "x", "2.5", "-1"]) {
  test(`quantity=${quantity} is refused with 400 invalid_parameter naming the field`, async () => {
    const { status, body } = await get(`${SEARCH}&quantity=${encodeURIComponent(quantity)}`);
    expect(status).toBe(400);
    expect(body.error).toEqual({ code: "invalid_parameter", field: "quantity", message: 'The parameter "quantity" is invalid: how many tires are needed, a whole number from 1 to 8.' });
  });
}

test("the catalog gives every tire its quantity, in stock meaning one or more", async () => {
  const response = await api.get("/api/v1/catalog?limit=500");
  expect(await contractProblem("GET", "/api/v1/catalog?limit=500", response)).toBeNull();
  const { items } = (await response.json()) as { items: Tire[] };
  expect(items).toHaveLength(500);
  for (const tire of items) expect([tire.sku, Number.isInteger(tire.quantity), tire.inStock]).toEqual([tire.sku, true, tire.quantity >= 1]);
  expect(new Set(items.map((tire) => Math.min(tire.quantity, 4))).size, "empty shelves, a few, and sets").toBe(5);
});
