import { eq, sql } from "drizzle-orm";
import { brand, stockItem, tireLine } from "@/db/schema";

/** Join conditions from stock_item to its line and from the line to its brand. */
export const ofLine = eq(stockItem.lineId, tireLine.id);
export const ofBrand = eq(tireLine.brandId, brand.id);

/**
 * How many of an item can be sold now: a whole number ≥ 0, the one definition every query reads (a
 * Tire's `quantity`, the finder's stock filter, the Counter's in/out filter, Fit cards, quote lines).
 * It is the quantity on hand less the tires held for booked fittings (the database keeps the held
 * count within what is on hand, so it is never below 0; lib/fittings/holds.ts is the same rule in
 * TypeScript). Keep it an expression over stock_item alone, so the finder's item reads stay within
 * its indexes. stock_fitment.in_stock_count (the trigger function of migration 0013) counts the
 * items where it is ≥ 1: change the two together (tests/integration/catalog/fitments.test.ts
 * compares them).
 */
export const sellableQuantity = sql<number>`(${stockItem.quantityOnHand} - ${stockItem.heldQuantity})`.mapWith(Number);

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
