import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  doublePrecision,
  index,
  integer,
  pgTable,
  serial,
  smallint,
  text,
  timestamp,
  unique,
  uniqueIndex,
} from "drizzle-orm/pg-core";

import { CONSTRUCTIONS, SEASONS, SERVICE_TYPES, SKU_CHARACTERS, SKU_MAX_LENGTH, TERRAINS } from "../../lib/tire/vocabulary";

export { CONSTRUCTIONS, SEASONS, SERVICE_TYPES, TERRAINS };
export const SIZE_PREFIXES = ["P", "LT", "ST", "T"] as const;
export const SIZE_KINDS = ["metric", "flotation"] as const;
export const TRACTION_GRADES = ["AA", "A", "B", "C"] as const;
export const TEMPERATURE_GRADES = ["A", "B", "C"] as const;

/** A CHECK's list of allowed texts, written from the product's own list. */
export const oneOf = (values: readonly string[]) => sql.raw(`(${values.map((v) => `'${v}'`).join(", ")})`);

export const brand = pgTable(
  "brand",
  {
    id: serial().primaryKey(),
    name: text().notNull().unique(),
  },
  // Names are compared without case: "Quensal" and "QUENSAL" are one brand.
  (table) => [uniqueIndex("brand_name_any_case").on(sql`lower(${table.name})`)],
);

/** A tread pattern a brand sells in many sizes; what it is made for belongs here, not to each size. */
export const tireLine = pgTable(
  "tire_line",
  {
    id: serial().primaryKey(),
    brandId: integer()
      .notNull()
      .references(() => brand.id, { onDelete: "restrict" }),
    name: text().notNull(),
    season: text({ enum: SEASONS }).notNull(),
    terrain: text({ enum: TERRAINS }).notNull(),
    mudAndSnow: boolean().notNull().default(false),
    threePeak: boolean().notNull().default(false),
    runFlat: boolean().notNull().default(false),
    utqgTreadwear: smallint(),
    utqgTraction: text({ enum: TRACTION_GRADES }),
    utqgTemperature: text({ enum: TEMPERATURE_GRADES }),
    mileageWarrantyMiles: integer(),
    /** New tread depth in 32nds of an inch; an item may state its own. */
    treadDepth32: smallint(),
    /** A retired line keeps its items' history but takes no new items. */
    retired: boolean().notNull().default(false),
  },
  (table) => [
    unique("tire_line_brand_name").on(table.brandId, table.name),
    uniqueIndex("tire_line_brand_name_any_case").on(table.brandId, sql`lower(${table.name})`),
    check("tire_line_tread_depth", sql`${table.treadDepth32} between 1 and 40`),
    check("tire_line_season", sql`${table.season} in ${oneOf(SEASONS)}`),
    check("tire_line_terrain", sql`${table.terrain} in ${oneOf(TERRAINS)}`),
    check("tire_line_traction", sql`${table.utqgTraction} in ${oneOf(TRACTION_GRADES)}`),
    check("tire_line_temperature", sql`${table.utqgTemperature} in ${oneOf(TEMPERATURE_GRADES)}`),
    check("tire_line_treadwear", sql`${table.utqgTreadwear} between 20 and 1500`),
    check(
      "tire_line_utqg_complete",
      sql`(${table.utqgTreadwear} is null) = (${table.utqgTraction} is null) and (${table.utqgTraction} is null) = (${table.utqgTemperature} is null)`,
    ),
    check("tire_line_warranty", sql`${table.mileageWarrantyMiles} between 1 and 200000`),
  ],
);

/**
 * The facts the rules of equal-or-better read from an item (rim, service type, construction,
 * run-flat, overall diameter, load index, speed, load range), shared by every item that has them,
 * with how many current items have them and how many of those are on hand. The database keeps it:
 * triggers on stock_item give each row its fitment and count every write (migration 0007). The
 * finder judges fitments rather than items, so its work follows how many distinct fitments lie
 * near a size, not how many items the catalog holds.
 */
