import fc from "fast-check";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getAlternatives } from "@/app/api/v1/alternatives/route";
import { GET as getCatalog } from "@/app/api/v1/catalog/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { checkContract } from "../helpers/contract";
import { stockItem } from "@/db/schema";
import { demoShopCharges } from "@/lib/demo/shop";
import { estimateSet } from "@/lib/money/estimate";

// Outside a Next.js request `connection()` throws; here every call is a request of its own.
vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
vi.mock("next/cache", () => import("../helpers/next-cache-outside-server"));

const TIRE_KEYS = [
  "sku", "brand", "line", "designation", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "extraLoad",
  "runFlat", "season", "terrain", "threePeak", "treadDepth32", "overallDiameterMm", "priceCents", "quantity", "inStock",
].sort();

async function call(handler: (request: NextRequest) => Promise<Response>, path: string) {
  const request = new NextRequest(`http://localhost${path}`);
  const response = await checkContract(request, await handler(request));
  return { status: response.status, body: await response.json() };
}
const alternatives = (query: string) => call(getAlternatives, `/api/v1/alternatives?${query}`);
const catalog = (query: string) => call(getCatalog, `/api/v1/catalog?${query}`);

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  await getDb();
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("GET /api/v1/catalog", () => {
  it("pages through the whole current catalog in plain SKU order", async () => {
    const first = await catalog("cursor=&limit=");
    expect(first.status).toBe(200);
    expect(first.body.items).toHaveLength(50);
    expect(Object.keys(first.body.items[0]).sort()).toEqual(TIRE_KEYS);
    const skus: string[] = [];
    let cursor = "";
    do {
      const page = await catalog(`limit=500&cursor=${cursor}`);
      skus.push(...page.body.items.map((tire: { sku: string }) => tire.sku));
      cursor = page.body.nextCursor ?? "";
    } while (cursor);
    expect(skus.length).toBeGreaterThan(2300);
    expect(skus.every((sku, i) => i === 0 || (skus[i - 1] as string) < sku)).toBe(true);
  });

  it("says how many of each tire can be sold now (on hand less those held for booked fittings), in stock meaning one or more", async () => {
    const { body } = await catalog("limit=500");
    const rows = await (await getDb()).select({ sku: stockItem.sku, onHand: stockItem.quantityOnHand, held: stockItem.heldQuantity }).from(stockItem);
    const sellable = new Map(rows.map((row) => [row.sku, row.onHand - row.held]));
    const items = body.items as { sku: string; quantity: number; inStock: boolean }[];
    for (const tire of items) {
      expect(tire.quantity, tire.sku).toBe(sellable.get(tire.sku));
      expect(tire.inStock, tire.sku).toBe(tire.quantity >= 1);
    }
    // The demo shop's booked fittings hold some tires (lib/demo/requests.ts).
    expect(rows.some((row) => row.held > 0)).toBe(true);
    // The demo shelf holds empty slots, single tires and several sets.
    expect(items.some((tire) => tire.quantity === 0)).toBe(true);
    expect(items.some((tire) => tire.quantity > 0 && tire.quantity < 4)).toBe(true);
    expect(items.some((tire) => tire.quantity >= 8)).toBe(true);
  });

  it.each(["limit=0", "limit=501", "limit=ten", "cursor=not-a-cursor"])("refuses %s with 400 invalid_parameter", async (query) => {
    const { status, body } = await catalog(query);
    expect(status).toBe(400);
    expect(body.error.code).toBe("invalid_parameter");
  });
});

