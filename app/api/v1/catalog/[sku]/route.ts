import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { skuParamsSchema, stockItemChangesSchema } from "@/lib/stock/item-bodies";
import { retireStockItem, updateStockItem } from "@/lib/stock/item-writes";

/** Staff change a current item's price, quantity or other fields → 200 Tire. */
export const PATCH = withRoute({ role: "staff", params: skuParamsSchema, body: stockItemChangesSchema }, async ({ db, user, params, body }) => {
  const result = await updateStockItem(db, params.sku, body, user);
  return result.ok ? NextResponse.json(result.tire) : apiError(result.code, result.message, undefined, result.field);
});

/** Staff retire an item → 204; it leaves the catalog and the finder but keeps its row. */
export const DELETE = withRoute({ role: "staff", params: skuParamsSchema }, async ({ db, user, params }) => {
  if (!(await retireStockItem(db, params.sku, user))) return apiError("not_found", `No current catalog item has the SKU "${params.sku}".`);
  return new Response(null, { status: 204 });
});
