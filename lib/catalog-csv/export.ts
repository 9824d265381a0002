import { sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine, staffItemColumns } from "@/lib/catalog/columns";
import { catalogFilterWhere, type CatalogFilters } from "@/lib/counter/catalog-filters";
import { writeCatalogCsv } from "./write-file";

/**
 * The current items the Counter's filters select, as a catalog CSV in SKU order (plain character
 * order, the same on every server). Sort and page are ignored: the export holds every match.
 */
export async function exportCatalogCsv(db: Database, filters: CatalogFilters): Promise<string> {
  const items = await db
    .select(staffItemColumns)
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(catalogFilterWhere(filters))
    .orderBy(sql`${stockItem.sku} collate "C"`);
  return writeCatalogCsv(items);
}

/** sidewise-catalog-2026-03-01.csv */
export function exportFileName(today: Date): string {
  return `sidewise-catalog-${today.toISOString().slice(0, 10)}.csv`;
}
