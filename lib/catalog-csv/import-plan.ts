import { inArray, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine, type NewStockItem } from "@/db/schema";
import { ofBrand } from "@/lib/catalog/columns";
import type { StockLine } from "@/lib/stock/build-stock-row";
import type { CsvRefusal } from "./columns";
import { onLine, type CatalogCsvRow } from "./read-row";

/** What the file asks of the catalog: rows to add, rows to change, how many already match, and rows refused. */
export interface ImportPlan {
  added: NewStockItem[];
  updated: NewStockItem[];
  unchanged: number;
  refusals: CsvRefusal[];
}

// Far below PostgreSQL's 65,535 parameters per statement.
const SKUS_PER_LOOKUP = 5000;

/** The fields a person sets; every other column follows from them and the line. */
const COMPARED_FIELDS = ["lineId", "designation", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "extraLoad", "priceCents", "quantityOnHand"] as const;

const existingColumns = {
  sku: stockItem.sku,
  retired: stockItem.retired,
  ...Object.fromEntries(COMPARED_FIELDS.map((field) => [field, stockItem[field]])),
} as { sku: typeof stockItem.sku; retired: typeof stockItem.retired } & { [F in (typeof COMPARED_FIELDS)[number]]: (typeof stockItem)[F] };

const lineKey = (brandName: string, lineName: string) => `${brandName.toLowerCase()}\u0000${lineName.toLowerCase()}`;

/** The lines the file names, found by brand and line name in any letter case, in one query. */
async function findLines(db: Database, rows: readonly CatalogCsvRow[]): Promise<Map<string, StockLine>> {
  const brandNames = [...new Set(rows.map((row) => row.brand.toLowerCase()))];
  if (brandNames.length === 0) return new Map();
  const lines = await db
    .select({ id: tireLine.id, runFlat: tireLine.runFlat, brand: brand.name, line: tireLine.name })
    .from(tireLine)
    .innerJoin(brand, ofBrand)
    .where(inArray(sql`lower(${brand.name})`, brandNames));
  return new Map(lines.map((line) => [lineKey(line.brand, line.line), { id: line.id, runFlat: line.runFlat }]));
}

/** The catalog's rows for the file's SKUs, retired ones included, a few thousand SKUs per query. */
async function findExisting(db: Database, skus: readonly string[]) {
  const found = new Map<string, Awaited<ReturnType<typeof selectExisting>>[number]>();
  for (let start = 0; start < skus.length; start += SKUS_PER_LOOKUP) {
    for (const row of await selectExisting(db, skus.slice(start, start + SKUS_PER_LOOKUP))) found.set(row.sku, row);
  }
  return found;
}

const selectExisting = (db: Database, skus: string[]) => db.select(existingColumns).from(stockItem).where(inArray(stockItem.sku, skus));

/**
 * Matches each read row to the catalog by SKU: a new SKU is added, a current item that differs is
 * updated, an identical one is left alone; a retired SKU or a brand and line the catalog lacks is refused.
 */
export async function planImport(db: Database, rows: readonly CatalogCsvRow[]): Promise<ImportPlan> {
  const lines = await findLines(db, rows);
  const existing = await findExisting(db, rows.map((row) => row.item.sku));
  const plan: ImportPlan = { added: [], updated: [], unchanged: 0, refusals: [] };
  for (const row of rows) {
    const line = lines.get(lineKey(row.brand, row.tireLine));
    if (!line) {
      plan.refusals.push({ line: row.line, column: "line", reason: `the catalog has no line "${row.tireLine}" from the brand "${row.brand}"; add the line first, or correct the names` });
      continue;
    }
    const stockRow = onLine(row, line);
    const current = existing.get(stockRow.sku);
    if (current?.retired) {
      plan.refusals.push({ line: row.line, column: "sku", reason: `SKU "${stockRow.sku}" is retired; give the item a new SKU` });
    } else if (!current) {
      plan.added.push(stockRow);
    } else if (COMPARED_FIELDS.some((field) => current[field] !== (stockRow[field] ?? null))) {
      plan.updated.push(stockRow);
    } else {
      plan.unchanged += 1;
    }
  }
  return plan;
}
