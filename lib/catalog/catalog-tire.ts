import { sql } from "drizzle-orm";
import type { SelectResultFields } from "drizzle-orm/query-builders/select.types";
import { z } from "zod";
import { brand, stockItem, tireLine } from "@/db/schema";
import { SEASONS, TERRAINS } from "@/lib/tire";
import { sellableQuantity } from "./columns";

/** One catalog item as every endpoint returns it. */
export const tireSchema = z.object({
  sku: z.string(),
  brand: z.string(),
  line: z.string(),
  designation: z.string().describe('The size as the tire core writes it, e.g. "285/50R20".'),
  loadIndex: z.number().int(),
  loadIndexDual: z.number().int().nullable().describe("The dual-mounting load index; null for a tire with no dual rating (every passenger tire)."),
  speedSymbol: z.string(),
  loadRange: z.string().nullable(),
  extraLoad: z.boolean(),
  runFlat: z.boolean(),
  season: z.enum(SEASONS),
  terrain: z.enum(TERRAINS),
  threePeak: z.boolean().describe("Marked with the three-peak mountain snowflake (3PMSF)."),
  treadDepth32: z.number().int().nullable().describe("New tread depth in 32nds of an inch: the item's own, else its line's; null when neither is known."),
  overallDiameterMm: z.number().describe("Nominal overall diameter, unrounded."),
  priceCents: z.number().int().describe("Price of one tire in US cents."),
  quantity: z.number().int().min(0).describe("How many can be sold now."),
  inStock: z.boolean().describe("quantity ≥ 1."),
});

export type Tire = z.infer<typeof tireSchema>;

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
  quantity: sellableQuantity,
};

/** A Tire's columns from its line and brand; the tread depth is the item's own, else its line's. */
export const tireLineColumns = {
  brand: brand.name,
  line: tireLine.name,
  season: tireLine.season,
  terrain: tireLine.terrain,
  threePeak: tireLine.threePeak,
  treadDepth32: sql<number | null>`coalesce(${stockItem.treadDepth32}, ${tireLine.treadDepth32})`,
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
    treadDepth32: row.treadDepth32,
    overallDiameterMm: row.overallDiameterMm,
    priceCents: row.priceCents,
    quantity: row.quantity,
    inStock: row.quantity >= 1,
  };
}
