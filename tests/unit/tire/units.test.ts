import convert from "convert-units";
import { describe, expect, it } from "vitest";
import { inToMm, kgToLb, kmhToMph, kpaToPsi, lbToKg, mmToIn, mphToKmh, psiToKpa } from "@/lib/tire";

// Cross-checked against the general-purpose npm library convert-units; its pound (453.592 g)
// differs from the load-table factor 2.20462 by about 2 parts per million.
const close = (a: number, b: number, relative: number): void => {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(Math.abs(b) * relative);
};

describe("unit conversions", () => {
  it.each([1, 16, 25.4, 631.9, 1000])("mm ↔ in for %d agrees with convert-units", (v) => {
    close(mmToIn(v), convert(v).from("mm").to("in"), 1e-6);
    close(inToMm(v), convert(v).from("in").to("mm"), 1e-6);
  });

  it.each([1, 615, 1360, 136000])("kg ↔ lb for %d agrees with convert-units", (v) => {
    close(kgToLb(v), convert(v).from("kg").to("lb"), 5e-6);
    close(lbToKg(v), convert(v).from("lb").to("kg"), 5e-6);
  });

  it.each([5, 120, 190, 240, 300])("km/h ↔ mph for %d agrees with convert-units", (v) => {
    close(kmhToMph(v), convert(v).from("km/h").to("m/h"), 1e-9);
    close(mphToKmh(v), convert(v).from("m/h").to("km/h"), 1e-9);
  });

  it.each([250, 290, 350, 550])("kPa ↔ psi for %d agrees with convert-units", (v) => {
    close(kpaToPsi(v), convert(v).from("kPa").to("psi"), 1e-6);
    close(psiToKpa(v), convert(v).from("psi").to("kPa"), 1e-6);
  });

  it("1 in is exactly 25.4 mm and 1 mile exactly 1.609344 km (international yard and pound agreement, 1959)", () => {
    expect(inToMm(1)).toBe(25.4);
    expect(mphToKmh(1)).toBe(1.609344);
  });
});
