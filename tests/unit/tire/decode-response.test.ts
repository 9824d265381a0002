import { describe, expect, it } from "vitest";
import { toDecodeResponse } from "@/lib/tire";
import { read } from "./helpers";

describe("the /api/v1/decode body", () => {
  it("has exactly the public fields, in order, with unrounded numbers", () => {
    const body = toDecodeResponse(read("LT265/75R16 123/120S LRE M+S DOT U2LL LMLR 3208 500 A B"));
    expect(Object.keys(body)).toEqual([
      "input", "size", "service", "loadRange", "plyRating", "extraLoad", "geometry", "dot", "utqg", "winter", "warnings",
    ]);
    expect(body.size).toEqual({
      designation: "LT265/75R16", kind: "metric", prefix: "LT", commercial: false, sectionWidthMm: 265,
      aspectRatio: 75, construction: "R", zr: false, runFlat: false, rimDiameterIn: 16,
    });
    expect(body.service).toEqual({
      loadIndex: 123, loadIndexDual: 120, speedSymbol: "S", loadKg: 1550, loadLb: 3417,
      speedKmh: 180, speedMph: 112, speedAbove: false,
    });
    expect(Object.keys(body.geometry ?? {})).toEqual([
      "sidewallMm", "overallDiameterMm", "overallDiameterIn", "circumferenceMm", "revsPerMile", "revsPerKm",
    ]);
    expect(body.geometry?.sidewallMm).toBe(198.75);
    expect(body.dot).toEqual({ plantCode: "U2", week: 32, year: 2008, yearAmbiguous: false });
    expect(body.utqg).toEqual({ treadwear: 500, traction: "A", temperature: "B" });
    expect(body.winter).toEqual({ mudAndSnow: true, threePeak: false });
    expect([body.loadRange, body.plyRating, body.extraLoad]).toEqual(["E", 10, false]);
  });

  it("has null size and geometry when the text holds no size", () => {
    const body = toDecodeResponse(read("91V XL"));
    expect([body.size, body.geometry, body.dot, body.utqg]).toEqual([null, null, null, null]);
    expect(body.extraLoad).toBe(true);
  });

  it("puts the notes of what was assumed first among the warnings", () => {
    const body = toDecodeResponse(read("285 50 20 ACME"));
    expect(body.warnings).toEqual(['Read "285 50 20" as 285/50R20: radial construction assumed.', 'Not read: "ACME".']);
  });

  it("survives a JSON round trip unchanged", () => {
    const body = toDecodeResponse(read("33x12.50R15LT 108Q"));
    expect(JSON.parse(JSON.stringify(body))).toEqual(body);
    expect(body.size?.designation).toBe("33x12.50R15LT");
  });
});
