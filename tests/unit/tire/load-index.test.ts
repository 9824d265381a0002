import { describe, expect, it } from "vitest";
import { LOAD_INDEX_MAX, LOAD_INDEX_MIN, loadIndexKg, loadIndexLb, minimumLoadIndex } from "@/lib/tire";

// Spot values from the load index table of ISO 4000-1 / ETRTO, as published for 0–200 in the
// French Arrêté of 24 October 1994, Annex II, and for 0–279 in UN Regulation No. 54, Annex 4
// (201–279 from memory); load-index-table.test.ts checks all 280.
const PUBLISHED: ReadonlyArray<[number, number]> = [
  [0, 45], [1, 46.2], [19, 77.5], [30, 106], [50, 190], [60, 250], [75, 387], [79, 437],
  [80, 450], [91, 615], [100, 800], [107, 975], [109, 1030], [115, 1215], [119, 1360], [120, 1400], [121, 1450],
  [150, 3350], [159, 4375], [160, 4500], [161, 4625], [199, 13600], [200, 14000],
  [201, 14500], [239, 43750], [240, 45000], [241, 46250], [279, 136000],
];

describe("load index table", () => {
  it.each(PUBLISHED)("LI %i carries %d kg (ISO 4000-1 / Arrêté 24 Oct 1994, Annex II)", (li, kg) => {
    expect(loadIndexKg(li)).toBe(kg);
  });

  it("LI 59 is 243 kg; the Arrêté's 240 kg is a misprint, as LI 139 = 2,430 kg and LI 219 = 24,300 kg (UN R54 Annex 4, from memory)", () => {
    expect(loadIndexKg(59)).toBe(243);
    expect(loadIndexKg(139)).toBe(2430);
    expect(loadIndexKg(219)).toBe(24300);
  });

  it("index n+80 carries ten times index n to within the table's own rounding, under 0.5 % (ISO 4000-1 / ETRTO)", () => {
    for (let li = 0; li + 80 <= LOAD_INDEX_MAX; li++) {
      const tenTimes = (loadIndexKg(li) ?? Number.NaN) * 10;
      expect(Math.abs((loadIndexKg(li + 80) ?? Number.NaN) - tenTimes) / tenTimes, `LI ${li + 80}`).toBeLessThan(0.005);
    }
  });

  it("rises with every index, so the lowest index carrying a load is well defined (ISO 4000-1 / ETRTO)", () => {
    for (let li = 1; li <= LOAD_INDEX_MAX; li++) expect(loadIndexKg(li)).toBeGreaterThan(loadIndexKg(li - 1) ?? Number.POSITIVE_INFINITY);
  });

  it("holds whole kilograms from index 80 upward (ISO 4000-1 / ETRTO)", () => {
    for (let li = 80; li <= LOAD_INDEX_MAX; li++) expect(Number.isInteger(loadIndexKg(li))).toBe(true);
  });

  it("is defined for 0–279 and for nothing else (ISO 4000-1 / ETRTO range)", () => {
    expect(LOAD_INDEX_MIN).toBe(0);
    expect(LOAD_INDEX_MAX).toBe(279);
    for (const li of [-1, 280, 1000, 1.5, Number.NaN, Number.POSITIVE_INFINITY]) expect(loadIndexKg(li)).toBeUndefined();
  });

  it("covers every index commonly seen on car and light-truck tires, 0–150 (common practice)", () => {
    for (let li = 0; li <= 150; li++) expect(loadIndexKg(li)).toBeGreaterThan(0);
  });

  it("LI 119 is 1,360 kg or 2,998 lb (common practice: lb = kg × 2.20462, rounded)", () => {
    expect(loadIndexKg(119)).toBe(1360);
    expect(loadIndexLb(119)).toBe(2998);
  });

  it("LI 91 is 1,356 lb and LI 100 is 1,764 lb (common practice: kg × 2.20462, rounded)", () => {
    expect(loadIndexLb(91)).toBe(1356);
    expect(loadIndexLb(100)).toBe(1764);
    expect(loadIndexLb(300)).toBeUndefined();
  });

  it("LI 115 is 1,215 kg or 2,679 lb, and LI 117 is 1,285 kg or 2,833 lb (ISO 4000-1; lb = kg × 2.20462, rounded)", () => {
    expect(loadIndexLb(115)).toBe(2679);
    expect(loadIndexLb(117)).toBe(2833);
  });

  it("finds the lowest index that carries a load, for the placard check (ISO 4000-1 table)", () => {
    expect(minimumLoadIndex(1360)).toBe(119);
    expect(minimumLoadIndex(1361)).toBe(120);
    // 1,212 kg: index 115 (1,215 kg) is enough, as published; ten times index 35 (1,210 kg) would not be.
    expect(minimumLoadIndex(1212)).toBe(115);
    expect(minimumLoadIndex(1215)).toBe(115);
    expect(minimumLoadIndex(1216)).toBe(116);
    expect(minimumLoadIndex(4624)).toBe(161);
    expect(minimumLoadIndex(0)).toBe(0);
    expect(minimumLoadIndex(136_001)).toBeUndefined();
  });
});
