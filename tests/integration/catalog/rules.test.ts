import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { decodeAlternativesCursor } from "@/lib/alternatives/cursor";
import { diameterChangePct } from "@/lib/tire";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { search, seedFixture, skus } from "./fixtures";

describe.each(testDatabaseKinds)("rules of equal-or-better on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  afterAll(async () => {
    await database?.close();
  });
  beforeEach(async () => {
    await database.reset();
  });

  it("orders speed by km/h: H (210) sits between U (200) and V (240), and (Y) > Y > W > V (ISO 4000-1 / ETRTO speed symbol table)", async () => {
    const symbols = ["T", "U", "H", "V", "W", "Y", "(Y)"];
    await seedFixture(database.db, symbols.map((speedSymbol, i) => ({ sku: `S${i}`, designation: "205/55R16", loadIndex: 91, speedSymbol })));
    const fromH = await search(database.db, { size: "205/55R16", loadIndex: 91, speedSymbol: "H" });
    expect(skus(fromH.results).sort()).toEqual(["S2", "S3", "S4", "S5", "S6"]);
    expect(fromH.nearMisses.map((miss) => miss.failed)).toEqual([["speed T 190 km/h < H 210 km/h"], ["speed U 200 km/h < H 210 km/h"]]);
    const fromY = await search(database.db, { size: "205/55R16", loadIndex: 91, speedSymbol: "Y" });
    expect(skus(fromY.results).sort()).toEqual(["S5", "S6"]);
  });

  it("counts a ZR size with no service description as above 240 km/h: V falls short, W qualifies (ISO 4000-1 / ETRTO: ZR means over 240 km/h)", async () => {
    await seedFixture(database.db, [
      { sku: "ZV", designation: "245/40ZR18", loadIndex: 97, speedSymbol: "V", extraLoad: true },
      { sku: "ZW", designation: "245/40ZR18", loadIndex: 97, speedSymbol: "W", extraLoad: true },
    ]);
    const found = await search(database.db, { size: "245/40ZR18", loadIndex: 97 });
    expect(skus(found.results)).toEqual(["ZW"]);
    expect(found.original.speedSymbol).toBeNull();
  });

  it("never offers a lower load index, on the single or the dual index (common practice; FMVSS 119 load tables)", async () => {
    await seedFixture(database.db, [
      { sku: "L90", designation: "205/55R16", loadIndex: 90, speedSymbol: "H" },
      { sku: "L91", designation: "205/55R16", loadIndex: 91, speedSymbol: "H" },
      { sku: "L94", designation: "205/55R16", loadIndex: 94, speedSymbol: "H", extraLoad: true },
      { sku: "D119", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 119, loadRange: "E", speedSymbol: "R" },
      { sku: "D120", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "E", speedSymbol: "R" },
    ]);
    const car = await search(database.db, { size: "205/55R16", loadIndex: 91, speedSymbol: "H" });
    expect(skus(car.results).sort()).toEqual(["L91", "L94"]);
    expect(car.nearMisses.map((miss) => miss.failed)).toEqual([["load index 90 < 91"]]);
    const truck = await search(database.db, { size: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "R", loadRange: "E" });
    expect(skus(truck.results)).toEqual(["D120"]);
    expect(truck.nearMisses[0]?.failed).toEqual(["dual load index 119 < 120"]);
  });

  it("keeps the same rim diameter even when another rim's size is closer in diameter (common practice)", async () => {
    // 205/55R16 is 631.9 mm and 225/45R17 634.3 mm: 0.38 % apart, on different wheels.
    await seedFixture(database.db, [
      { sku: "R17", designation: "225/45R17", loadIndex: 94, speedSymbol: "W", extraLoad: true },
      { sku: "R16", designation: "215/55R16", loadIndex: 97, speedSymbol: "H", extraLoad: true },
    ]);
    const found = await search(database.db, { size: "205/55R16", loadIndex: 91, speedSymbol: "H" });
    expect(skus(found.results)).toEqual(["R16"]);
    expect(found.results[0]?.reasons).toContain("same 16-inch rim");
    expect(skus(found.nearMisses)).toEqual([]);
  });

  it("replaces LT by LT (metric or flotation) only, and passenger by passenger only (FMVSS 139 and 119 cover them apart; common practice)", async () => {
    await seedFixture(database.db, [
      { sku: "PASS", designation: "265/75R16", loadIndex: 123, speedSymbol: "S" },
      { sku: "LTM", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "E", speedSymbol: "S" },
      { sku: "FLOT", designation: "32x11.50R16LT", loadIndex: 123, loadRange: "E", speedSymbol: "S" },
      { sku: "CVAN", designation: "265/75R16C", loadIndex: 123, loadIndexDual: 120, speedSymbol: "S" },
    ]);
    const truck = await search(database.db, { size: "LT265-75R16", loadIndex: 121, speedSymbol: "R", loadRange: "E" });
    expect(skus(truck.results).sort()).toEqual(["FLOT", "LTM"]);
    const car = await search(database.db, { size: "265/75R16", loadIndex: 116, speedSymbol: "S" });
    expect(skus(car.results)).toEqual(["PASS"]);
    const van = await search(database.db, { size: "265/75R16C", loadIndex: 121, speedSymbol: "R" });
    expect(skus(van.results)).toEqual(["CVAN"]);
  });

  it("never offers a temporary spare, not even for a temporary spare (49 CFR 571.109: T-type tires are for temporary use)", async () => {
    await seedFixture(database.db, [{ sku: "TSP", designation: "T125/70R17", loadIndex: 98, speedSymbol: "M" }]);
    const found = await search(database.db, { size: "T125/70R17", loadIndex: 98, speedSymbol: "M" });
    expect(found.total).toBe(0);
    expect(found.nearMisses).toEqual([]);
  });

  it("replaces a run-flat only by run-flats, while a run-flat may replace a regular tire (common practice)", async () => {
    await seedFixture(database.db, [
      { sku: "PLAIN", designation: "225/45R17", loadIndex: 94, speedSymbol: "W", extraLoad: true },
      { sku: "RFSIZE", designation: "225/45RF17", loadIndex: 94, speedSymbol: "W", extraLoad: true },
      { sku: "RFLINE", designation: "225/45R17", loadIndex: 94, speedSymbol: "W", extraLoad: true, line: "flat" },
    ]);
    const runFlat = await search(database.db, { size: "225/45RF17", loadIndex: 91, speedSymbol: "W" });
    expect(skus(runFlat.results).sort()).toEqual(["RFLINE", "RFSIZE"]);
    expect(runFlat.results[0]?.reasons).toContain("run-flat, as the original");
    const byFlag = await search(database.db, { size: "225/45R17", loadIndex: 91, speedSymbol: "W", runFlat: true });
    expect(skus(byFlag.results).sort()).toEqual(["RFLINE", "RFSIZE"]);
    const regular = await search(database.db, { size: "225/45R17", loadIndex: 91, speedSymbol: "W" });
    expect(regular.total).toBe(3);
  });

  it("asks for the same or a higher load range where the original has one (common practice: load range = ply rating)", async () => {
    await seedFixture(database.db, [
      { sku: "LRC", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "C", speedSymbol: "R" },
      { sku: "LRD", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "D", speedSymbol: "R" },
      { sku: "LRE", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "E", speedSymbol: "R" },
    ]);
    const found = await search(database.db, { size: "LT265/75R16", loadIndex: 114, speedSymbol: "R", loadRange: "D" });
    expect(skus(found.results).sort()).toEqual(["LRD", "LRE"]);
    expect(found.results.map((tire) => tire.reasons.find((reason) => reason.startsWith("load range")))).toContain("load range E ≥ D");
    expect(found.nearMisses.map((miss) => miss.failed)).toEqual([["load range C < D"]]);
    const noRange = await search(database.db, { size: "LT265/75R16", loadIndex: 114, speedSymbol: "R" });
    expect(noRange.total).toBe(3);
  });

  it("includes a diameter exactly on the tolerance and refuses one a hair beyond it (common practice: within ±3 %, the limit included)", async () => {
    // 205/55R16 = 631.9 mm, 215/55R16 = 642.9 mm (nominal geometry: rim × 25.4 + 2 × width × aspect ÷ 100).
    await seedFixture(database.db, [{ sku: "EDGE", designation: "215/55R16", loadIndex: 93, speedSymbol: "H" }]);
    const exact = diameterChangePct(631.9, 642.9);
    const onIt = await search(database.db, { size: "205/55R16", loadIndex: 91, speedSymbol: "H" }, { tolerancePct: exact });
    expect(skus(onIt.results)).toEqual(["EDGE"]);
    expect(onIt.results[0]?.diameterDiffPct).toBe(exact);
    const below = exact - 1e-12;
    const beyond = await search(database.db, { size: "205/55R16", loadIndex: 91, speedSymbol: "H" }, { tolerancePct: below });
    expect(beyond.total).toBe(0);
    expect(beyond.nearMisses[0]?.failed[0]).toMatch(/^diameter \+1\.74 % \(\+11 mm\) outside ±1\.7407/);
  });

  it("breaks ties by price, then by SKU in plain character order, across pages", async () => {
    const tied = ["b-2", "B-1", "a-9", "_z", "A-3", "a-10"];
    await seedFixture(database.db, [
      ...tied.map((sku) => ({ sku, designation: "205/55R16", loadIndex: 91, speedSymbol: "H", priceCents: 12_000 })),
      { sku: "zz-cheap", designation: "205/55R16", loadIndex: 91, speedSymbol: "H", priceCents: 9_000 },
    ]);
    const seen: string[] = [];
    let cursor = null;
    do {
      const page = await search(database.db, { size: "205/55R16", loadIndex: 91, speedSymbol: "H" }, { limit: 2, cursor });
      expect(page.total).toBe(7);
      seen.push(...skus(page.results));
      cursor = page.nextCursor ? decodeAlternativesCursor(page.nextCursor) : null;
    } while (cursor);
    // Plain character order: digits and capitals before "_", "_" before small letters.
    expect(seen).toEqual(["zz-cheap", "A-3", "B-1", "_z", "a-10", "a-9", "b-2"]);
  });

  it("leaves retired items out", async () => {
    await seedFixture(database.db, [
      { sku: "GONE", designation: "205/55R16", loadIndex: 91, speedSymbol: "H", retired: true },
      { sku: "HERE", designation: "205/55R16", loadIndex: 91, speedSymbol: "H" },
    ]);
    expect(skus((await search(database.db, { size: "205/55R16", loadIndex: 91, speedSymbol: "H" })).results)).toEqual(["HERE"]);
  });
});
