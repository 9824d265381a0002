import { and, eq, gt, gte, lt, lte, sql, type SQL } from "drizzle-orm";
import { brand, stockFitment, stockItem, tireLine } from "@/db/schema";
import { loadRequirements, type Season, type Terrain } from "@/lib/tire";
import { ofBrand, sellableQuantity } from "@/lib/catalog/columns";
import type { FinderSort } from "@/lib/tire";
import type { Original } from "./original";

/** Narrowing a search beyond the rules; each filter is an equality or a bound. */
export interface CatalogFilters {
  season?: Season;
  terrain?: Terrain;
  threePeak?: boolean;
  /** Brand name, any case. */
  brand?: string;
  minPriceCents?: number;
  maxPriceCents?: number;
  /**
   * true: only tires of which at least the set size (`quantity` of the search) can be sold now;
   * false: only those with fewer.
   */
  inStock?: boolean;
}

const LINE_FILTERS = ["season", "terrain", "threePeak", "brand"] as const;

/**
 * What the finder's statements look like for a search: which rules and filters apply, never their
 * values. Statements are built once per shape, with placeholders, and reused (see statement-cache).
 */
export interface FinderShape {
  /** False for a temporary spare: nothing replaces it. */
  hasCandidates: boolean;
  runFlatOnly: boolean;
  dualIndex: boolean;
  loadRange: boolean;
  lineFilters: (typeof LINE_FILTERS)[number][];
  minPrice: boolean;
  maxPrice: boolean;
  inStock: "any" | "yes" | "no";
  /**
   * Whether a fitment's own counts tell how many of its items pass the stock filter: with none, and
   * for a set of one (in_stock_count counts the items with at least one to sell). For more, the
   * items are counted.
   */
  stockCountedByFitment: boolean;
}

/** `quantity`: how many tires the search needs (the stock filter's set size). */
export function finderShape(original: Original, filters: CatalogFilters, quantity: number): FinderShape {
  return {
    hasCandidates: original.serviceType !== "T",
    runFlatOnly: original.runFlat,
    dualIndex: loadRequirements(original).dual !== null,
    loadRange: original.loadRangePly !== null,
    lineFilters: LINE_FILTERS.filter((name) => filters[name] !== undefined),
    minPrice: filters.minPriceCents !== undefined,
    maxPrice: filters.maxPriceCents !== undefined,
    inStock: filters.inStock === undefined ? "any" : filters.inStock ? "yes" : "no",
    stockCountedByFitment: filters.inStock === undefined || quantity === 1,
  };
}

/** The values the placeholders of a shape's statements take for one search. */
export function finderValues(original: Original, tolerancePct: number, filters: CatalogFilters, quantity: number) {
  const load = loadRequirements(original);
  return {
    rim: original.rimDiameterIn,
    construction: original.construction,
    serviceType: original.serviceType,
    reference: original.overallDiameterMm,
    tolerancePct,
    loadIndex: load.single?.required ?? original.loadIndex,
    loadIndexDual: load.dual?.required ?? null,
    speedRank: original.speedRank,
    loadRangePly: original.loadRangePly,
    season: filters.season,
    terrain: filters.terrain,
    threePeak: filters.threePeak,
    brand: filters.brand,
    minPriceCents: filters.minPriceCents,
    maxPriceCents: filters.maxPriceCents,
    quantity,
  };
}

export type FinderValues = ReturnType<typeof finderValues>;

export const placeholder = (name: keyof FinderValues) => sql.placeholder(name);
const float = (name: keyof FinderValues) => sql`${placeholder(name)}::float8`;

/**
 * The rules of equal-or-better as SQL for one shape of search. Rules 1–7 read only a fitment's
 * facts, so they are judged once per fitment; the filters read the items themselves.
 */
export interface RuleSql {
  /**
   * Signed (candidate − original) ÷ original × 100, in the order of operations the tire core's
   * diameterChangePct uses: float8 arithmetic is IEEE's on PGlite and PostgreSQL alike, so the SQL and
   * the judge get the same number to the last bit, and rule 2 compares it as the judge does.
   */
  diffPct: SQL<number>;
  /** Rules 1, 6 and 7: the fitments a search looks at at all. */
  eligible: SQL;
  /** Rule 2: |diffPct| ≤ the tolerance, the limit included. */
  diameterFits: SQL;
  loadIndexHolds: SQL;
  speedHolds: SQL;
  loadRangeHolds: SQL;
  /** Rules 1 and 6 over stock_item: items of the original's rim, construction and service type. */
  itemOfSize: SQL;
  /** The filters, over stock_item; undefined when the search sets none. */
  itemFilter: SQL | undefined;
  /** How many current items of a fitment pass the filters, where the fitment's own counts tell; else undefined. */
  countedItems: SQL<number> | undefined;
}

