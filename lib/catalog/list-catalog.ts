import { and, gt, not, sql } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine } from "./columns";
import { encodeCatalogCursor } from "./cursor";
import { skuPlainOrder } from "./columns";
import { tireColumns, tireSchema, toTire } from "./catalog-tire";

/** The 200 body of GET /api/v1/catalog. */
export const catalogPageSchema = z.object({
  items: z.array(tireSchema),
  nextCursor: z.string().nullable().describe("Pass as `cursor` for the next page; null on the last page."),
});

export type CatalogPage = z.infer<typeof catalogPageSchema>;

/** The current catalog (retired items left out) in plain SKU order, one keyset page at a time. */
export async function listCatalog(db: Database, options: { afterSku: string | null; limit: number }): Promise<CatalogPage> {
  const rows = await db
    .select(tireColumns)
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(and(not(stockItem.retired), options.afterSku === null ? undefined : gt(skuPlainOrder, sql`${options.afterSku}::text collate "C"`)))
    .orderBy(skuPlainOrder)
    .limit(options.limit + 1);
  const items = rows.slice(0, options.limit).map(toTire);
  const last = items.at(-1);
  return { items, nextCursor: rows.length > options.limit && last ? encodeCatalogCursor(last.sku) : null };
}
