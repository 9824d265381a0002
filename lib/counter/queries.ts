import { and, eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine, staffItemColumns } from "@/lib/catalog/columns";

/** A current (not retired) item as the edit form starts from it (with its own tread depth, if any); null when there is none. */
export async function getEditableItem(db: Database, sku: string) {
  const [row] = await db
    .select({ ...staffItemColumns, treadDepth32: stockItem.treadDepth32 })
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(and(eq(stockItem.sku, sku), eq(stockItem.retired, false)));
  return row ?? null;
}

export type EditableItem = NonNullable<Awaited<ReturnType<typeof getEditableItem>>>;
