import { eq, sql } from "drizzle-orm";
import { brand, stockItem, tireLine } from "@/db/schema";

/** Join conditions from stock_item to its line and from the line to its brand. */
export const ofLine = eq(stockItem.lineId, tireLine.id);
export const ofBrand = eq(tireLine.brandId, brand.id);

/** What the rules read from a candidate, besides what a Tire shows. */
export const ruleFactColumns = {
  rimDiameterIn: stockItem.rimDiameterIn,
  construction: stockItem.construction,
  serviceType: stockItem.serviceType,
};

/** An item as staff edit it (the item form, the Counter's table, the CSV): its own fields and its brand and line by name. */
export const staffItemColumns = {
  sku: stockItem.sku,
  brand: brand.name,
  line: tireLine.name,
  designation: stockItem.designation,
  loadIndex: stockItem.loadIndex,
  loadIndexDual: stockItem.loadIndexDual,
  speedSymbol: stockItem.speedSymbol,
  loadRange: stockItem.loadRange,
  extraLoad: stockItem.extraLoad,
  priceCents: stockItem.priceCents,
  quantity: stockItem.quantityOnHand,
};

/** SKUs in plain character order (COLLATE "C"), so that PGlite and PostgreSQL sort alike. */
export const skuPlainOrder = sql`${stockItem.sku} collate "C"`;