describe("GET /api/v1/alternatives", () => {
  it("answers the published shape, with the shop's tolerance and reasons for every result", async () => {
    const { status, body } = await alternatives("size=285-50R20&loadIndex=112&speedSymbol=H&limit=5");
    expect(status).toBe(200);
    expect(Object.keys(body).sort()).toEqual(["nearMisses", "nextCursor", "original", "quantity", "results", "tolerancePct", "total"]);
    // 285/50R20: 20 × 25.4 + 2 × 285 × 0.50 = 793 mm (nominal geometry).
    expect(body.original).toEqual({ designation: "285/50R20", overallDiameterMm: 793, loadIndex: 112, speedSymbol: "H", loadRange: null });
    expect(body.tolerancePct).toBe(3);
    expect(body.results).toHaveLength(5);
    expect(body.total).toBeGreaterThan(5);
    for (const tire of body.results) {
      expect(Object.keys(tire).sort()).toEqual([...TIRE_KEYS, "diameterDiffPct", "estimate", "notes", "reasons"].sort());
      expect(Math.abs(tire.diameterDiffPct)).toBeLessThanOrEqual(3);
      expect(tire.reasons).toContain("same 20-inch rim");
    }
    expect(body.nearMisses.length).toBeLessThanOrEqual(20);
    for (const miss of body.nearMisses) expect(Object.keys(miss).sort()).toEqual([...TIRE_KEYS, "diameterDiffPct", "failed"].sort());
  });

  it("reads the size as a URL slug or as it is usually written", async () => {
    for (const [size, designation] of [
      ["285-50R20", "285/50R20"],
      ["285%2F50R20", "285/50R20"],
      ["LT265-75R16", "LT265/75R16"],
      ["lt265%2F75r16", "LT265/75R16"],
      ["33x12.50R15LT", "33x12.50R15LT"],
    ]) {
      const { status, body } = await alternatives(`size=${size}&loadIndex=108&speedSymbol=Q`);
      expect(status, size).toBe(200);
      expect(body.original.designation).toBe(designation);
    }
  });

  it("follows nextCursor to the end, the total counting every page", async () => {
    const base = "size=LT265-75R16&loadIndex=120&loadIndexDual=116&speedSymbol=Q&loadRange=D&tolerancePct=4&sort=price&limit=7";
    const first = await alternatives(base);
    const seen: string[] = first.body.results.map((tire: { sku: string }) => tire.sku);
    let cursor = first.body.nextCursor;
    while (cursor) {
      const page = await alternatives(`${base}&cursor=${cursor}`);
      seen.push(...page.body.results.map((tire: { sku: string }) => tire.sku));
      cursor = page.body.nextCursor;
    }
    expect(first.body.tolerancePct).toBe(4);
    expect(seen).toHaveLength(first.body.total);
    expect(new Set(seen).size).toBe(seen.length);
    const otherSort = await alternatives(`${base.replace("sort=price", "sort=diameter")}&cursor=${first.body.nextCursor}`);
    expect(otherSort.body.error.code).toBe("invalid_parameter");
  });

  it.each([
    ["", 400, "missing_parameter"],
    ["size=285-50R20&speedSymbol=S", 400, "missing_parameter"],
    ["size=&loadIndex=119&speedSymbol=S", 400, "missing_parameter"],
    ["size=285-50R20&loadIndex=119", 400, "missing_parameter"],
    ["size=285-50R20&loadIndex=abc&speedSymbol=S", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=-5&speedSymbol=S", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&season=spring", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&terrain=road", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&sort=name", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&tolerancePct=6", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&tolerancePct=0.5", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&limit=0", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&limit=501", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&minPriceCents=-1", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&minPriceCents=20000&maxPriceCents=100", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&runFlat=maybe", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&loadRange=Z", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&cursor=xyz", 400, "invalid_parameter"],
    ["size=hello&loadIndex=119&speedSymbol=S", 422, "unreadable"],
    ["size=285-50R20&loadIndex=300&speedSymbol=S", 422, "unknown_load_index"],
    ["size=LT265-75R16&loadIndex=123&loadIndexDual=999&speedSymbol=R", 422, "unknown_load_index"],
    ["size=285-50R20&loadIndex=119&speedSymbol=Z", 422, "unknown_speed_symbol"],
    [`size=${"2".repeat(2001)}&loadIndex=119&speedSymbol=S`, 414, "too_long"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&quantity=0", 400, "invalid_parameter"],
    ["size=285-50R20&loadIndex=119&speedSymbol=S&quantity=9", 400, "invalid_parameter"],
  ])("answers %s with %i %s", async (query, status, code) => {
    const response = await alternatives(query);
    expect(response.status).toBe(status);
    expect(response.body.error.code).toBe(code);
    expect(typeof response.body.error.message).toBe("string");
  });

  it("never answers bad input with a server error", async () => {
    const names = ["size", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "runFlat", "tolerancePct", "season", "terrain", "threePeak", "brand", "minPriceCents", "maxPriceCents", "inStock", "quantity", "sort", "limit", "cursor"];
    const value = fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom("285-50R20", "119", "S", "E", "true", "3", "0", "-1", "1e9", "(Y)", "%", "null"));
    await fc.assert(
      fc.asyncProperty(fc.dictionary(fc.constantFrom(...names), value, { maxKeys: 8 }), async (params) => {
        const { status } = await alternatives(new URLSearchParams(params).toString());
        expect(status).toBeLessThan(500);
      }),
      { seed: 314, numRuns: 60 },
    );
  });
});

describe("GET /api/v1/alternatives with a quantity", () => {
  const base = "size=225-65R17&loadIndex=102&speedSymbol=H&tolerancePct=5&limit=500";
  type Result = { sku: string; priceCents: number; quantity: number; inStock: boolean; estimate: Record<string, number> };

  it("needs a set of four unless told otherwise, and prices each result out the door from the shop's charges", async () => {
    const { status, body } = await alternatives(base);
    expect(status).toBe(200);
    expect(body.quantity).toBe(4);
    expect(body.results.length).toBeGreaterThan(5);
    for (const tire of body.results as Result[]) {
      expect(tire.estimate).toEqual(estimateSet(tire.priceCents, 4, demoShopCharges));
      expect(tire.inStock).toBe(tire.quantity >= 1);
    }
    // Worked through for one tire, from the demo shop's invented charges ($25.00 fitting, $4.00 disposal, $1.00 fee, 7.25 % on tires and services).
    const tire = (body.results as Result[])[0]!;
    const taxable = 4 * tire.priceCents + 4 * 2_500 + 4 * 400;
    expect(tire.estimate).toEqual({
      quantity: 4,
      tiresCents: 4 * tire.priceCents,
      servicesCents: 10_000,
      feesCents: 2_000,
      taxCents: Math.floor((taxable * 725 + 5_000) / 10_000),
      totalCents: 4 * tire.priceCents + 10_000 + 2_000 + Math.floor((taxable * 725 + 5_000) / 10_000),
    });
  });

  it.each([1, 2, 6, 8])("prices a set of %i", async (quantity) => {
    const { body } = await alternatives(`${base}&quantity=${quantity}`);
    expect(body.quantity).toBe(quantity);
    for (const tire of body.results as Result[]) expect(tire.estimate).toEqual(estimateSet(tire.priceCents, quantity, demoShopCharges));
  });

  it.each([1, 2, 4, 6, 8])("keeps tires with at least %i on hand for inStock=true, those with fewer for inStock=false", async (quantity) => {
    const all = await alternatives(`${base}&quantity=${quantity}`);
    const enough = await alternatives(`${base}&quantity=${quantity}&inStock=true`);
    const short = await alternatives(`${base}&quantity=${quantity}&inStock=false`);
    expect((enough.body.results as Result[]).every((tire) => tire.quantity >= quantity)).toBe(true);
    expect((short.body.results as Result[]).every((tire) => tire.quantity < quantity)).toBe(true);
    expect(enough.body.total + short.body.total).toBe(all.body.total);
    expect(enough.body.total).toBe((all.body.results as Result[]).filter((tire) => tire.quantity >= quantity).length);
    expect(enough.body.total).toBeGreaterThan(0);
    if (quantity > 1) expect(short.body.results.some((tire: Result) => tire.quantity > 0)).toBe(true);
  });

  it.each(["0", "9", "x", "2.5", "-1", "4x", "1e1"])("refuses quantity=%s with a clear 400 invalid_parameter", async (quantity) => {
    const { status, body } = await alternatives(`${base}&quantity=${quantity}`);
    expect(status).toBe(400);
    expect(body.error).toMatchObject({
      code: "invalid_parameter",
      field: "quantity",
      message: 'The parameter "quantity" is invalid: how many tires are needed, a whole number from 1 to 8.',
    });
  });

  it("takes an empty quantity as the default", async () => {
    const { status, body } = await alternatives(`${base}&quantity=`);
    expect(status).toBe(200);
    expect(body.quantity).toBe(4);
  });
});
