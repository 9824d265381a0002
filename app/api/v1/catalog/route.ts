import { connection, NextResponse, type NextRequest } from "next/server";
import { getDb } from "@/db/client";
import { apiError } from "@/lib/api/errors";
import { parseQuery } from "@/lib/api/query";
import { withRoute } from "@/lib/auth/guard";
import { catalogQuerySchema, DEFAULT_PAGE_SIZE } from "@/lib/catalog/api-queries";
import { listCatalog } from "@/lib/catalog/catalog-page";
import { decodeCatalogCursor } from "@/lib/catalog/cursor";
import { newStockItemSchema } from "@/lib/catalog/stock-edit";
import { createStockItem } from "@/lib/catalog/stock-writes";

export async function GET(request: NextRequest) {
  await connection();
  const query = parseQuery(request.nextUrl, catalogQuerySchema);
  if (!query.ok) return query.response;
  const afterSku = query.value.cursor === undefined ? null : decodeCatalogCursor(query.value.cursor);
  if (query.value.cursor !== undefined && afterSku === null) {
    return apiError("invalid_parameter", 'The parameter "cursor" is invalid: use the nextCursor of a previous page.');
  }
  const page = await listCatalog(await getDb(), { afterSku, limit: query.value.limit ?? DEFAULT_PAGE_SIZE });
  return NextResponse.json(page);
}

/** Staff add a stock item to a line the catalog already has → 201 Tire. */
export const POST = withRoute({ role: "staff", body: newStockItemSchema }, async ({ db, user, body }) => {
  const result = await createStockItem(db, body, user);
  return result.ok ? NextResponse.json(result.tire, { status: 201 }) : apiError(result.code, result.message);
});
