import Papa from "papaparse";
import {
  CATALOG_CSV_COLUMN_NAMES,
  isCatalogCsvColumnName,
  normalizeHeaderName,
  REQUIRED_CATALOG_CSV_COLUMNS,
  type CatalogCsvColumnName,
  type CatalogCsvRecord,
  type CsvRefusal,
} from "./columns";
import { normalizeCsvText } from "./line-endings";
import { readCsvRow, type CatalogCsvRow } from "./read-row";
import { EXPORT_AS_CSV } from "./upload";

export type CatalogCsvFile =
  /** Not a CSV at all (binary, empty, no header row, another separator): `message` says what to do. */
  | { ok: false; message: string }
  /**
   * The rows that read cleanly and the refusals, in file order. When `headerRefused`, the header
   * itself is wrong (refusals on line 1) and no row was read.
   */
  | { ok: true; rows: CatalogCsvRow[]; refusals: CsvRefusal[]; headerRefused: boolean; rowCount: number };

const unreadable = (problem: string): CatalogCsvFile => ({ ok: false, message: `${problem}: ${EXPORT_AS_CSV}.` });

/** NUL characters, or undecodable bytes, only turn up in pictures, workbooks and other binary files. */
function looksBinary(text: string): boolean {
  const start = text.slice(0, 4096);
  const undecodable = start.split("\uFFFD").length - 1;
  return start.includes("\u0000") || undecodable > start.length / 100;
}

const isBlank = (cells: readonly string[]) => cells.every((cell) => cell.trim() === "");

/** A row whose first cell starts with # is a note to whoever edits the file (the template has one); no SKU can start so. */
export const CSV_COMMENT_MARK = "#";
const isComment = (cells: readonly string[]) => cells[0]?.trimStart().startsWith(CSV_COMMENT_MARK) ?? false;
/** Rows the import passes over without counting: blank ones and comments. */
export const isSkippedRow = (cells: readonly string[]) => isBlank(cells) || isComment(cells);

/**
 * Reads a whole catalog CSV: the header, then every row through readCsvRow. A SKU that appears twice
 * is refused on its later line. Line numbers are the row numbers a spreadsheet shows (header = 1).
 * Pure, so the upload screen previews exactly what the server will do.
 */
export function readCatalogCsv(fileText: string): CatalogCsvFile {
  const opened = openCatalogCsv(fileText);
  if ("read" in opened) return opened.read;
  return { ok: true, ...readCatalogRows(opened.columns, opened.dataRows, FIRST_DATA_LINE, new Map()), headerRefused: false };
}

/** The file line of the first row under the header. */
export const FIRST_DATA_LINE = 2;

/**
 * A catalog CSV split into cells, its header read: either the whole answer already (not a CSV, or a
 * wrong header), or the header's columns and the data rows, for readCatalogRows to read at once or in batches.
 */
export function openCatalogCsv(fileText: string): { read: CatalogCsvFile } | { columns: string[]; dataRows: string[][] } {
  const text = normalizeCsvText(fileText);
  if (text.trim() === "") return { read: unreadable("This file is empty") };
  if (looksBinary(text)) return { read: unreadable("This file is not a CSV (it looks like a picture, a workbook or another binary file)") };

  const parsed = Papa.parse<string[]>(text, { delimiter: ",", newline: "\n", skipEmptyLines: false });
  const unclosedQuote = parsed.errors.find((error) => error.type === "Quotes");
  if (unclosedQuote) {
    return { read: unreadable(`This file is not a CSV that can be read to the end (a quote opened on line ${(unclosedQuote.row ?? 0) + 1} never closes)`) };
  }
  const [headerCells = [], ...dataRows] = parsed.data;
  const header = readCatalogHeader(headerCells);
  if (!header.ok) return { read: unreadable(header.problem) };
  if (header.refusals.length > 0) {
    return { read: { ok: true, rows: [], refusals: header.refusals, headerRefused: true, rowCount: dataRows.filter((cells) => !isSkippedRow(cells)).length } };
  }
  return { columns: header.columns, dataRows };
}

