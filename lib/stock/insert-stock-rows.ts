import type { Database } from "@/db/client";
import { stockItem, type NewStockItem } from "@/db/schema";

// 27 columns a row: 1,000 rows stay well under PostgreSQL's 65,535 parameters per statement.
const ROWS_PER_STATEMENT = 1000;

/** Inserts stock rows (built by buildStockRow) in one transaction: all of them or none. */
export async function insertStockRows(db: Database, rows: readonly NewStockItem[]): Promise<void> {
  if (rows.length === 0) return;
  await db.transaction(async (tx) => {
    for (let start = 0; start < rows.length; start += ROWS_PER_STATEMENT) {
      await tx.insert(stockItem).values(rows.slice(start, start + ROWS_PER_STATEMENT));
    }
  });
}
