import { and, eq, not, sql, type AnyColumn } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine } from "@/lib/catalog/columns";
import type { BrandList, ListedBrand } from "./brand-bodies";

// Names without case, in plain character order, so that PGlite and PostgreSQL list them alike.
const byName = (column: AnyColumn) => sql`lower(${column}) collate "C"`;

/** A line as GET /api/v1/brands lists it under its brand. */
export const listedLineColumns = {
  id: tireLine.id,
  name: tireLine.name,
  season: tireLine.season,
  terrain: tireLine.terrain,
  threePeak: tireLine.threePeak,
  treadDepth32: tireLine.treadDepth32,
  retired: tireLine.retired,
};

/**
 * Every brand with its lines, retired ones included, brands and lines in name order: the answer of
 * GET /api/v1/brands, and what the Lines page, the item form and the import's preview read.
 */
export async function listBrands(db: Database): Promise<BrandList> {
  const rows = await db
    .select({ id: brand.id, name: brand.name, line: listedLineColumns })
    .from(brand)
    .leftJoin(tireLine, ofBrand)
    .orderBy(byName(brand.name), byName(tireLine.name));
  const brands: ListedBrand[] = [];
  for (const row of rows) {
    const last = brands.at(-1);
    const current = last?.id === row.id ? last : brands[brands.push({ id: row.id, name: row.name, lines: [] }) - 1]!;
    if (row.line) current.lines.push(row.line);
  }
  return { brands };
}

/**
 * The current items of retired lines, as [SKU, line id]. A retired line takes no new items, but an item
 * it already holds may still be updated (a CSV that the export wrote re-imports unchanged), so the
 * import and its preview need to know which SKUs those are.
 */
export async function listItemsOnRetiredLines(db: Database): Promise<[sku: string, lineId: number][]> {
  const rows = await db
    .select({ sku: stockItem.sku, lineId: stockItem.lineId })
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .where(and(eq(tireLine.retired, true), not(stockItem.retired)));
  return rows.map((row) => [row.sku, row.lineId]);
}

/** The lines whose every item is run-flat (demo lines such as "Vessant RF"); the API does not set this. */
export async function listRunFlatLineIds(db: Database): Promise<Set<number>> {
  const rows = await db.select({ id: tireLine.id }).from(tireLine).where(eq(tireLine.runFlat, true));
  return new Set(rows.map((row) => row.id));
}
