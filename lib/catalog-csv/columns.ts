/**
 * The columns of the catalog CSV, in the order the export and the template write them. Imports
 * accept them in any order, with headers in any letter case ("Load Index" reads as load_index).
 * Pure: the upload screen uses this list in the browser.
 */
export const CATALOG_CSV_COLUMNS = [
  {
    name: "sku",
    required: true,
    meaning: "The shop's code for the item: 1–64 letters, digits or punctuation, no spaces. A row updates the item with this SKU, or adds it if the catalog has none.",
    example: "QNS-20417",
  },
  { name: "brand", required: true, meaning: "The brand, spelled as the catalog already has it (any letter case).", example: "Quensal" },
  { name: "line", required: true, meaning: "The brand's tire line, spelled as the catalog already has it (any letter case).", example: "Aldermoor Tour" },
  { name: "size", required: true, meaning: "The size as on the sidewall.", example: "225/65R17" },
  { name: "load_index", required: true, meaning: "The load index, a whole number from 0 to 279.", example: "102" },
  {
    name: "load_index_dual",
    required: false,
    meaning: "The load index when mounted in pairs, for light-truck and commercial tires. Leave empty when there is none.",
    example: "",
  },
  { name: "speed_symbol", required: true, meaning: "The speed symbol, such as T, H or V.", example: "H" },
  { name: "load_range", required: false, meaning: "The load range letter of a light-truck tire, such as E. Leave empty for passenger tires.", example: "" },
  { name: "extra_load", required: false, meaning: "yes for an extra load (XL) passenger tire; no or empty otherwise.", example: "no" },
  { name: "price", required: true, meaning: "The price of one tire in US dollars, with a dot before the cents; a dollar sign and thousands commas (1,204.50) are fine.", example: "159.00" },
  { name: "quantity", required: true, meaning: "How many are on hand, a whole number (0 when out of stock).", example: "8" },
] as const satisfies readonly CatalogCsvColumn[];

export interface CatalogCsvColumn {
  name: string;
  required: boolean;
  /** What the column holds, in plain words, for the upload screen and the template. */
  meaning: string;
  example: string;
}

export type CatalogCsvColumnName = (typeof CATALOG_CSV_COLUMNS)[number]["name"];

/** Column names in file order. */
export const CATALOG_CSV_COLUMN_NAMES: readonly CatalogCsvColumnName[] = CATALOG_CSV_COLUMNS.map((column) => column.name);

export const REQUIRED_CATALOG_CSV_COLUMNS: readonly CatalogCsvColumnName[] = CATALOG_CSV_COLUMNS.filter((column) => column.required).map(
  (column) => column.name,
);

/** One cell's text under each column name; a column absent from the file reads as an empty cell. */
export type CatalogCsvRecord = Partial<Record<CatalogCsvColumnName, string>>;

/** A row the import will not write, or a problem with the header (line 1). */
export interface CsvRefusal {
  /** The line of the file, the header being line 1 (the row number a spreadsheet shows). */
  line: number;
  column: string;
  reason: string;
}

/** "Load Index", " load-index " and "LOAD_INDEX" all name load_index. */
export function normalizeHeaderName(header: string): string {
  return header.trim().toLowerCase().replace(/[\s-]+/g, "_");
}

export function isCatalogCsvColumnName(name: string): name is CatalogCsvColumnName {
  return (CATALOG_CSV_COLUMN_NAMES as readonly string[]).includes(name);
}
