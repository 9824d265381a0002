import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getAlternatives } from "@/app/api/v1/alternatives/route";
import { POST as createItem } from "@/app/api/v1/catalog/route";
import { GET as getCompare } from "@/app/api/v1/compare/route";
import { GET as getDecode } from "@/app/api/v1/decode/route";
import { POST as createCard } from "@/app/api/v1/fit-cards/route";
import { GET as getPlus } from "@/app/api/v1/plus/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { callRoute, signIn } from "../helpers/auth-session";
import { checkContract } from "../helpers/contract";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));
vi.mock("next/cache", () => import("../helpers/next-cache-outside-server"));

// Truck and inch-width sizes (TRA designations, common practice): the section width in inches, no
// aspect ratio, and so no overall diameter from the marking alone; 1 in = 25.4 mm exactly.

async function get(handler: (request: NextRequest) => Response | Promise<Response>, path: string) {
  const request = new NextRequest(`http://localhost:3000${path}`);
  const response = await checkContract(request, await handler(request));
  return { status: response.status, body: await response.json() };
}

let staff = "";
beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "on");
  await getDb();
  staff = await signIn("staff@sidewise.test", "sidewise-demo");
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("truck and inch-width sizes through the API", () => {
  it.each([
    ["11R22.5", { designation: "11R22.5", kind: "inch", prefix: null, commercial: true, sectionWidthMm: 279.4, aspectRatio: null, construction: "R", rimDiameterIn: 22.5 }],
    ["7.50R16LT", { designation: "7.50R16LT", kind: "inch", prefix: "LT", commercial: false, sectionWidthMm: 190.5, aspectRatio: null, construction: "R", rimDiameterIn: 16 }],
    ["7.50-16", { designation: "7.50-16", kind: "inch", prefix: null, commercial: true, sectionWidthMm: 190.5, aspectRatio: null, construction: "D", rimDiameterIn: 16 }],
  ])("decodes %s with no geometry and a plain warning", async (q, size) => {
    const { status, body } = await get(getDecode, `/api/v1/decode?q=${encodeURIComponent(q)}`);
    expect(status).toBe(200);
    expect(body.size).toMatchObject(size);
    expect(body.geometry).toBeNull();
    expect(body.warnings.some((warning: string) => warning.includes("maker's data"))).toBe(true);
  });

  it("warns once that 16.5-inch tires never go on 16-inch wheels, and the like (common practice)", async () => {
    const { body } = await get(getDecode, "/api/v1/decode?q=8.75R16.5LT");
    expect(body.warnings.filter((warning: string) => /16- and 16\.5-inch/.test(warning))).toHaveLength(1);
  });

  it("answers 422 with the reason from the finder, the Plus planner and Side-by-side", async () => {
    for (const [handler, path] of [
      [getAlternatives, "/api/v1/alternatives?size=11R22.5&loadIndex=146&loadIndexDual=143&speedSymbol=L"],
      [getPlus, "/api/v1/plus?size=7.50R16LT"],
      [getCompare, "/api/v1/compare?sizes=225-75R16,7.50R16LT"],
    ] as const) {
      const { status, body } = await get(handler, path);
      expect(status, path).toBe(422);
      expect(body.error.message, path).toMatch(/cannot be measured: the marking gives no aspect ratio.*maker's data/);
    }
  });

  it("refuses a catalog item or a Fit card of such a size with 422, saying why", async () => {
    const item = await callRoute(createItem, "POST", "/api/v1/catalog", {
      cookie: staff,
      body: { sku: "TRK-11R225", brand: "Pellwick", line: "Lorrimer AT", designation: "11R22.5", loadIndex: 146, loadIndexDual: 143, speedSymbol: "L", priceCents: 40_000, quantity: 4 },
    });
    expect(item.status).toBe(422);
    expect((await item.json()).error.message).toMatch(/^11R22\.5 cannot be measured/);
    const card = await callRoute(createCard, "POST", "/api/v1/fit-cards", { cookie: staff, body: { sizes: ["7.50-16"], loadIndex: 110, speedSymbol: "L" } });
    expect(card.status).toBe(422);
    const second = await callRoute(createCard, "POST", "/api/v1/fit-cards", { cookie: staff, body: { sizes: ["225/75R16", "7.50R16LT"], loadIndex: 104, speedSymbol: "S" } });
    expect(second.status).toBe(422);
  });
});
