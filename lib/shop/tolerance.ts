import { asc } from "drizzle-orm";
import type { Database } from "@/db/client";
import { shop } from "@/db/schema";

/** The finder's tolerance when a search names none (rule 2, "default 3 %"). */
export const FALLBACK_TOLERANCE_PCT = 3;

/** The shop's default diameter tolerance in percent; 3 % before the shop has been set up. */
export async function readShopTolerance(db: Database): Promise<number> {
  const [row] = await db.select({ tolerancePct: shop.defaultTolerancePct }).from(shop).orderBy(asc(shop.id)).limit(1);
  return row?.tolerancePct ?? FALLBACK_TOLERANCE_PCT;
}
