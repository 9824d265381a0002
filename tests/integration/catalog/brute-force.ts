import fc from "fast-check";
import type { Database } from "@/db/client";
import { and, eq, inArray, isNotNull } from "drizzle-orm";
import { brand, SEASONS, stockItem, TERRAINS, tireLine } from "@/db/schema";
import { buildStockRow } from "@/lib/stock/build-stock-row";
import { insertStockRows } from "@/lib/stock/insert-stock-rows";
import type { FinderSort } from "@/lib/tire";
import type { OriginalInput } from "@/lib/alternatives/original";
import type { CatalogFilters } from "@/lib/alternatives/rule-sql";
import {
  compareLoadRanges,
  isLoadRange,
  serviceType,
  measurableSizeFromSlug,
  sizeGeometry,
  speedSymbolRank,
  ZR_UNRATED_RANK,
  type SpeedSymbol,
} from "@/lib/tire";

/** Every stock row, retired ones too, with what a brute-force reading of the rules needs. */
export function loadWholeCatalog(db: Database) {
  return db
    .select({
      sku: stockItem.sku,
      designation: stockItem.designation,
      rimDiameterIn: stockItem.rimDiameterIn,
      construction: stockItem.construction,
      serviceType: stockItem.serviceType,
      runFlat: stockItem.runFlat,
      overallDiameterMm: stockItem.overallDiameterMm,
      extraLoad: stockItem.extraLoad,
      lineRunFlat: tireLine.runFlat,
      loadIndex: stockItem.loadIndex,
      loadIndexDual: stockItem.loadIndexDual,
      speedSymbol: stockItem.speedSymbol,
      loadRange: stockItem.loadRange,
      priceCents: stockItem.priceCents,
      quantityOnHand: stockItem.quantityOnHand,
      retired: stockItem.retired,
      brand: brand.name,
      season: tireLine.season,
      terrain: tireLine.terrain,
      threePeak: tireLine.threePeak,
    })
    .from(stockItem)
    .innerJoin(tireLine, eq(stockItem.lineId, tireLine.id))
    .innerJoin(brand, eq(tireLine.brandId, brand.id));
}

export type CatalogRow = Awaited<ReturnType<typeof loadWholeCatalog>>[number];

export interface Search {
  original: OriginalInput;
  tolerancePct: number;
  /** How many tires are needed: the stock filter's set size. */
  quantity: number;
  filters: CatalogFilters;
  sort: FinderSort;
  limit: number;
}

interface Judged extends CatalogRow {
  diffPct: number;
  key: number;
}

/** The size's facts, read straight from the tire core, not from the stored columns. */
function facts(designation: string, runFlatMark: boolean) {
  const size = measurableSizeFromSlug(designation);
  if (!size) throw new Error(`unreadable ${designation}`);
  return { size, service: serviceType(size), diameter: sizeGeometry(size).overallDiameterMm, runFlat: size.runFlat || runFlatMark };
}

/** `quantity`: the set size the stock filter asks for (inStock: at least that many on hand; not inStock: fewer). */
export function passesFilters(row: CatalogRow, filters: CatalogFilters, quantity: number): boolean {
  return (
    (filters.season === undefined || row.season === filters.season) &&
    (filters.terrain === undefined || row.terrain === filters.terrain) &&
    (filters.threePeak === undefined || row.threePeak === filters.threePeak) &&
    (filters.brand === undefined || row.brand.toLowerCase() === filters.brand.toLowerCase()) &&
    (filters.minPriceCents === undefined || row.priceCents >= filters.minPriceCents) &&
    (filters.maxPriceCents === undefined || row.priceCents <= filters.maxPriceCents) &&
    (filters.inStock === undefined || row.quantityOnHand >= quantity === filters.inStock)
  );
}

const byKeyPriceSku = (a: Judged, b: Judged) => a.key - b.key || a.priceCents - b.priceCents || (a.sku < b.sku ? -1 : a.sku > b.sku ? 1 : 0);

