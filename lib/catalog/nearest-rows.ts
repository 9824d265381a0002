import { eq, sql, type Placeholder, type SQL } from "drizzle-orm";
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
 * The first `limit` rows by (sort key, price, SKU in plain character order), as one JSON array of
 * candidate rows (see finder-answer), taken from walks whose own order agrees with it. Walking the
 * diameter outwards on each side of the original along the finder indexes reads about `limit` rows
 * per walk however large the catalog is; only the rows kept are joined to their line and brand.
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
  const nearest =
    first && second
      ? unionAll(first, second, ...rest)
          // plain_sku keeps the C collation of both walks.
          .orderBy(sql.raw(`"sort_key", "price_cents", "plain_sku"`))
          .limit(limit)
      : walkQuery(walks[0]);
  const walked = nearest.as("walked");
  const { lineId, plainSku, ...stockFields } = walked._.selectedFields;
  const fields = Object.entries({ ...stockFields, ...tireLineColumns }).map(([key, value]) => sql`${sql.raw(`'${key}'`)}, ${value}`);
  const orderedRows = sql`json_agg(json_build_object(${sql.join(fields, sql`, `)}) order by ${walked.sortKey}, ${walked.priceCents}, ${plainSku} collate "C")`;
  return db
    .select({ rows: sql`coalesce(${orderedRows}, '[]'::json)` })
    .from(walked)
    .innerJoin(tireLine, eq(lineId, tireLine.id))
    .innerJoin(brand, ofBrand);
}
