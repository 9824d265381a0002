import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { quoteRequestTire, shop, stockItem } from "@/db/schema";
import { demoShop, demoShopCharges } from "@/lib/demo/shop";
import { estimateSet } from "@/lib/money/estimate";
import { createQuoteRequest } from "@/lib/quotes/create-request";
import { quoteRequestSchema } from "@/lib/quotes/quote-input";
import { readQuoteLines } from "@/lib/quotes/quote-lines";
import { seedFixture } from "../catalog/fixtures";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const asking = (overrides: Record<string, unknown> = {}) =>
  quoteRequestSchema.parse({ name: "Rosa Iverley", email: "rosa@example.test", vehicle: "2019 family SUV", tires: "Testwell Fixture touring 205/55R16 91H", source: "finder", ...overrides });

describe.each(testDatabaseKinds)("the catalog tires a quote request names, on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    // No e-mail service in these tests: a failed send is recorded and never loses the request.
    vi.spyOn(console, "error").mockImplementation(() => {});
    vi.stubEnv("RESEND_BASE_URL", "http://127.0.0.1:9");
  });
  beforeEach(async () => {
    await database.reset();
    await database.db.insert(shop).values(demoShop);
    await seedFixture(database.db, [
      { sku: "QL-6", designation: "205/55R16", loadIndex: 91, speedSymbol: "H", priceCents: 18_299, quantity: 6 },
      { sku: "QL-2", designation: "205/55R16", loadIndex: 94, speedSymbol: "V", priceCents: 12_000, quantity: 2 },
      { sku: "QL-0", designation: "205/55R16", loadIndex: 91, speedSymbol: "T", priceCents: 9_900, quantity: 0 },
      { sku: "QL-OLD", designation: "205/55R16", loadIndex: 91, speedSymbol: "H", retired: true },
    ]);
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    vi.unstubAllEnvs();
    await database?.close();
  });

  it("keeps them in the order given and prices the request's quantity of each at today's price", async () => {
    const created = await createQuoteRequest(database.db, asking({ quantity: 4, skus: ["QL-2", "QL-6", "QL-0"] }));
    const lines = await readQuoteLines(database.db, created.id, 4);
    expect(lines.map((line) => [line.tire.sku, line.tire.quantity, line.stillStocked])).toEqual([
      ["QL-2", 2, true],
      ["QL-6", 6, true],
      ["QL-0", 0, true],
    ]);
    // 4 × $182.99 with the demo shop's charges: 73,196 + 10,000 + 2,000 + 6,148 tax = 91,344 (worked in tests/unit/money/estimate.test.ts).
    expect(lines[1]?.estimate).toEqual({ quantity: 4, tiresCents: 73_196, servicesCents: 10_000, feesCents: 2_000, taxCents: 6_148, totalCents: 91_344 });
    expect(lines[0]?.estimate).toEqual(estimateSet(12_000, 4, demoShopCharges));

    // Today's price, not the price when the request came in.
    await database.db.update(stockItem).set({ priceCents: 19_999 }).where(eq(stockItem.sku, "QL-6"));
    expect((await readQuoteLines(database.db, created.id, 4))[1]?.estimate?.tiresCents).toBe(4 * 19_999);
  });

  it("prices the request's own quantity", async () => {
    const created = await createQuoteRequest(database.db, asking({ quantity: 2, skus: ["QL-6"] }));
    const [line] = await readQuoteLines(database.db, created.id, 2);
    expect(line?.estimate).toEqual(estimateSet(18_299, 2, demoShopCharges));
  });

  it("leaves out SKUs the catalog does not hold now, and names each tire once", async () => {
    const created = await createQuoteRequest(database.db, asking({ skus: ["QL-OLD", "NO-SUCH", "QL-6", "QL-6"] }));
    const lines = await readQuoteLines(database.db, created.id, 4);
    expect(lines.map((line) => line.tire.sku)).toEqual(["QL-6"]);
  });

  it("shows a tire retired since the request with none to sell and no estimate", async () => {
    const created = await createQuoteRequest(database.db, asking({ skus: ["QL-6"] }));
    await database.db.update(stockItem).set({ retired: true }).where(eq(stockItem.sku, "QL-6"));
    const [line] = await readQuoteLines(database.db, created.id, 4);
    expect(line).toMatchObject({ stillStocked: false, estimate: null, tire: { sku: "QL-6", quantity: 0, inStock: false } });
  });

  it("has no lines, and so no estimate, for a request that names no catalog tire", async () => {
    const created = await createQuoteRequest(database.db, asking({ source: "size-sheet", reference: "205/55R16", tires: "205/55R16" }));
    expect(await readQuoteLines(database.db, created.id, 4)).toEqual([]);
    expect(await database.db.select().from(quoteRequestTire)).toEqual([]);
  });

  it("refuses more than six SKUs or one that breaks the SKU rule", () => {
    expect(quoteRequestSchema.safeParse({ ...asking(), skus: ["A", "B", "C", "D", "E", "F", "G"] }).success).toBe(false);
    expect(quoteRequestSchema.safeParse({ ...asking(), skus: ["no spaces"] }).success).toBe(false);
  });
});
