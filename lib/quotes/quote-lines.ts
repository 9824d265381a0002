import { asc, eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, quoteRequestTire, stockItem, tireLine } from "@/db/schema";
import { tireColumns, toTire, type Tire } from "@/lib/catalog/catalog-tire";
import { ofBrand, ofLine } from "@/lib/catalog/columns";
import { estimateSet, type Estimate } from "@/lib/money/estimate";
import { readShopCharges } from "@/lib/shop/charges";

/** A catalog tire a request names, as the Counter shows it: read now, with the request's quantity priced out the door. */
export interface QuoteLine {
  tire: Tire;
  /** False once the item is retired: it then has none to sell and no estimate. */
  stillStocked: boolean;
  estimate: Estimate | null;
}

/**
 * The catalog tires a request names, in its order, each with how many can be sold now and the estimate
 * for `quantity` of them at today's price. A request that names none (typed in freely, or sent from a
 * size sheet) has no lines and so no estimate.
 */
export async function readQuoteLines(db: Database, requestId: number, quantity: number): Promise<QuoteLine[]> {
  const rows = await db
    .select({ ...tireColumns, retired: stockItem.retired })
    .from(quoteRequestTire)
    .innerJoin(stockItem, eq(quoteRequestTire.stockItemId, stockItem.id))
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(eq(quoteRequestTire.requestId, requestId))
    .orderBy(asc(quoteRequestTire.position));
  if (rows.length === 0) return [];
  const charges = await readShopCharges(db);
  return rows.map(({ retired, ...row }) => ({
    tire: toTire({ ...row, quantity: retired ? 0 : row.quantity }),
    stillStocked: !retired,
    estimate: retired ? null : estimateSet(row.priceCents, quantity, charges),
  }));
}
