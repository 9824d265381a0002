import { and, asc, eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine, staffItemColumns } from "@/lib/catalog/columns";

export interface BrandWithLines {
  name: string;
  lines: string[];
}

/** Every brand with its line names, alphabetically: what the item form offers. */
export async function listBrandsWithLines(db: Database): Promise<BrandWithLines[]> {
  const rows = await db
    .select({ brand: brand.name, line: tireLine.name })
    .from(tireLine)
    .innerJoin(brand, ofBrand)
    .orderBy(asc(brand.name), asc(tireLine.name));
  const brands = new Map<string, string[]>();
  for (const row of rows) brands.set(row.brand, [...(brands.get(row.brand) ?? []), row.line]);
  return [...brands].map(([name, lines]) => ({ name, lines }));
}

/** A current (not retired) item as the edit form starts from it; null when there is none. */
export async function getEditableItem(db: Database, sku: string) {
  const [row] = await db
    .select(staffItemColumns)
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(and(eq(stockItem.sku, sku), eq(stockItem.retired, false)));
  return row ?? null;
}

export type EditableItem = NonNullable<Awaited<ReturnType<typeof getEditableItem>>>;
