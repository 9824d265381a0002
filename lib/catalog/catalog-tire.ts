import type { SelectResultFields } from "drizzle-orm/query-builders/select.types";
import { brand, stockItem, tireLine, type Season, type Terrain } from "@/db/schema";

/** One catalog item as every endpoint returns it. */
export interface Tire {
  sku: string;
  brand: string;
  line: string;
  designation: string;
  loadIndex: number;
  loadIndexDual: number | null;
  speedSymbol: string;
  loadRange: string | null;
  extraLoad: boolean;
  runFlat: boolean;
  season: Season;
  terrain: Terrain;
  threePeak: boolean;
  overallDiameterMm: number;
  priceCents: number;
  inStock: boolean;
}

/** A Tire's columns from stock_item. */
export const tireStockColumns = {
  sku: stockItem.sku,
  designation: stockItem.designation,
  loadIndex: stockItem.loadIndex,
  loadIndexDual: stockItem.loadIndexDual,
  speedSymbol: stockItem.speedSymbol,
  loadRange: stockItem.loadRange,
  extraLoad: stockItem.extraLoad,
  runFlat: stockItem.runFlat,
  overallDiameterMm: stockItem.overallDiameterMm,
  priceCents: stockItem.priceCents,
  quantityOnHand: stockItem.quantityOnHand,
};

/** A Tire's columns from its line and brand. */
export const tireLineColumns = {
  brand: brand.name,
  line: tireLine.name,
  season: tireLine.season,
  terrain: tireLine.terrain,
  threePeak: tireLine.threePeak,
};

/** Every column a Tire is built from; select them from stock_item joined to tire_line and brand. */
export const tireColumns = { ...tireStockColumns, ...tireLineColumns };

export type TireRow = SelectResultFields<typeof tireColumns>;

export function toTire(row: TireRow): Tire {
  return {
    sku: row.sku,
    brand: row.brand,
    line: row.line,
    designation: row.designation,
    loadIndex: row.loadIndex,
    loadIndexDual: row.loadIndexDual,
    speedSymbol: row.speedSymbol,
    loadRange: row.loadRange,
    extraLoad: row.extraLoad,
    runFlat: row.runFlat,
    season: row.season,
    terrain: row.terrain,
    threePeak: row.threePeak,
    overallDiameterMm: row.overallDiameterMm,
    priceCents: row.priceCents,
    inStock: row.quantityOnHand > 0,
  };
}
