import { asc, eq, sql, type Placeholder, type SQL } from "drizzle-orm";
import { unionAll } from "drizzle-orm/pg-core";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ruleFactColumns } from "./catalog-select";
import { skuPlainOrder } from "./rule-sql";
import { tireLineColumns, tireStockColumns } from "./tire";

/** One ordered pass over stock_item: which rows, in which order; only its first rows are read. */
export interface Walk {
  where: SQL | undefined;
  orderBy: SQL[];
}

/**
 * The first `limit` rows by (sort key, price, SKU in plain character order), taken from walks whose
 * own order agrees with it. Walking the diameter outwards on each side of the original along the
 * finder indexes reads about `limit` rows per walk however large the catalog is; only the rows kept
 * are joined to their line and brand.
 */
export function nearestRows(db: Database, walks: readonly [Walk, ...Walk[]], sortKey: SQL<number>, diffPct: SQL<number>, limit: Placeholder) {
  const walkQuery = (walk: Walk) =>
    db
      .select({
        ...tireStockColumns,
        ...ruleFactColumns,
        lineId: stockItem.lineId,
        diffPct: sql<number>`${diffPct}`.as("diff_pct"),
        sortKey: sql<number>`${sortKey}`.as("sort_key"),
        plainSku: sql<string>`${skuPlainOrder}`.as("plain_sku"),
      })
      .from(stockItem)
      .where(walk.where)
      .orderBy(...walk.orderBy)
      .limit(limit);
  const [first, second, ...rest] = walks.map(walkQuery);
  const walked = (first && second ? unionAll(first, second, ...rest) : walkQuery(walks[0])).as("walked");
  const { lineId, plainSku, ...rowColumns } = walked._.selectedFields;
  return db
    .select({ ...rowColumns, ...tireLineColumns })
    .from(walked)
    .innerJoin(tireLine, eq(lineId, tireLine.id))
    .innerJoin(brand, ofBrand)
    .orderBy(asc(walked.sortKey), asc(walked.priceCents), sql`${plainSku} collate "C"`)
    .limit(limit);
}
