import { and, asc, desc, eq, gte, ilike, lt, or, sql, type SQL } from "drizzle-orm";
import { z } from "zod";
import { containsPattern } from "@/lib/search/contains-pattern";
import { lineText } from "@/lib/validation/text";
import { brand, stockItem, tireLine } from "@/db/schema";
import { SEASONS, TERRAINS } from "@/lib/tire";
import { sellableQuantity } from "@/lib/catalog/columns";

export const CATALOG_TABLE_SORTS = ["sku", "brand", "size", "loadIndex", "speed", "price", "quantity"] as const;
export type CatalogTableSort = (typeof CATALOG_TABLE_SORTS)[number];

/** An empty field in the filter form counts as absent. */
const optional = <Schema extends z.ZodType>(schema: Schema) =>
  z.preprocess((value) => (value === "" ? undefined : value), schema.optional());

/**
 * The Counter's catalog filters, as they stand in the URL (`/counter?q=…&season=winter&page=2`) and
 * as the CSV export takes them. Retired items never show.
 */
export const catalogFiltersSchema = z.object({
  q: optional(lineText().trim().max(100)),
  brand: optional(lineText().trim().max(100)),
  season: optional(z.enum(SEASONS)),
  terrain: optional(z.enum(TERRAINS)),
  rim: optional(z.coerce.number().int().min(8).max(30)),
  stock: optional(z.enum(["in", "out"])),
  sort: optional(z.enum(CATALOG_TABLE_SORTS)).default("sku"),
  dir: optional(z.enum(["asc", "desc"])).default("asc"),
  page: optional(z.coerce.number().int().min(1).max(100_000)).default(1),
});

export type CatalogFilters = z.infer<typeof catalogFiltersSchema>;

/** The WHERE clause for the filters; join stock_item to tire_line and brand to use it. */
export function catalogFilterWhere(filters: CatalogFilters): SQL | undefined {
  const conditions: (SQL | undefined)[] = [eq(stockItem.retired, false)];
  if (filters.q) {
    const pattern = containsPattern(filters.q);
    const compactSize = containsPattern(filters.q.toUpperCase().replace(/\s+/g, ""));
    conditions.push(
      or(ilike(stockItem.sku, pattern), ilike(stockItem.designation, compactSize), ilike(brand.name, pattern), ilike(tireLine.name, pattern)),
    );
  }
  if (filters.brand) conditions.push(sql`lower(${brand.name}) = lower(${filters.brand})`);
  if (filters.season) conditions.push(eq(tireLine.season, filters.season));
  if (filters.terrain) conditions.push(eq(tireLine.terrain, filters.terrain));
  if (filters.rim !== undefined) conditions.push(eq(stockItem.rimDiameterIn, filters.rim));
  // In stock as everywhere else: at least one to sell now.
  if (filters.stock === "in") conditions.push(gte(sellableQuantity, 1));
  if (filters.stock === "out") conditions.push(lt(sellableQuantity, 1));
  return and(...conditions);
}

type SortColumn = Parameters<typeof asc>[0];

const sortColumns: Record<CatalogTableSort, SortColumn[]> = {
  sku: [],
  brand: [brand.name, tireLine.name],
  size: [stockItem.rimDiameterIn, stockItem.sectionWidthMm, stockItem.aspectRatio],
  loadIndex: [stockItem.loadIndex],
  speed: [stockItem.speedRank],
  price: [stockItem.priceCents],
  quantity: [stockItem.quantityOnHand],
};

/**
 * ORDER BY for the table: the chosen columns, then the SKU so that pages never shuffle on ties, in
 * plain character order so that PGlite and PostgreSQL agree.
 */
export function catalogOrderBy(filters: CatalogFilters): SQL[] {
  const direction = filters.dir === "desc" ? desc : asc;
  return [...sortColumns[filters.sort].map((column) => direction(column)), direction(sql`${stockItem.sku} collate "C"`)];
}
