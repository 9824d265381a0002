import { type APIRequestContext, type APIResponse, expect, test } from "@playwright/test";
import { demoShopCharges } from "../../lib/demo/shop";
import { client, contractOf } from "./http";

// An offer's path from outside, over HTTP against the production build with the demo shop: staff
// send an offer for a seeded request, a driver with no account reads it by its token, lists the free
// times and accepts one, the held tires leave what the finder can sell, and a second accept is refused.
test.describe.configure({ mode: "serial" });

const SEARCH = "/api/v1/alternatives?size=225-65R17&loadIndex=102&speedSymbol=H&tolerancePct=5&inStock=true&quantity=4&limit=500";

interface Tire {
  sku: string;
  priceCents: number;
  quantity: number;
}
interface Slot {
  start: string;
  end: string;
}

/** The estimate by hand from the demo shop's invented charges: per-tire charges × 4, 7.25 % on tires, fitting and disposal, half-up once. */
function byHand(priceCents: number, quantity: number) {
  const { fittingPerTireCents: fitting, disposalPerTireCents: disposal, tireFeePerTireCents: fee, taxRateBp: rate } = demoShopCharges;
  const tiresCents = priceCents * quantity;
  const taxCents = Math.floor(((tiresCents + (fitting + disposal) * quantity) * rate + 5_000) / 10_000);
  return { quantity, tiresCents, servicesCents: fitting * quantity, feesCents: (disposal + fee) * quantity, taxCents, totalCents: tiresCents + (fitting + disposal + fee) * quantity + taxCents };
}

let staff: APIRequestContext;
let driver: APIRequestContext;
let contractProblem: Awaited<ReturnType<typeof contractOf>>;
let token: string;
let tire: Tire;

test.beforeAll(async ({ baseURL }) => {
  [staff, driver] = await Promise.all([client(baseURL!, "staff@sidewise.test"), client(baseURL!)]);
  contractProblem = await contractOf(driver);
});

test.afterAll(async () => {
  await Promise.all([staff, driver].map((context) => context?.dispose()));
});

async function described(method: string, url: string, response: APIResponse) {
  expect(await contractProblem(method, url, response), `${method} ${url} as the OpenAPI document describes it`).toBeNull();
  return { status: response.status(), body: await response.json() };
}

/** What the finder says can be sold of a tire, following every page of the search without a stock filter. */
async function finderQuantity(sku: string): Promise<number | undefined> {
  const base = SEARCH.replace("&inStock=true", "");
  for (let url: string | null = base; url; ) {
    const { body } = await described("GET", url, await driver.get(url));
    const found = (body.results as Tire[]).find((result) => result.sku === sku);
    if (found) return found.quantity;
    url = body.nextCursor ? `${base}&cursor=${encodeURIComponent(body.nextCursor)}` : null;
  }
  return undefined;
}

test("staff send an offer for a seeded request, priced out the door and frozen", async () => {
  const requests = await described("GET", "/api/v1/quote-requests", await staff.get("/api/v1/quote-requests"));
  const request = (requests.body.requests as { id: number; status: string }[]).find((item) => item.status === "new");
  expect(request, "the demo seed holds a new request").toBeTruthy();
  const { body: found } = await described("GET", SEARCH, await driver.get(SEARCH));
  tire = (found.results as Tire[]).find((result) => result.quantity >= 4 && result.quantity < 8)!;
  expect(tire, "a tire with a set of four and fewer than two sets").toBeTruthy();

  const url = `/api/v1/quote-requests/${request!.id}/offers`;
  const sent = await described("POST", url, await staff.post(url, { data: { lines: [{ sku: tire.sku, quantity: 4 }], message: "Fitting included." } }));
  expect(sent.status).toBe(201);
  token = sent.body.token;
  // 128 random bits or more: base64url carries 6 bits a character.
  expect(token).toMatch(/^[A-Za-z0-9_-]{22,}$/);
  expect(sent.body.url).toMatch(new RegExp(`/o/${token}$`));
  expect(sent.body.estimate).toEqual(byHand(tire.priceCents, 4));
});

test("anyone with the token reads the offer, with no staff names", async () => {
  const read = await described("GET", `/api/v1/offers/${token}`, await driver.get(`/api/v1/offers/${token}`));
  expect(read.status).toBe(200);
  expect(read.body).toMatchObject({ status: "open", message: "Fitting included.", estimate: byHand(tire.priceCents, 4), timeZone: "America/New_York" });
  expect(read.body.lines).toEqual([expect.objectContaining({ quantity: 4, priceCents: tire.priceCents, tire: expect.objectContaining({ sku: tire.sku }) })]);
  expect(JSON.stringify(read.body)).not.toMatch(/Ollie|Brandvold|staff@sidewise/);
});

test("a driver accepts a free time: the tires are held and leave what the finder can sell; a second accept is refused", async () => {
  const before = await finderQuantity(tire.sku);
  const listed = await described("GET", `/api/v1/offers/${token}/slots`, await driver.get(`/api/v1/offers/${token}/slots`));
  expect(listed.status).toBe(200);
  const slots = listed.body.slots as Slot[];
  expect(slots.length).toBeGreaterThan(0);
  for (const slot of slots) expect(slot.start).toMatch(/T\d\d:\d\d:\d\d[-+]\d\d:\d\d$/);

  const accept = `/api/v1/offers/${token}/accept`;
  const accepted = await described("POST", accept, await driver.post(accept, { data: { slotStart: slots[0]!.start } }));
  expect(accepted).toEqual({ status: 200, body: { status: "accepted", appointment: slots[0] } });
  expect(before).toBe(tire.quantity);
  expect(await finderQuantity(tire.sku)).toBe(before! - 4);

  const again = await described("POST", accept, await driver.post(accept, { data: { slotStart: slots[1]?.start ?? slots[0]!.start } }));
  expect([again.status, again.body.error.code]).toEqual([409, "already_accepted"]);
  const read = await described("GET", `/api/v1/offers/${token}`, await driver.get(`/api/v1/offers/${token}`));
  expect(read.body).toMatchObject({ status: "accepted", appointment: slots[0] });
});

test("an unknown token is 404, and a malformed one too", async () => {
  for (const unknown of ["N".repeat(32), "not-a-token!"]) {
    const url = `/api/v1/offers/${encodeURIComponent(unknown)}`;
    const read = await described("GET", url, await driver.get(url));
    expect([read.status, read.body.error.code]).toEqual([404, "not_found"]);
  }
  const accept = `/api/v1/offers/${"N".repeat(32)}/accept`;
  const refused = await described("POST", accept, await driver.post(accept, { data: { slotStart: "2026-12-08T09:30:00-05:00" } }));
  expect(refused.status).toBe(404);
});