/** Filters on the line or brand, as a set of lines, so that the finder reads stock_item alone. */
function lineFilter(shape: FinderShape): SQL | undefined {
  if (shape.lineFilters.length === 0) return undefined;
  const byFilter = {
    season: eq(tireLine.season, placeholder("season")),
    terrain: eq(tireLine.terrain, placeholder("terrain")),
    threePeak: eq(tireLine.threePeak, placeholder("threePeak")),
    brand: sql`lower(${brand.name}) = lower(${placeholder("brand")})`,
  };
  const conditions = shape.lineFilters.map((name) => byFilter[name]);
  return sql`${stockItem.lineId} in (select ${tireLine.id} from ${tireLine} inner join ${brand} on ${ofBrand} where ${and(...conditions)})`;
}

const fitmentCounts = {
  any: sql<number>`${stockFitment.itemCount}`,
  yes: sql<number>`${stockFitment.inStockCount}`,
  no: sql<number>`(${stockFitment.itemCount} - ${stockFitment.inStockCount})`,
};

export function ruleSql(shape: FinderShape): RuleSql {
  const stockFilter = {
    any: undefined,
    yes: gte(sellableQuantity, placeholder("quantity")),
    no: lt(sellableQuantity, placeholder("quantity")),
  }[shape.inStock];
  // The line, brand and price filters, and a stock filter for more than one tire, read the items themselves.
  const itemsCounted = shape.lineFilters.length > 0 || shape.minPrice || shape.maxPrice || !shape.stockCountedByFitment;
  const fitment = stockFitment;
  const diffPct = sql<number>`((${fitment.overallDiameterMm} - ${float("reference")}) / ${float("reference")} * 100)`;
  return {
    diffPct,
    eligible: and(
      eq(fitment.rimDiameterIn, placeholder("rim")),
      eq(fitment.construction, placeholder("construction")),
      // A temporary spare is never a candidate, not even for another temporary spare.
      shape.hasCandidates ? eq(fitment.serviceType, placeholder("serviceType")) : sql`false`,
      shape.runFlatOnly ? eq(fitment.runFlat, true) : undefined,
      gt(fitment.itemCount, 0),
    ) as SQL,
    diameterFits: sql`abs(${diffPct}) <= ${float("tolerancePct")}`,
    loadIndexHolds: and(
      gte(fitment.loadIndex, placeholder("loadIndex")),
      // A tire with no dual index is never offered for dual mounting.
      shape.dualIndex ? sql`coalesce(${fitment.loadIndexDual} >= ${placeholder("loadIndexDual")}, false)` : undefined,
    ) as SQL,
    speedHolds: gte(fitment.speedRank, placeholder("speedRank")),
    loadRangeHolds: shape.loadRange ? sql`coalesce(${fitment.loadRangePly} >= ${placeholder("loadRangePly")}, false)` : sql`true`,
    itemOfSize: and(
      eq(stockItem.rimDiameterIn, placeholder("rim")),
      eq(stockItem.serviceType, placeholder("serviceType")),
      eq(stockItem.construction, placeholder("construction")),
    ) as SQL,
    itemFilter: and(
      lineFilter(shape),
      shape.minPrice ? gte(stockItem.priceCents, placeholder("minPriceCents")) : undefined,
      shape.maxPrice ? lte(stockItem.priceCents, placeholder("maxPriceCents")) : undefined,
      stockFilter,
    ),
    countedItems: itemsCounted ? undefined : fitmentCounts[shape.inStock],
  };
}

/** The sort key of a fitment's items, ascending; ties go by price, then SKU in plain character order. */
export function sortKeySql(sort: FinderSort, diffPct: SQL<number>): SQL<number> {
  switch (sort) {
    case "diameter":
      return sql<number>`abs(${diffPct})`;
    case "price":
      return sql<number>`0::float8`;
    case "loadMargin":
      // The most load capacity to spare first: load capacity grows with the index.
      return sql<number>`(-${stockFitment.loadIndex})::float8`;
  }
}
