import fc from "fast-check";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getAlternatives } from "@/app/api/v1/alternatives/route";
import { GET as getCatalog } from "@/app/api/v1/catalog/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { checkContract } from "../helpers/contract";

// Outside a Next.js request `connection()` throws; here every call is a request of its own.
vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

const TIRE_KEYS = [
  "sku", "brand", "line", "designation", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "extraLoad",
  "runFlat", "season", "terrain", "threePeak", "treadDepth32", "overallDiameterMm", "priceCents", "inStock",
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
    expect(Object.keys(body).sort()).toEqual(["nearMisses", "nextCursor", "original", "results", "tolerancePct", "total"]);
    // 285/50R20: 20 × 25.4 + 2 × 285 × 0.50 = 793 mm (nominal geometry).
    expect(body.original).toEqual({ designation: "285/50R20", overallDiameterMm: 793, loadIndex: 112, speedSymbol: "H", loadRange: null });
    expect(body.tolerancePct).toBe(3);
    expect(body.results).toHaveLength(5);
    expect(body.total).toBeGreaterThan(5);
    for (const tire of body.results) {
      expect(Object.keys(tire).sort()).toEqual([...TIRE_KEYS, "diameterDiffPct", "notes", "reasons"].sort());
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
  ])("answers %s with %i %s", async (query, status, code) => {
    const response = await alternatives(query);
    expect(response.status).toBe(status);
    expect(response.body.error.code).toBe(code);
    expect(typeof response.body.error.message).toBe("string");
  });

  it("never answers bad input with a server error", async () => {
    const names = ["size", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "runFlat", "tolerancePct", "season", "terrain", "threePeak", "brand", "minPriceCents", "maxPriceCents", "inStock", "sort", "limit", "cursor"];
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
