import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/v1/compare/route";
import { checkContract } from "../helpers/contract";

async function compare(query: string) {
  const request = new NextRequest(`http://localhost/api/v1/compare${query}`);
  const response = await checkContract(request, GET(request));
  return { status: response.status, body: await response.json() };
}

describe("GET /api/v1/compare", () => {
  it("answers the published contract, the first size being the reference", async () => {
    const { status, body } = await compare("?sizes=185-70R14,195/50R15");
    expect(status).toBe(200);
    expect(body.sizes).toHaveLength(2);
    expect(Object.keys(body.sizes[0]).sort()).toEqual(
      [
        "circumferenceMm", "clearanceChangeMm", "designation", "diameterDiffPct", "overallDiameterIn", "overallDiameterMm",
        "readsBelowTrue", "revsPerMile", "sectionWidthMm", "sidewallMm", "speedometer",
      ].sort(),
    );
    expect(body.sizes[0].designation).toBe("185/70R14");
    // Encyclopedia article "Speedometer": 185/70R14 → 195/50R15 makes the speedometer read 6.7 % high.
    const row = body.sizes[1].speedometer[0];
    expect(row.shownKmh / row.trueKmh).toBeCloseTo(1.067, 3);
    expect(body.sizes[1].speedometer.map((r: { shownKmh: number }) => Math.round(r.shownKmh))).toEqual([50, 80, 100, 120, 48, 80, 97, 113]);
  });

  it.each([["?sizes=285-50R20"], ["?sizes=285-50R20,275-55R20,265-60R20,255-65R20,245-70R20"]])("refuses a wrong number of sizes (%s) with 400", async (query) => {
    const { status, body } = await compare(query);
    expect(status).toBe(400);
    expect(body.error.code).toBe("invalid_parameter");
  });

  it("answers 400 missing_parameter without sizes, 422 for an unreadable one, 414 for a huge one", async () => {
    expect((await compare("")).body.error.code).toBe("missing_parameter");
    const unreadable = await compare("?sizes=285-50R20,banana");
    expect(unreadable.status).toBe(422);
    expect(unreadable.body.error.message).toContain("banana");
    expect((await compare(`?sizes=${"2".repeat(2001)}`)).status).toBe(414);
  });
});
