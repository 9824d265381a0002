import { and, between, eq, gt, gte, isNull, lte, not, or, sql, type SQL } from "drizzle-orm";
import { brand, stockItem, tireLine, type Season, type Terrain } from "@/db/schema";
import { ofBrand } from "./catalog-select";
import type { AlternativesSort } from "./cursor";
import type { Original } from "./original";
import { toleranceBand } from "./tolerance-band";

/** Narrowing a search beyond the rules; each filter is an equality or a bound. */
export interface CatalogFilters {
  season?: Season;
  terrain?: Terrain;
  threePeak?: boolean;
  /** Brand name, any case. */
  brand?: string;
  minPriceCents?: number;
  maxPriceCents?: number;
  /** true: only tires on hand; false: only tires out of stock. */
  inStock?: boolean;
}

/** The rules of equal-or-better as SQL conditions over stock_item, for one original. */
export interface RuleSql {
  /** The original's overall diameter, mm. */
  reference: number;
  /** Signed (candidate − original) ÷ original × 100, computed as the tire core computes it. */
  diffPct: SQL<number>;
  /** Rules 1, 6 and 7, retired items left out, and the filters: what every result and near miss meets. */
  eligible: SQL;
  /** Rule 2 as the exact range of diameters it accepts (see toleranceBand), so that the finder index serves it. */
  band: { minMm: number; maxMm: number };
  diameterFits: SQL;
  loadIndexHolds: SQL;
  speedHolds: SQL;
  loadRangeHolds: SQL;
}

const float = (value: number) => sql`${value}::float8`;

/** Filters on the line or brand, as a set of lines, so that the finder reads stock_item alone. */
function lineFilter(filters: CatalogFilters): SQL | undefined {
  const conditions = [
    filters.season === undefined ? undefined : eq(tireLine.season, filters.season),
    filters.terrain === undefined ? undefined : eq(tireLine.terrain, filters.terrain),
    filters.threePeak === undefined ? undefined : eq(tireLine.threePeak, filters.threePeak),
    filters.brand === undefined ? undefined : sql`lower(${brand.name}) = lower(${filters.brand})`,
  ].filter((condition) => condition !== undefined);
  if (conditions.length === 0) return undefined;
  return sql`${stockItem.lineId} in (select ${tireLine.id} from ${tireLine} inner join ${brand} on ${ofBrand} where ${and(...conditions)})`;
}

function filterConditions(filters: CatalogFilters): (SQL | undefined)[] {
  return [
    lineFilter(filters),
    filters.minPriceCents === undefined ? undefined : gte(stockItem.priceCents, filters.minPriceCents),
    filters.maxPriceCents === undefined ? undefined : lte(stockItem.priceCents, filters.maxPriceCents),
    filters.inStock === undefined ? undefined : filters.inStock ? gt(stockItem.quantityOnHand, 0) : eq(stockItem.quantityOnHand, 0),
  ];
}

export function ruleSql(original: Original, tolerancePct: number, filters: CatalogFilters): RuleSql {
  const reference = original.overallDiameterMm;
  const band = toleranceBand(reference, tolerancePct);
  const dual = original.loadIndexDual;
  const ply = original.loadRangePly;
  return {
    reference,
    diffPct: sql<number>`((${stockItem.overallDiameterMm} - ${float(reference)}) / ${float(reference)} * 100)`,
    eligible: and(
      not(stockItem.retired),
      eq(stockItem.rimDiameterIn, original.rimDiameterIn),
      eq(stockItem.construction, original.construction),
      // A temporary spare is never a candidate, not even for another temporary spare.
      original.serviceType === "T" ? sql`false` : eq(stockItem.serviceType, original.serviceType),
      original.runFlat ? eq(stockItem.runFlat, true) : undefined,
      ...filterConditions(filters),
    ) as SQL,
    band,
    diameterFits: between(stockItem.overallDiameterMm, band.minMm, band.maxMm),
    loadIndexHolds: and(
      gte(stockItem.loadIndex, original.loadIndex),
      dual === null ? undefined : or(isNull(stockItem.loadIndexDual), gte(stockItem.loadIndexDual, dual)),
    ) as SQL,
    speedHolds: gte(stockItem.speedRank, original.speedRank),
    loadRangeHolds: ply === null ? sql`true` : sql`coalesce(${stockItem.loadRangePly} >= ${ply}, false)`,
  };
}

/** The sort key, ascending; ties go by price, then SKU in plain character order. */
export function sortKeySql(sort: AlternativesSort, diffPct: SQL<number>): SQL<number> {
  switch (sort) {
    case "diameter":
      return sql<number>`abs(${diffPct})`;
    case "price":
      return sql<number>`0::float8`;
    case "loadMargin":
      // The most load capacity to spare first: load capacity grows with the index.
      return sql<number>`(-${stockItem.loadIndex})::float8`;
  }
}

export const skuPlainOrder = sql`${stockItem.sku} collate "C"`;
