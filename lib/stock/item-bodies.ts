import { z } from "zod";
import { lineText } from "@/lib/validation/text";
import { skuSchema } from "@/lib/validation/sku";
import { treadDepth32Schema } from "@/lib/validation/tread-depth";
import { stockItemInputSchema } from "./build-stock-row";

const name = lineText().trim().min(1).max(100);

/**
 * POST /api/v1/catalog: a new stock item in a line the catalog already has (and has not retired).
 * `treadDepth32` is the item's own new tread depth, where it differs from its line's; null for none.
 */
export const newStockItemSchema = stockItemInputSchema.extend({ brand: name, line: name, treadDepth32: treadDepth32Schema.nullish() }).strict();

/** PATCH /api/v1/catalog/{sku}: any of the fields but the SKU; a line is looked up in the item's brand unless a brand is given. */
export const stockItemChangesSchema = newStockItemSchema
  .omit({ sku: true })
  .extend({ extraLoad: z.boolean() })
  .partial()
  .strict()
  .refine((changes) => Object.keys(changes).length > 0, { message: "name at least one field to change" });

/** The `{sku}` in a catalog item's address. */
export const skuParamsSchema = z.object({ sku: skuSchema });

export type NewStockItemBody = z.infer<typeof newStockItemSchema>;
export type StockItemChanges = z.infer<typeof stockItemChangesSchema>;
