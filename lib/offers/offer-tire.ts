import { and, eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import { tireColumns, toTire, type Tire } from "@/lib/catalog/catalog-tire";
import { ofBrand, ofLine } from "@/lib/catalog/columns";
import { formatServiceDescription } from "@/lib/tire";

/** A catalog tire as the offer composer lists it: what it is, today's price and how many can be sold now. */
export interface OfferTire {
  sku: string;
  label: string;
  priceCents: number;
  /** How many can be sold now (on hand less those held for booked fittings). */
  sellable: number;
}

export function offerTireOf(tire: Pick<Tire, "sku" | "brand" | "line" | "designation" | "loadIndex" | "loadIndexDual" | "speedSymbol" | "priceCents" | "quantity">): OfferTire {
  return { sku: tire.sku, label: `${tire.brand} ${tire.line} ${tire.designation} ${formatServiceDescription(tire)}`, priceCents: tire.priceCents, sellable: tire.quantity };
}

/** The current (not retired) catalog item with this SKU, or null. */
export async function readOfferTire(db: Database, sku: string): Promise<OfferTire | null> {
  const [row] = await db
    .select(tireColumns)
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(and(eq(stockItem.sku, sku), eq(stockItem.retired, false)));
  return row ? offerTireOf(toTire(row)) : null;
}
