import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET } from "@/app/api/v1/plus/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { stockItem } from "@/db/schema";
import { speedSymbolRank } from "@/lib/tire";
import { checkContract } from "../helpers/contract";

// Outside a Next.js request `connection()` throws; here every call is a request of its own.
vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

async function plus(query: string) {
  const request = new NextRequest(`http://localhost/api/v1/plus?${query}`);
  const response = await checkContract(request, await GET(request));
  return { status: response.status, body: await response.json() };
}

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

describe("GET /api/v1/plus", () => {
  it("answers the published contract, the original listed with plus 0", async () => {
    const { status, body } = await plus("size=205-55R16&loadIndex=91&speedSymbol=V");
    expect(status).toBe(200);
    expect(body.original.designation).toBe("205/55R16");
    // 16 × 25.4 + 2 × 205 × 0.55 = 631.9 mm (nominal geometry).
    expect(body.original.overallDiameterMm).toBeCloseTo(631.9, 9);
    expect(body.tolerancePct).toBe(3);
    expect(Object.keys(body.candidates[0]).sort()).toEqual(
      ["aspectRatio", "catalogMatches", "designation", "diameterDiffPct", "minLoadIndex", "overallDiameterMm", "plus", "rimDiameterIn", "sectionWidthMm", "theoreticalRimWidthIn"].sort(),
    );
    expect(body.candidates.find((c: { designation: string }) => c.designation === "205/55R16")).toMatchObject({ plus: 0, diameterDiffPct: 0, minLoadIndex: 91 });
  });

  it("lists by default the widths a wheel takes in practice, and every theoretical size with all=true (common practice)", async () => {
    const practical = (await plus("size=225-45R17")).body.candidates as { designation: string; plus: number; sectionWidthMm: number }[];
    const every = (await plus("size=225-45R17&all=true")).body.candidates as { designation: string }[];
    expect(every.map((c) => c.designation)).toEqual(expect.arrayContaining(["125/80R17", "345/30R17"]));
    expect(practical.map((c) => c.designation)).not.toContain("125/80R17");
    // 225 mm: from 215 (205 on a smaller wheel) to 245 + 10 per inch added; the order is the same as for every size.
    for (const candidate of practical) {
      expect(candidate.sectionWidthMm, candidate.designation).toBeGreaterThanOrEqual(candidate.plus < 0 ? 205 : 215);
      expect(candidate.sectionWidthMm, candidate.designation).toBeLessThanOrEqual(245 + 10 * Math.max(candidate.plus, 0));
    }
    expect(practical.map((c) => c.designation)).toEqual(every.map((c) => c.designation).filter((designation) => practical.some((c) => c.designation === designation)));
    expect((await plus("size=225-45R17&all=maybe")).status).toBe(400);
  });

  it("counts catalog tires of exactly each size, of the original's service type, load and speed at least as given", async () => {
    const { body } = await plus("size=205-55R16&loadIndex=91&speedSymbol=V&tolerancePct=2");
    const rows = await (await getDb())
      .select({ designation: stockItem.designation, serviceType: stockItem.serviceType, loadIndex: stockItem.loadIndex, speedRank: stockItem.speedRank, retired: stockItem.retired })
      .from(stockItem);
    const minRank = speedSymbolRank("V");
    for (const candidate of body.candidates as { designation: string; catalogMatches: number }[]) {
      const expected = rows.filter(
        (row) => row.designation === candidate.designation && row.serviceType === "passenger" && row.loadIndex >= 91 && row.speedRank >= minRank && !row.retired,
      ).length;
      expect(candidate.catalogMatches, candidate.designation).toBe(expected);
    }
    expect(body.candidates.some((c: { catalogMatches: number }) => c.catalogMatches > 0)).toBe(true);
  });

  it("counts only tires that meet rules 2–7 against the original, each on its own rim: dual index, load range and run-flat too", async () => {
    const rows = await (await getDb())
      .select({
        designation: stockItem.designation, serviceType: stockItem.serviceType, loadIndex: stockItem.loadIndex, loadIndexDual: stockItem.loadIndexDual,
        speedRank: stockItem.speedRank, loadRangePly: stockItem.loadRangePly, runFlat: stockItem.runFlat, retired: stockItem.retired,
      })
      .from(stockItem);
    // An LT original marked 121/118S, load range E (10-ply rating): every count needs a dual index ≥ 118 and load range E or more.
    const truck = await plus("size=LT265-70R17&loadIndex=121&loadIndexDual=118&speedSymbol=S&loadRange=E");
    expect(truck.status).toBe(200);
    for (const candidate of truck.body.candidates as { designation: string; catalogMatches: number }[]) {
      const expected = rows.filter(
        (row) =>
          row.designation === candidate.designation && row.serviceType === "LT" && !row.retired && row.loadIndex >= 121 &&
          row.loadIndexDual !== null && row.loadIndexDual >= 118 && row.speedRank >= speedSymbolRank("S") && (row.loadRangePly ?? 0) >= 10,
      ).length;
      expect(candidate.catalogMatches, candidate.designation).toBe(expected);
    }
    expect(truck.body.candidates.some((c: { catalogMatches: number }) => c.catalogMatches > 0)).toBe(true);
    // A run-flat original counts run-flat tires only (rule 7).
    const runFlat = await plus("size=225-45R17&loadIndex=91&speedSymbol=V&runFlat=true");
    for (const candidate of runFlat.body.candidates as { designation: string; catalogMatches: number }[]) {
      const expected = rows.filter(
        (row) => row.designation === candidate.designation && row.serviceType === "passenger" && !row.retired && row.loadIndex >= 91 && row.speedRank >= speedSymbolRank("V") && row.runFlat,
      ).length;
      expect(candidate.catalogMatches, candidate.designation).toBe(expected);
    }
    // Passenger tires carry no dual rating: a dual minimum leaves none (common practice).
    const dual = await plus("size=225-45R17&loadIndex=91&loadIndexDual=88&speedSymbol=V");
    expect((dual.body.candidates as { catalogMatches: number }[]).every((c) => c.catalogMatches === 0)).toBe(true);
  });

  it("gives null minimums without a load index, and refuses bad input with the published codes", async () => {
    expect((await plus("size=205-55R16")).body.candidates[0].minLoadIndex).toBeNull();
    expect((await plus("")).body.error.code).toBe("missing_parameter");
    expect((await plus("size=banana")).status).toBe(422);
    expect((await plus("size=205-55R16&loadIndex=300")).body.error.code).toBe("unknown_load_index");
    expect((await plus("size=205-55R16&speedSymbol=X")).body.error.code).toBe("unknown_speed_symbol");
    expect((await plus("size=205-55R16&tolerancePct=9")).body.error.code).toBe("invalid_parameter");
    expect((await plus("size=205-55R16&loadRange=Z")).body.error.code).toBe("invalid_parameter");
    expect((await plus("size=205-55R16&runFlat=maybe")).body.error.code).toBe("invalid_parameter");
    expect((await plus("size=205-55R16&loadIndexDual=300")).body.error.code).toBe("unknown_load_index");
  });
});
