import { count } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine, sellableQuantity, staffItemColumns } from "@/lib/catalog/columns";
import { catalogFilterWhere, catalogFiltersSchema, catalogOrderBy, type CatalogFilters } from "./catalog-filters";

export const CATALOG_TABLE_PAGE_SIZE = 50;

// `quantity` is the count on the shelf that staff edit; `sellable`, how many can be sold now, which the words say.
const tableColumns = { ...staffItemColumns, sellable: sellableQuantity, season: tireLine.season, terrain: tireLine.terrain };

export interface CatalogTablePage {
  rows: CatalogTableRow[];
  total: number;
  page: number;
  pageCount: number;
}

export type CatalogTableRow = Awaited<ReturnType<typeof selectRows>>[number];

function selectRows(db: Database, filters: CatalogFilters) {
  return db
    .select(tableColumns)
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(catalogFilterWhere(filters))
    .orderBy(...catalogOrderBy(filters))
    .limit(CATALOG_TABLE_PAGE_SIZE)
    .offset((filters.page - 1) * CATALOG_TABLE_PAGE_SIZE);
}

/** One page of the Counter's catalog table, with the number of items matching the filters. */
export async function getCatalogTablePage(db: Database, filters: CatalogFilters): Promise<CatalogTablePage> {
  const rows = await selectRows(db, filters);
  const [counted] = await db
    .select({ total: count() })
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(catalogFilterWhere(filters));
  const total = counted?.total ?? 0;
  return { rows, total, page: filters.page, pageCount: Math.max(1, Math.ceil(total / CATALOG_TABLE_PAGE_SIZE)) };
}

type SearchParams = Record<string, string | string[] | undefined>;

/**
 * The filters from a page's address. A value that does not fit is dropped (its default shows)
 * rather than refused, so that an old or hand-edited link still opens the table.
 */
export function readCatalogFilters(searchParams: SearchParams): CatalogFilters {
  const values: Record<string, string | undefined> = {};
  for (const [key, value] of Object.entries(searchParams)) values[key] = Array.isArray(value) ? value[0] : value;
  for (;;) {
    const parsed = catalogFiltersSchema.safeParse(values);
    if (parsed.success) return parsed.data;
    const badKeys = parsed.error.issues.map((issue) => String(issue.path[0]));
    if (!badKeys.some((key) => values[key] !== undefined)) return catalogFiltersSchema.parse({});
    for (const key of badKeys) delete values[key];
  }
}

/** The address of the table with some filters changed; defaults are left out to keep links short. */
export function catalogQueryString(filters: CatalogFilters, changes: Partial<CatalogFilters> = {}): string {
  const merged: CatalogFilters = { ...filters, ...changes };
  const defaults = catalogFiltersSchema.parse({});
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(merged)) {
    if (value === undefined || value === defaults[key as keyof CatalogFilters]) continue;
    params.set(key, String(value));
  }
  return params.toString();
}
