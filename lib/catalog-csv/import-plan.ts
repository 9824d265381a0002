import { belowHeldMessage } from "@/lib/fittings";
import { inArray, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockItem, type NewStockItem } from "@/db/schema";
import { listBrands, listItemsOnRetiredLines, listRunFlatLineIds } from "@/lib/brands/queries";
import type { CsvRefusal } from "./columns";
import { yieldToEventLoop } from "./event-loop";
import type { CatalogLines, LinedRow } from "./judge-lines";
import { onLine } from "./read-row";

/** A row that changes a current item, and the version of the item it was planned against. */
export interface PlannedUpdate {
  row: NewStockItem;
  /** The item's row version (PostgreSQL's xmin) when planned: the write changes it only while it is still this one. */
  version: string;
}

/** What the file asks of the catalog: rows to add, rows to change, how many already match, and rows refused. */
export interface ImportPlan {
  added: NewStockItem[];
  updated: PlannedUpdate[];
  unchanged: number;
  refusals: CsvRefusal[];
}

// Far below PostgreSQL's 65,535 parameters per statement, and short enough on the embedded database
// (tens of milliseconds) that the site's other queries get their turn between look-ups.
const SKUS_PER_LOOKUP = 1000;

/** The fields a person sets; every other column follows from them and the line. */
const COMPARED_FIELDS = ["lineId", "designation", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "extraLoad", "priceCents", "quantityOnHand"] as const;

const existingColumns = {
  sku: stockItem.sku,
  retired: stockItem.retired,
  heldQuantity: stockItem.heldQuantity,
  version: sql<string>`${stockItem}.xmin::text`,
  ...Object.fromEntries(COMPARED_FIELDS.map((field) => [field, stockItem[field]])),
} as { sku: typeof stockItem.sku; retired: typeof stockItem.retired; heldQuantity: typeof stockItem.heldQuantity; version: ReturnType<typeof sql<string>> } & { [F in (typeof COMPARED_FIELDS)[number]]: (typeof stockItem)[F] };

/** The brand list and the current items of retired lines, which rows are judged against (lineJudge). */
export async function readCatalogLines(db: Database): Promise<CatalogLines> {
  const { brands } = await listBrands(db);
  return { brands, itemsOnRetiredLines: await listItemsOnRetiredLines(db) };
}

/** The catalog's rows for the file's SKUs, retired ones included, a few thousand SKUs per query. */
async function findExisting(db: Database, skus: readonly string[]) {
  const found = new Map<string, Awaited<ReturnType<typeof selectExisting>>[number]>();
  for (let start = 0; start < skus.length; start += SKUS_PER_LOOKUP) {
    if (start > 0) await yieldToEventLoop();
    for (const row of await selectExisting(db, skus.slice(start, start + SKUS_PER_LOOKUP))) found.set(row.sku, row);
  }
  return found;
}

const selectExisting = (db: Database, skus: string[]) => db.select(existingColumns).from(stockItem).where(inArray(stockItem.sku, skus));

/**
 * Matches each row (on the line lineJudge found for it) to the catalog by SKU: a new SKU is added, a
 * current item that differs is updated, an identical one is left alone; a retired SKU is refused.
 */
export async function planImport(db: Database, rows: readonly LinedRow[]): Promise<ImportPlan> {
  const runFlatLines = await listRunFlatLineIds(db);
  const existing = await findExisting(db, rows.map(({ row }) => row.item.sku));
  const plan: ImportPlan = { added: [], updated: [], unchanged: 0, refusals: [] };
  for (const { row, lineId } of rows) {
    const stockRow = onLine(row, { id: lineId, runFlat: runFlatLines.has(lineId) });
    const current = existing.get(stockRow.sku);
    if (current?.retired) {
      plan.refusals.push({ line: row.line, column: "sku", reason: `SKU "${stockRow.sku}" is retired; give the item a new SKU` });
    } else if (current && stockRow.quantityOnHand < current.heldQuantity) {
      plan.refusals.push({ line: row.line, column: "quantity", reason: `${belowHeldMessage(current.heldQuantity)} Mark or cancel those fittings at the Counter first` });
    } else if (!current) {
      plan.added.push(stockRow);
    } else if (COMPARED_FIELDS.some((field) => current[field] !== (stockRow[field] ?? null))) {
      plan.updated.push({ row: stockRow, version: current.version });
    } else {
      plan.unchanged += 1;
    }
  }
  return plan;
}
