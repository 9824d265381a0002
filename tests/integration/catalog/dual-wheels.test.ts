import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getAlternatives } from "@/app/api/v1/alternatives/route";
import { POST as create } from "@/app/api/v1/catalog/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { callRoute, signIn } from "../helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
vi.mock("next/cache", () => import("../helpers/next-cache-outside-server"));

// Rule 3 of the shop's contract: where the original has a dual index, or the Placard check asks for a
// dual minimum, only a tire with a dual index at least that high qualifies. Passenger tires carry no
// dual rating and do not belong on dual wheels (common practice; FMVSS 139 rates them for single mounting).

interface Listed {
  sku: string;
  loadIndexDual: number | null;
  designation: string;
  reasons?: string[];
  failed?: string[];
}

let cookie = "";
const truckTire = (sku: string, loadIndexDual: number | null) => ({
  sku,
  brand: "Pellwick",
  line: "Lorrimer AT",
  designation: "LT265/75R16",
  loadIndex: 126,
  loadIndexDual,
  speedSymbol: "S",
  loadRange: "E",
  priceCents: 1,
  quantity: 4,
});

async function alternatives(query: string) {
  const response = await callRoute(getAlternatives, "GET", `/api/v1/alternatives?${query}&limit=500`);
  expect(response.status).toBe(200);
  return (await response.json()) as { results: Listed[]; nearMisses: Listed[]; total: number };
}

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  await getDb();
  cookie = await signIn("staff@sidewise.test", "sidewise-demo");
  for (const [sku, dual] of [["DUAL-NONE", null], ["DUAL-LOW", 118], ["DUAL-OK", 123]] as const) {
    const response = await callRoute(create, "POST", "/api/v1/catalog", { cookie, body: truckTire(sku, dual) });
    expect(response.status).toBe(201);
  }
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("dual wheels through GET /api/v1/alternatives", () => {
  it("offers for a dual original only tires with a dual index at least as high, and shows the others as near misses that say why", async () => {
    const body = await alternatives("size=LT265-75R16&loadIndex=123&loadIndexDual=120&speedSymbol=S&loadRange=E");
    expect(body.results.length).toBeGreaterThan(0);
    expect(body.results.every((tire) => tire.loadIndexDual !== null && tire.loadIndexDual >= 120)).toBe(true);
    expect(body.results.map((tire) => tire.sku)).toContain("DUAL-OK");
    const misses = new Map(body.nearMisses.map((tire) => [tire.sku, tire.failed]));
    expect(misses.get("DUAL-NONE")).toEqual(["no dual load index: not rated for dual wheels (needs a dual index of 120 or more)"]);
    expect(misses.get("DUAL-LOW")).toEqual(["dual load index 118 < 120"]);
  });

  it("offers no passenger tire once the Placard check asks for a dual minimum on a P-metric original", async () => {
    const single = await alternatives("size=P265-70R17&loadIndex=113&speedSymbol=S");
    expect(single.total).toBeGreaterThan(0);
    const dual = await alternatives("size=P265-70R17&loadIndex=113&loadIndexDual=112&speedSymbol=S");
    expect(dual.total).toBe(0);
    expect(dual.results).toEqual([]);
    expect(dual.nearMisses.length).toBeGreaterThan(0);
    for (const miss of dual.nearMisses) expect(miss.failed?.[0]).toMatch(/^no dual load index: not rated for dual wheels/);
    // The same through the Placard check's own parameter.
    expect((await alternatives("size=P265-70R17&loadIndex=113&minLoadIndexDual=112&speedSymbol=S")).total).toBe(0);
  });
});