export type CatalogCsvHeader =
  | { ok: false; problem: string }
  /** `columns`: each cell's column name, normalized; `refusals` on line 1 when the header itself is wrong. */
  | { ok: true; columns: string[]; refusals: CsvRefusal[] };

/** Reads the header row: whether this is a catalog CSV at all, and what is wrong with its columns. */
export function readCatalogHeader(headerCells: readonly string[]): CatalogCsvHeader {
  const columns = headerCells.map(normalizeHeaderName);
  if (!columns.some(isCatalogCsvColumnName)) {
    const separator = /;/.test(headerCells.join("")) ? "semicolons" : /\t/.test(headerCells.join("")) ? "tabs" : null;
    return separator
      ? { ok: false, problem: `This file is not a comma-separated CSV (its columns are separated by ${separator})` }
      : { ok: false, problem: `This file is not a CSV with a header row (its first line should name the columns ${CATALOG_CSV_COLUMN_NAMES.join(", ")})` };
  }
  return { ok: true, columns, refusals: checkHeader(headerCells, columns) };
}

/**
 * Reads rows under a header that reads: each through readCsvRow, blank rows and comment rows skipped. `firstLine` is
 * the file line of the first of them; `lineOfSku` remembers SKUs across calls, so that a file read in
 * batches refuses a repeated SKU on its later line exactly as a file read whole does.
 */
export function readCatalogRows(columns: readonly string[], dataRows: readonly string[][], firstLine: number, lineOfSku: Map<string, number>) {
  const rows: CatalogCsvRow[] = [];
  const refusals: CsvRefusal[] = [];
  let rowCount = 0;
  dataRows.forEach((cells, index) => {
    if (isSkippedRow(cells)) return;
    rowCount += 1;
    const line = firstLine + index;
    const extra = cells.slice(columns.length);
    if (cells.length < columns.length || !isBlank(extra)) {
      refusals.push({
        line,
        column: "",
        reason: `the row has ${cells.length} cells but the header names ${columns.length} columns; put a value that contains a comma in double quotes`,
      });
      return;
    }
    const record: CatalogCsvRecord = {};
    columns.forEach((name, i) => {
      if (isCatalogCsvColumnName(name)) record[name] = cells[i] ?? "";
    });
    const read = readCsvRow(record, line);
    if (!read.ok) {
      refusals.push(...read.refusals);
      return;
    }
    const sku = read.row.item.sku;
    const earlier = lineOfSku.get(sku);
    if (earlier !== undefined) {
      refusals.push({ line, column: "sku", reason: `SKU "${sku}" is already on line ${earlier} of this file; each SKU may appear once` });
      return;
    }
    lineOfSku.set(sku, line);
    rows.push(read.row);
  });
  return { rows, refusals, rowCount };
}

/** Missing required columns, columns the catalog does not read, and columns named twice; an unnamed column is ignored. */
function checkHeader(headerCells: readonly string[], header: readonly string[]): CsvRefusal[] {
  const refusals: CsvRefusal[] = [];
  const seen = new Set<CatalogCsvColumnName>();
  header.forEach((name, i) => {
    if (name === "") return;
    if (!isCatalogCsvColumnName(name)) {
      refusals.push({ line: 1, column: headerCells[i]?.trim() ?? name, reason: `the column "${headerCells[i]?.trim()}" is not one the catalog reads; remove it, or rename it to one of ${CATALOG_CSV_COLUMN_NAMES.join(", ")}` });
    } else if (seen.has(name)) {
      refusals.push({ line: 1, column: name, reason: `the column ${name} appears twice in the header row; keep one` });
    } else {
      seen.add(name);
    }
  });
  for (const name of REQUIRED_CATALOG_CSV_COLUMNS) {
    if (!seen.has(name)) refusals.push({ line: 1, column: name, reason: `the required column ${name} is missing from the header row; add it` });
  }
  return refusals;
}
