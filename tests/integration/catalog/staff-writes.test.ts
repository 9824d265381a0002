import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getAlternatives } from "@/app/api/v1/alternatives/route";
import { DELETE as retire, PATCH as patch } from "@/app/api/v1/catalog/[sku]/route";
import { POST as create } from "@/app/api/v1/catalog/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { stockItem } from "@/db/schema";
import { callRoute, signIn } from "../helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
vi.mock("next/cache", () => import("../helpers/next-cache-outside-server"));

let cookie = "";
const newItem = {
  sku: "QNS-NEW-22565R17",
  brand: "Quensal",
  line: "Aldermoor Tour",
  designation: "225-65r17",
  loadIndex: 102,
  speedSymbol: "h",
  priceCents: 15_999,
  quantity: 8,
};

const post = async (body: unknown) => {
  const response = await callRoute(create, "POST", "/api/v1/catalog", { cookie, body });
  return { status: response.status, body: await response.json() };
};
const change = async (sku: string, body: unknown) => {
  const response = await callRoute(patch, "PATCH", `/api/v1/catalog/${sku}`, { cookie, body, params: { sku } });
  return { status: response.status, body: await response.json() };
};
const remove = (sku: string) => callRoute(retire, "DELETE", `/api/v1/catalog/${sku}`, { cookie, params: { sku } });
const finderSkus = async () => {
  const response = await callRoute(getAlternatives, "GET", "/api/v1/alternatives?size=225-65R17&loadIndex=102&speedSymbol=H&brand=Quensal&limit=500");
  return ((await response.json()).results as { sku: string }[]).map((tire) => tire.sku);
};

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  await getDb();
  cookie = await signIn("staff@sidewise.test", "sidewise-demo");
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("staff catalog writes", () => {
  it("create an item in an existing line, read through the tire core, and answer it as a Tire", async () => {
    const { status, body } = await post(newItem);
    expect(status).toBe(201);
    // 225/65R17: 17 × 25.4 + 2 × 225 × 0.65 = 724.3 mm.
    expect(body).toMatchObject({ sku: newItem.sku, brand: "Quensal", line: "Aldermoor Tour", designation: "225/65R17", speedSymbol: "H", loadRange: null, extraLoad: false, priceCents: 15_999, inStock: true });
    expect(body.overallDiameterMm).toBeCloseTo(724.3, 6);
    expect(await finderSkus()).toContain(newItem.sku);
    expect((await post(newItem)).body.error).toMatchObject({ code: "already_exists", field: "sku" });
  });

  it("change price, quantity and line, rebuilding the row", async () => {
    const { status, body } = await change(newItem.sku, { priceCents: 14_500, quantity: 0, line: "Bexford HT" });
    expect(status).toBe(200);
    expect(body).toMatchObject({ sku: newItem.sku, line: "Bexford HT", priceCents: 14_500, inStock: false, designation: "225/65R17" });
  });

  it("retire an item: it leaves the finder, keeps its row and cannot be changed or retired again", async () => {
    expect((await remove(newItem.sku)).status).toBe(204);
    expect(await finderSkus()).not.toContain(newItem.sku);
    const db = await getDb();
    const [row] = await db.select({ retired: stockItem.retired }).from(stockItem).where(eq(stockItem.sku, newItem.sku));
    expect(row).toEqual({ retired: true });
    expect((await remove(newItem.sku)).status).toBe(404);
    expect((await change(newItem.sku, { priceCents: 1 })).body.error.code).toBe("not_found");
  });

  it.each([
    [{ ...newItem, sku: undefined }, 400, "missing_parameter", "sku"],
    [{ ...newItem, sku: "has space" }, 400, "invalid_parameter", "sku"],
    [{ ...newItem, sku: "X-1", brand: "Nobrand" }, 422, "unknown_line", "brand"],
    [{ ...newItem, sku: "X-1", line: "Aldermoor Nothing" }, 422, "unknown_line", "line"],
    [{ ...newItem, sku: "X-1", designation: "hello" }, 400, "invalid_parameter", "designation"],
    [{ ...newItem, sku: "X-1", loadIndex: 300 }, 400, "invalid_parameter", "loadIndex"],
    [{ ...newItem, sku: "X-1", speedSymbol: "Z" }, 400, "invalid_parameter", "speedSymbol"],
    [{ ...newItem, sku: "X-1", designation: "LT265/75R16" }, 400, "invalid_parameter", "loadRange"],
    [{ ...newItem, sku: "X-1", priceCents: -1 }, 400, "invalid_parameter", "priceCents"],
    [{ ...newItem, sku: "X-1", quantity: 1.5 }, 400, "invalid_parameter", "quantity"],
    [{ ...newItem, sku: "X-1", colour: "black" }, 400, "invalid_parameter", "body"],
    ["{not json", 400, "invalid_parameter", undefined],
    [[newItem], 400, "invalid_parameter", "body"],
  ])("refuse a new item %j with %i %s, naming the field %s", async (body, status, code, field) => {
    const response = await post(body);
    expect(response.status).toBe(status);
    expect(response.body.error.code).toBe(code);
    expect(typeof response.body.error.message).toBe("string");
    expect(response.body.error.field).toBe(field);
  });

  it.each([
    [{}, 400, "invalid_parameter"],
    [{ sku: "OTHER" }, 400, "invalid_parameter"],
    [{ priceCents: "cheap" }, 400, "invalid_parameter"],
    [{ loadIndexDual: 120 }, 400, "invalid_parameter"],
    [{ line: "No Such Line" }, 422, "unknown_line"],
  ])("refuse a change %j with %i %s", async (body, status, code) => {
    await post({ ...newItem, sku: "QNS-EDIT-ME" });
    const response = await change("QNS-EDIT-ME", body);
    expect(response.status).toBe(status);
    expect(response.body.error.code).toBe(code);
  });

  it("refuse a body over 64 KB with 413 too_large", async () => {
    const { status, body } = await post({ ...newItem, sku: "X-2", line: "x".repeat(70_000) });
    expect([status, body.error.code]).toEqual([413, "too_large"]);
  });

  it("answer unknown SKUs with 404 not_found", async () => {
    expect((await change("NO-SUCH-SKU", { priceCents: 1 })).status).toBe(404);
    expect((await remove("NO-SUCH-SKU")).status).toBe(404);
  });
});