export const stockFitment = pgTable(
  "stock_fitment",
  {
    id: serial().primaryKey(),
    rimDiameterIn: doublePrecision().notNull(),
    serviceType: text({ enum: SERVICE_TYPES }).notNull(),
    construction: text({ enum: CONSTRUCTIONS }).notNull(),
    runFlat: boolean().notNull(),
    overallDiameterMm: doublePrecision().notNull(),
    loadIndex: smallint().notNull(),
    loadIndexDual: smallint(),
    speedRank: smallint().notNull(),
    loadRangePly: smallint(),
    /** Current (not retired) items with these facts. */
    itemCount: integer().notNull().default(0),
    /** Of those, the items with at least one on hand. */
    inStockCount: integer().notNull().default(0),
  },
  (table) => [
    unique("stock_fitment_facts")
      .on(
        table.rimDiameterIn,
        table.serviceType,
        table.construction,
        table.runFlat,
        table.overallDiameterMm,
        table.loadIndex,
        table.loadIndexDual,
        table.speedRank,
        table.loadRangePly,
      )
      .nullsNotDistinct(),
    // The finder reads the fitments of one rim, service type and construction (rules 1 and 6).
    index("stock_fitment_search").on(table.rimDiameterIn, table.serviceType, table.construction, table.overallDiameterMm),
    check("stock_fitment_counts", sql`0 <= ${table.inStockCount} and ${table.inStockCount} <= ${table.itemCount}`),
  ],
);

/**
 * One item the shop sells: a line in one size and service description. The designation is stored
 * normalized and also taken apart, so that the replacement finder can compare in SQL; the overall
 * diameter is worked out by the tire core when the row is written.
 */