/** Rules 1–7 as written, applied to every row, sorted and cut as the API promises. */
export function bruteForce(catalog: readonly CatalogRow[], search: Search) {
  const { original } = search;
  const reference = facts(original.size, original.runFlat === true);
  const speedSymbol = original.speedSymbol?.toUpperCase();
  const originalSpeed = speedSymbol ? speedSymbolRank(speedSymbol as SpeedSymbol) : ZR_UNRATED_RANK;
  const results: Judged[] = [];
  const nearMisses: Judged[] = [];
  for (const row of catalog) {
    if (row.retired || !passesFilters(row, search.filters, search.quantity)) continue;
    const candidate = facts(row.designation, row.lineRunFlat);
    const sameRimAndBuild = candidate.size.rimDiameterIn === reference.size.rimDiameterIn && candidate.size.construction === reference.size.construction;
    const sameService = reference.service !== "T" && candidate.service === reference.service;
    if (!sameRimAndBuild || !sameService || (reference.runFlat && !candidate.runFlat)) continue;
    const diffPct = ((candidate.diameter - reference.diameter) / reference.diameter) * 100;
    // Rule 3: the higher of the original's index and the Placard check's minimum; a dual requirement needs a dual rating.
    const singleNeeded = Math.max(original.loadIndex, original.minLoadIndex ?? 0);
    const dualNeeded = Math.max(original.loadIndexDual ?? -1, original.minLoadIndexDual ?? -1);
    const holds = [
      Math.abs(diffPct) <= search.tolerancePct,
      row.loadIndex >= singleNeeded && (dualNeeded < 0 || (row.loadIndexDual !== null && row.loadIndexDual >= dualNeeded)),
      speedSymbolRank(row.speedSymbol as SpeedSymbol) >= originalSpeed,
      original.loadRange === undefined || (row.loadRange !== null && isLoadRange(row.loadRange) && compareLoadRanges(row.loadRange, original.loadRange) >= 0),
    ];
    const failures = holds.filter((held) => !held).length;
    const key = search.sort === "diameter" ? Math.abs(diffPct) : search.sort === "price" ? 0 : -row.loadIndex;
    if (failures === 0) results.push({ ...row, diffPct, key });
    if (failures === 1) nearMisses.push({ ...row, diffPct, key: Math.abs(diffPct) });
  }
  return { results: results.sort(byKeyPriceSku), nearMisses: nearMisses.sort(byKeyPriceSku).slice(0, 20), nearMissCount: nearMisses.length };
}

