import { eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockItem } from "@/db/schema";
import { belowHeldMessage } from "@/lib/fittings";
import { formatDateTime } from "@/lib/format/format";
import { readShopTimeZone } from "@/lib/shop/queries";
import { offersHoldingItem } from "./queries";

/**
 * Why an item's quantity on hand may not drop as asked: the tires held for booked fittings, and
 * which offers hold them ("offer 12, fitting Tue, Dec 8, 9:00 AM EST: 4 tires"), so staff know whom to call.
 */
export async function belowHeldRefusal(db: Database, sku: string): Promise<string> {
  const [item] = await db.select({ id: stockItem.id, held: stockItem.heldQuantity }).from(stockItem).where(eq(stockItem.sku, sku));
  if (!item) return `No current catalog item has the SKU "${sku}".`;
  const [holders, timeZone] = await Promise.all([offersHoldingItem(db, item.id), readShopTimeZone(db)]);
  const named = holders.map((hold) => `offer ${hold.offerId} (request ${hold.requestId}${hold.start ? `, fitting ${formatDateTime(hold.start, { timeZone })}` : ""}): ${hold.quantity}`);
  return `${belowHeldMessage(item.held)}${named.length > 0 ? ` Held by ${named.join("; ")}.` : ""} Mark those fittings or cancel them first.`;
}
