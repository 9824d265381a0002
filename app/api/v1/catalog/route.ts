import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { catalogQuerySchema, DEFAULT_PAGE_SIZE } from "@/lib/catalog/query-schema";
import { listCatalog } from "@/lib/catalog/list-catalog";
import { decodeCatalogCursor } from "@/lib/catalog/cursor";
import { newStockItemSchema } from "@/lib/stock/item-bodies";
import { createStockItem } from "@/lib/stock/item-writes";

/** Public: the current catalog in plain SKU order, a page at a time. */
export const GET = withRoute({ role: "public", query: catalogQuerySchema }, async ({ db, query }) => {
  const afterSku = query.cursor === undefined ? null : decodeCatalogCursor(query.cursor);
  if (query.cursor !== undefined && afterSku === null) {
    return apiError("invalid_parameter", 'The parameter "cursor" is invalid: use the nextCursor of a previous page.', undefined, "cursor");
  }
  return NextResponse.json(await listCatalog(db, { afterSku, limit: query.limit ?? DEFAULT_PAGE_SIZE }));
});

/** Staff add a stock item to a line the catalog already has → 201 Tire. */
export const POST = withRoute({ role: "staff", body: newStockItemSchema }, async ({ db, user, body }) => {
  const result = await createStockItem(db, body, user);
  return result.ok ? NextResponse.json(result.tire, { status: 201 }) : apiError(result.code, result.message, undefined, result.field);
});