/** Originals of every service type (and a few sizes not in stock), with filters, sorts and page sizes. */
export function arbitrarySearch(catalog: readonly CatalogRow[]): fc.Arbitrary<Search> {
  const stocked = [...new Map(catalog.map((row) => [row.designation, row.loadIndex])).entries()];
  const unstocked: [string, number][] = [["255/50R19", 107], ["T125/70R17", 98], ["31x10.50R15LT", 109], ["265/75R16", 116]];
  const prices = catalog.map((row) => row.priceCents).sort((a, b) => a - b);
  const priceAt = (share: number) => prices[Math.floor(share * (prices.length - 1))] ?? 0;
  const brands = [...new Set(catalog.map((row) => row.brand))];
  const filters: fc.Arbitrary<CatalogFilters> = fc.oneof(
    { weight: 6, arbitrary: fc.constant({}) },
    fc.record({ season: fc.constantFrom(...SEASONS) }),
    fc.record({ terrain: fc.constantFrom(...TERRAINS) }),
    fc.record({ threePeak: fc.boolean() }),
    fc.record({ brand: fc.constantFrom(...brands, "Nobrand").map((name) => (name.length % 2 ? name.toLowerCase() : name)) }),
    fc.record({ minPriceCents: fc.constantFrom(priceAt(0.2), priceAt(0.5)), maxPriceCents: fc.constantFrom(priceAt(0.6), priceAt(0.9)) }),
    fc.record({ inStock: fc.boolean(), season: fc.constantFrom(...SEASONS) }),
    // Alone, the stock filter for a set of one reads the fitments' own counts; for more, it counts items.
    { weight: 3, arbitrary: fc.record({ inStock: fc.boolean() }) },
  );
  const heavy = (designation: string) => /^(LT|ST)|LT$|C$/.test(designation);
  return fc
    .record({
      size: fc.constantFrom(...stocked, ...unstocked),
      loadIndexShift: fc.integer({ min: -6, max: 3 }),
      speedSymbol: fc.constantFrom<string | undefined>("Q", "R", "S", "S", "T", "T", "H", "H", "V", "W", "Y", "(Y)", "U", undefined),
      dualShift: fc.option(fc.integer({ min: -6, max: 1 }), { nil: undefined }),
      placard: fc.oneof(
        { weight: 2, arbitrary: fc.constant(undefined) },
        { weight: 1, arbitrary: fc.record({ single: fc.integer({ min: -4, max: 4 }), dual: fc.option(fc.integer({ min: -8, max: 0 }), { nil: undefined }) }) },
      ),
      season: fc.constantFrom(undefined, ...SEASONS),
      loadRange: fc.constantFrom(undefined, "C" as const, "D" as const, "E" as const),
      runFlat: fc.constantFrom(false, false, false, true),
      tolerancePct: fc.oneof(fc.constantFrom(1, 3, 5), fc.double({ min: 1, max: 5, noNaN: true })),
      filters,
      quantity: fc.constantFrom(1, 1, 2, 4, 4, 6, 8),
      sort: fc.constantFrom<FinderSort>("diameter", "diameter", "price", "loadMargin"),
      limit: fc.constantFrom(11, 50, 500),
    })
    .map(({ size: [designation, loadIndex], loadIndexShift, speedSymbol, dualShift, placard, season, loadRange, runFlat, ...rest }) => ({
      original: {
        size: designation,
        loadIndex: loadIndex + loadIndexShift,
        loadIndexDual: dualShift === undefined || !heavy(designation) ? undefined : loadIndex + loadIndexShift - 3 + dualShift,
        // The Placard check may ask for more than the original, and for a dual index on any tire (a passenger one included).
        minLoadIndex: placard === undefined ? undefined : loadIndex + placard.single,
        minLoadIndexDual: placard?.dual === undefined ? undefined : loadIndex - 3 + placard.dual,
        season,
        // Only a ZR size may be searched without a speed symbol.
        speedSymbol: speedSymbol ?? (designation.includes("ZR") ? undefined : "S"),
        loadRange: heavy(designation) ? loadRange : undefined,
        runFlat,
      },
      ...rest,
    }));
}

/**
 * Truck tires as a shop may stock them beside the dual-rated ones: for every third light-truck or
 * commercial item with a dual index, one copy rated for single mounting only and one whose dual
 * index is three lower, written through the same row builder as staff writes.
 */
export async function addSingleRatedTruckTires(db: Database): Promise<void> {
  const rated = await db
    .select({
      id: stockItem.id, sku: stockItem.sku, designation: stockItem.designation, loadIndex: stockItem.loadIndex, loadIndexDual: stockItem.loadIndexDual,
      speedSymbol: stockItem.speedSymbol, loadRange: stockItem.loadRange, priceCents: stockItem.priceCents, quantity: stockItem.quantityOnHand,
      lineId: stockItem.lineId, runFlat: tireLine.runFlat,
    })
    .from(stockItem)
    .innerJoin(tireLine, eq(stockItem.lineId, tireLine.id))
    .where(and(isNotNull(stockItem.loadIndexDual), inArray(stockItem.serviceType, ["LT", "C"])));
  const rows = rated
    .filter((item) => item.id % 3 === 0)
    .flatMap((item) =>
      [
        { suffix: "-S", loadIndexDual: null },
        { suffix: "-L", loadIndexDual: (item.loadIndexDual ?? 0) - 3 },
      ].map(({ suffix, loadIndexDual }) => {
        const built = buildStockRow({ ...item, sku: `${item.sku}${suffix}`, loadIndexDual, loadRange: item.loadRange }, { id: item.lineId, runFlat: item.runFlat });
        if (!built.ok) throw new Error(`${item.sku}: ${built.problem.reason}`);
        return built.row;
      }),
    );
  await insertStockRows(db, rows);
}
