import { z } from "zod";
import { tireSchema } from "@/lib/catalog/catalog-tire";
import { catalogPageSchema } from "@/lib/catalog/list-catalog";
import { catalogQuerySchema } from "@/lib/catalog/query-schema";
import { CATALOG_EXPORT_DESCRIPTION, catalogImportFormSchema, catalogImportReportSchema } from "@/lib/catalog-csv/import-api";
import { catalogFiltersSchema } from "@/lib/counter/catalog-filters";
import { newStockItemSchema, skuParamsSchema, stockItemChangesSchema } from "@/lib/stock/item-bodies";
import { named, type ApiOperation } from "./operation";

const tire = named("Tire", tireSchema);

/** The catalog: read by anyone, written by staff. */
export const CATALOG_ROUTES: ApiOperation[] = [
  {
    method: "get",
    path: "/api/v1/catalog",
    tag: "Catalog",
    summary: "The current catalog in plain SKU order, a page at a time",
    access: "public",
    query: catalogQuerySchema,
    answers: [{ status: 200, description: "One page of tires.", json: named("CatalogPage", catalogPageSchema) }],
  },
  {
    method: "post",
    path: "/api/v1/catalog",
    tag: "Catalog",
    summary: "Add a stock item to a line the catalog has",
    description:
      "The size is read by the tire core. An unknown brand or line → 422 unknown_line; a retired line → 422 line_retired; a SKU in use → 409 already_exists.",
    access: "staff",
    body: named("NewStockItem", newStockItemSchema),
    answers: [{ status: 201, description: "The item as the catalog now returns it.", json: tire }],
    errors: ["already_exists", "unknown_line", "line_retired", "unreadable"],
  },
  {
    method: "patch",
    path: "/api/v1/catalog/{sku}",
    tag: "Catalog",
    summary: "Change a current item's price, quantity or other fields",
    description: "An item may stay on a retired line but not move onto one (422 line_retired). A quantity below the tires held for booked fittings → 409 held_for_fittings, naming the offers that hold them.",
    access: "staff",
    params: skuParamsSchema,
    body: named("StockItemChanges", stockItemChangesSchema),
    answers: [{ status: 200, description: "The item after the change.", json: tire }],
    errors: ["unknown_line", "line_retired", "unreadable", "held_for_fittings"],
  },
  {
    method: "delete",
    path: "/api/v1/catalog/{sku}",
    tag: "Catalog",
    summary: "Retire an item: it leaves the catalog and the finder but keeps its row",
    access: "staff",
    params: skuParamsSchema,
    answers: [{ status: 204, description: "Retired." }],
  },
  {
    method: "get",
    path: "/api/v1/catalog/export",
    tag: "Catalog",
    summary: "The current catalog, or the part the Counter's filters select, as CSV",
    access: "staff",
    query: catalogFiltersSchema,
    answers: [
      {
        status: 200,
        description: "The CSV, as an attachment.",
        csv: CATALOG_EXPORT_DESCRIPTION,
        headers: { "Content-Disposition": { description: "attachment; filename=…", schema: z.string() } },
      },
    ],
  },
  {
    method: "post",
    path: "/api/v1/catalog/import",
    tag: "Catalog",
    summary: "Import a catalog CSV, matching rows by SKU",
    description:
      "The same file again changes nothing. A body that is not multipart/form-data, or has no file → 400; over the limit → 413 too_large; not a CSV → 422 unreadable.",
    access: "staff",
    form: named("CatalogImportForm", catalogImportFormSchema),
    answers: [{ status: 200, description: "What was added, updated and refused.", json: named("CatalogImportReport", catalogImportReportSchema) }],
    errors: ["missing_parameter", "invalid_parameter", "too_large", "unreadable"],
  },
];