export const stockItem = pgTable(
  "stock_item",
  {
    id: serial().primaryKey(),
    sku: text().notNull().unique(),
    lineId: integer()
      .notNull()
      .references(() => tireLine.id, { onDelete: "restrict" }),
    designation: text().notNull(),
    sizeKind: text({ enum: SIZE_KINDS }).notNull(),
    prefix: text({ enum: SIZE_PREFIXES }),
    sectionWidthMm: doublePrecision().notNull(),
    aspectRatio: smallint(),
    rimDiameterIn: doublePrecision().notNull(),
    construction: text({ enum: CONSTRUCTIONS }).notNull(),
    zr: boolean().notNull(),
    commercial: boolean().notNull(),
    runFlat: boolean().notNull(),
    loadIndex: smallint().notNull(),
    loadIndexDual: smallint(),
    speedSymbol: text().notNull(),
    /** Orders speed symbols by km/h (H between U and V; (Y) above Y), from the tire core. */
    speedRank: smallint().notNull(),
    loadRange: text(),
    /** The ply rating the load range stands for (E → 10), so that load ranges compare as numbers. */
    loadRangePly: smallint(),
    extraLoad: boolean().notNull(),
    serviceType: text({ enum: SERVICE_TYPES }).notNull(),
    overallDiameterMm: doublePrecision().notNull(),
    priceCents: integer().notNull(),
    quantityOnHand: integer().notNull(),
    /** Tires on hand held for booked fittings (offers accepted, holds not yet released): they are not for sale. */
    heldQuantity: integer().notNull().default(0),
    retired: boolean().notNull().default(false),
    /** New tread depth in 32nds of an inch, when it differs from its line's. */
    treadDepth32: smallint(),
    /** Set by the database on every write (see stockFitment); never given by the application. */
    fitmentId: integer().references(() => stockFitment.id, { onDelete: "restrict" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    // The finder reads a few of a fitment's items, cheapest first (then by SKU in plain character
    // order), along one of two indexes: for one fitment, or for every fitment of one size and
    // diameter at once, skipping items of other fitments. Each also holds what the filters and the
    // join read, so that the finder reads the index alone.
    index("stock_item_fitment")
      .on(table.fitmentId, table.priceCents, sql`${table.sku} collate "C"`, table.lineId, table.quantityOnHand, table.heldQuantity, table.id)
      .where(sql`not ${table.retired}`),
    index("stock_item_diameter")
      .on(
        table.rimDiameterIn,
        table.serviceType,
        table.construction,
        table.overallDiameterMm,
        table.priceCents,
        sql`${table.sku} collate "C"`,
        table.fitmentId,
        table.lineId,
        table.quantityOnHand,
        table.heldQuantity,
        table.id,
      )
      .where(sql`not ${table.retired}`),
    // Catalog pages walk SKUs in plain character order, the same on every server.
    index("stock_item_sku_plain_order")
      .on(sql`${table.sku} collate "C"`)
      .where(sql`not ${table.retired}`),
    // Every stocked item of one designation (plus sizing counts them).
    index("stock_item_designation")
      .on(table.designation)
      .where(sql`not ${table.retired}`),
    index("stock_item_line").on(table.lineId),
    // Characters that survive a URL path as they are (lib/catalog/sku.ts), in the same plain order everywhere.
    check(
      "stock_item_sku_shape",
      sql`${table.sku} ~ ${sql.raw(`'^[${SKU_CHARACTERS}]{1,${SKU_MAX_LENGTH}}$'`)} and ${table.sku} not in ('.', '..') and lower(${table.sku}) <> 'new'`,
    ),
    check("stock_item_designation", sql`length(${table.designation}) between 1 and 40`),
    check("stock_item_size_kind", sql`${table.sizeKind} in ${oneOf(SIZE_KINDS)}`),
    check("stock_item_prefix", sql`${table.prefix} in ${oneOf(SIZE_PREFIXES)}`),
    check("stock_item_construction", sql`${table.construction} in ${oneOf(CONSTRUCTIONS)}`),
    check("stock_item_service_type", sql`${table.serviceType} in ${oneOf(SERVICE_TYPES)}`),
    check("stock_item_section_width", sql`${table.sectionWidthMm} > 0`),
    check("stock_item_aspect_ratio", sql`${table.aspectRatio} between 20 and 95`),
    check("stock_item_rim", sql`${table.rimDiameterIn} between 8 and 30`),
    check("stock_item_load_index", sql`${table.loadIndex} between 0 and 279`),
    check(
      "stock_item_load_index_dual",
      sql`${table.loadIndexDual} between 0 and 279 and ${table.loadIndexDual} <= ${table.loadIndex}`,
    ),
    check("stock_item_speed", sql`length(${table.speedSymbol}) between 1 and 3 and ${table.speedRank} > 0`),
    check(
      "stock_item_load_range",
      sql`(${table.loadRange} is null) = (${table.loadRangePly} is null) and ${table.loadRangePly} between 4 and 24`,
    ),
    // The trigger that sets it runs before this check.
    check("stock_item_fitment_set", sql`${table.fitmentId} is not null`),
    check("stock_item_diameter", sql`${table.overallDiameterMm} > 0`),
    check("stock_item_price", sql`${table.priceCents} >= 0`),
    check("stock_item_quantity", sql`${table.quantityOnHand} >= 0`),
    check("stock_item_held", sql`${table.heldQuantity} >= 0 and ${table.heldQuantity} <= ${table.quantityOnHand}`),
    check("stock_item_tread_depth", sql`${table.treadDepth32} between 1 and 40`),
  ],
);

export type Brand = typeof brand.$inferSelect;
export type TireLine = typeof tireLine.$inferSelect;
export type NewTireLine = typeof tireLine.$inferInsert;
export type StockItem = typeof stockItem.$inferSelect;
export type NewStockItem = typeof stockItem.$inferInsert;
export type { Season, Terrain } from "../../lib/tire/vocabulary";
export type CatalogServiceType = (typeof SERVICE_TYPES)[number];
