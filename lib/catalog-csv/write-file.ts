import Papa from "papaparse";
import { CATALOG_CSV_COLUMN_NAMES, CATALOG_CSV_COLUMNS, type CatalogCsvColumnName } from "./columns";
import { centsToDollarsText } from "@/lib/money/money";
import { CSV_COMMENT_MARK } from "./read-file";

/** A catalog item as the CSV writes it. */
export interface CatalogCsvItem {
  sku: string;
  brand: string;
  line: string;
  designation: string;
  loadIndex: number;
  loadIndexDual: number | null;
  speedSymbol: string;
  loadRange: string | null;
  extraLoad: boolean;
  priceCents: number;
  quantity: number;
}

function cells(item: CatalogCsvItem): Record<CatalogCsvColumnName, string> {
  return {
    sku: item.sku,
    brand: item.brand,
    line: item.line,
    size: item.designation,
    load_index: String(item.loadIndex),
    load_index_dual: item.loadIndexDual === null ? "" : String(item.loadIndexDual),
    speed_symbol: item.speedSymbol,
    load_range: item.loadRange ?? "",
    extra_load: item.extraLoad ? "yes" : "no",
    price: centsToDollarsText(item.priceCents),
    quantity: String(item.quantity),
  };
}

/**
 * The catalog CSV for these items, in the column order of the template, with CRLF line ends as
 * spreadsheets write them. A cell that starts like a formula gets an apostrophe in front, which the
 * import takes off again, so the file re-imports unchanged.
 */
export function writeCatalogCsv(items: readonly CatalogCsvItem[]): string {
  return Papa.unparse(
    { fields: [...CATALOG_CSV_COLUMN_NAMES], data: items.map((item) => CATALOG_CSV_COLUMN_NAMES.map((column) => cells(item)[column])) },
    { escapeFormulae: /^[=+\-@]/, newline: "\r\n" },
  );
}

const TEMPLATE_NOTE =
  `${CSV_COMMENT_MARK} Put one stock item per row below this line (rows starting with ${CSV_COMMENT_MARK} are skipped). ` +
  "What each column holds and an example of each: the column guide.";

/**
 * The template to download: the header and one comment row, and no example items, so nobody imports
 * invented tires by adding their own below them. The examples live in the column guide.
 */
export function writeCatalogTemplateCsv(): string {
  return Papa.unparse({ fields: [...CATALOG_CSV_COLUMN_NAMES], data: [[TEMPLATE_NOTE]] }, { newline: "\r\n" });
}

/** The column guide as a CSV to download beside the template: each column, whether required, its meaning and an example. */
export function writeColumnGuideCsv(): string {
  return Papa.unparse(
    {
      fields: ["column", "required", "meaning", "example"],
      data: CATALOG_CSV_COLUMNS.map((column) => [column.name, column.required ? "yes" : "no", column.meaning, column.example]),
    },
    { newline: "\r\n" },
  );
}
