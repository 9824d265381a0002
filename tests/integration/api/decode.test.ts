import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/v1/decode/route";
import { checkContract } from "../helpers/contract";

async function decode(query: string) {
  const request = new NextRequest(`http://localhost/api/v1/decode${query}`);
  const response = await checkContract(request, GET(request));
  return { status: response.status, headers: response.headers, body: await response.json() };
}

describe("GET /api/v1/decode", () => {
  it("answers the published contract for a full sidewall line", async () => {
    const { status, body, headers } = await decode(`?q=${encodeURIComponent("285/50R20 119S")}`);
    expect(status).toBe(200);
    expect(headers.get("cache-control")).toContain("max-age");
    expect(Object.keys(body).sort()).toEqual(
      ["dot", "extraLoad", "geometry", "input", "loadRange", "plyRating", "service", "size", "utqg", "warnings", "winter"].sort(),
    );
    expect(body.size).toEqual({
      designation: "285/50R20",
      kind: "metric",
      prefix: null,
      commercial: false,
      sectionWidthMm: 285,
      aspectRatio: 50,
      construction: "R",
      zr: false,
      runFlat: false,
      rimDiameterIn: 20,
    });
    // Load index 119 = 1,360 kg and S = 180 km/h (ISO 4000-1 / ETRTO tables; 112 mph is common practice).
    expect(body.service).toEqual({
      loadIndex: 119,
      loadIndexDual: null,
      speedSymbol: "S",
      loadKg: 1360,
      loadLb: 2998,
      speedKmh: 180,
      speedMph: 112,
      speedAbove: false,
    });
    // Nominal geometry: 20 × 25.4 + 2 × 285 × 0.50 = 793 mm; numbers are unrounded.
    expect(body.geometry.overallDiameterMm).toBeCloseTo(793, 10);
    expect(body.geometry.sidewallMm).toBeCloseTo(142.5, 10);
    expect(body.geometry.revsPerMile).toBeCloseTo(63360 / (Math.PI * (793 / 25.4)), 9);
    expect(body.winter).toEqual({ mudAndSnow: false, threePeak: false });
  });

  it("reads the EU tyre database example 215/65R16C 109/107T (Regulation (EU) 2020/740 label data)", async () => {
    const { status, body } = await decode(`?q=${encodeURIComponent("215/65R16C 109/107T")}`);
    expect(status).toBe(200);
    expect(body.size.commercial).toBe(true);
    expect(body.service).toMatchObject({ loadIndex: 109, loadIndexDual: 107, loadKg: 1030, speedKmh: 190 });
  });

  it("decodes a DOT code alone, with no size (49 CFR 574.5: 3208 = week 32 of 2008)", async () => {
    const { status, body } = await decode(`?q=${encodeURIComponent("DOT U2LL LMLR 3208")}`);
    expect(status).toBe(200);
    expect(body.size).toBeNull();
    expect(body.geometry).toBeNull();
    expect(body.dot).toMatchObject({ week: 32, year: 2008, yearAmbiguous: false });
  });

  it("answers 400 missing_parameter when q is missing or empty", async () => {
    for (const query of ["", "?q=", "?q=%20%20"]) {
      const { status, body } = await decode(query);
      expect(status).toBe(400);
      expect(body.error.code).toBe("missing_parameter");
      expect(body.error.message).toMatch(/q/);
    }
  });

  it("answers 414 too_long above 2,000 characters", async () => {
    const { status, body } = await decode(`?q=${"2".repeat(2001)}`);
    expect(status).toBe(414);
    expect(body.error.code).toBe("too_long");
  });

  it("answers 422 unreadable with a suggestion when nothing can be read", async () => {
    const { status, body } = await decode(`?q=${encodeURIComponent("285/50R")}`);
    expect(status).toBe(422);
    expect(body.error.code).toBe("unreadable");
    expect(body.error.message.toLowerCase()).toContain("rim diameter");
  });

  it("answers 422 for a load index or speed symbol outside the published tables", async () => {
    const load = await decode(`?q=${encodeURIComponent("285/50R20 999S")}`);
    expect(load.status).toBe(422);
    expect(load.body.error.code).toBe("unknown_load_index");
  });

  it.each([
    // ISO 4000-1 / ETRTO load index table (published values, not ten times the index 80 below): kg, and kg × 2.20462 rounded.
    ["LT265/75R16 115/112S E", 1215, 2679],
    ["LT245/75R17 117/114R E", 1285, 2833],
    ["10.00R20 161/157K", 4625, 10196],
    ["225/70R19.5 128/126L F", 1800, 3968],
  ])("reads %s with the published load of its single index", async (text, loadKg, loadLb) => {
    const { status, body } = await decode(`?q=${encodeURIComponent(text)}`);
    expect(status).toBe(200);
    expect(body.service).toMatchObject({ loadKg, loadLb });
  });

  it("reads a load range after a trailer size, with no warning (TRA, common practice: D is an 8-ply rating)", async () => {
    const { body } = await decode(`?q=${encodeURIComponent("ST205/75R15 107/102M D")}`);
    expect(body).toMatchObject({ loadRange: "D", plyRating: 8, size: { prefix: "ST" }, service: { loadIndex: 107, loadIndexDual: 102 } });
    expect(body.warnings).toEqual([]);
  });

  it("never answers 5xx for odd input", async () => {
    for (const text of ["%00", "%F0%9F%9A%97", "((((", "DOT", "1/2/3/4/5", "R" + "9".repeat(300)]) {
      const { status } = await decode(`?q=${text}`);
      expect(status).toBeLessThan(500);
    }
  });
});
