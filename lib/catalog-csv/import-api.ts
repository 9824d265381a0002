import { z } from "zod";
import { schemaOf } from "@/lib/api/schema-match";
import { CATALOG_CSV_COLUMN_NAMES } from "./columns";
import { IMPORT_MODES, type CatalogImportReport } from "./import-report";
import { MAX_IMPORT_BYTES, MAX_IMPORT_SIZE_TEXT } from "./upload";

/** POST /api/v1/catalog/import: the multipart/form-data fields it reads. */
export const catalogImportFormSchema = z.object({
  file: z
    .file()
    .max(MAX_IMPORT_BYTES)
    .meta({ contentMediaType: "text/csv" })
    .describe(`The catalog CSV, at most ${MAX_IMPORT_SIZE_TEXT}, with the columns ${CATALOG_CSV_COLUMN_NAMES.join(", ")}.`),
  mode: z
    .enum(IMPORT_MODES)
    .default("all-or-nothing")
    .describe("all-or-nothing writes nothing when any row is refused; valid-rows writes the rows that passed."),
});

/** Its 200 body: what the import did, or with `written: false` what it would have done. */
export const catalogImportReportSchema = schemaOf<CatalogImportReport>()(
  z.object({
    added: z.number().int(),
    updated: z.number().int(),
    unchanged: z.number().int().describe("Rows identical to the current item."),
    refused: z.array(
      z.object({
        line: z.number().int().describe("The line of the file, the header being line 1."),
        column: z.string(),
        reason: z.string(),
      }),
    ),
    written: z.boolean(),
  }),
);

/** GET /api/v1/catalog/export answers text/csv in the template's columns. */
export const CATALOG_EXPORT_DESCRIPTION = `The catalog as CSV with the columns ${CATALOG_CSV_COLUMN_NAMES.join(", ")}, in SKU order; it re-imports unchanged.`;
