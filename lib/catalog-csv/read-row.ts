import type { NewStockItem } from "@/db/schema";
import { isSku, SKU_RULE } from "@/lib/tire";
import { hasControlCharacters } from "@/lib/validation/text-rules";
import { buildStockRow, type StockItemInput, type StockLine, type StockRowProblem } from "@/lib/stock/build-stock-row";
import { isLoadRange, isSpeedSymbol, LOAD_INDEX_MAX, LOAD_INDEX_MIN } from "@/lib/tire";
import type { CatalogCsvColumnName, CatalogCsvRecord, CsvRefusal } from "./columns";
import { centsToDollarsText, parseDollars, MAX_PRICE_CENTS } from "@/lib/money/money";

/** One row read and checked: the item as the catalog's write path takes it, and the line it belongs to. */
export interface CatalogCsvRow {
  /** The line of the file (the header is line 1). */
  line: number;
  brand: string;
  tireLine: string;
  item: StockItemInput;
  /** The row buildStockRow made from it, on a placeholder line: turn it into the real one with `onLine`. */
  stockRow: NewStockItem;
}

export type CsvRowResult = { ok: true; row: CatalogCsvRow } | { ok: false; refusals: CsvRefusal[] };

const COLUMN_OF_FIELD: Record<keyof StockItemInput, CatalogCsvColumnName> = {
  sku: "sku",
  designation: "size",
  loadIndex: "load_index",
  loadIndexDual: "load_index_dual",
  speedSymbol: "speed_symbol",
  loadRange: "load_range",
  extraLoad: "extra_load",
  priceCents: "price",
  quantity: "quantity",
};

// Lines are checked against their brand when the file is imported; any line will do to check the tire itself.
const PLACEHOLDER_LINE: StockLine = { id: 0, runFlat: false };
const WHOLE = /^\d{1,10}$/;
const AMOUNT_SHAPE = /^\$?\d+(\.\d{1,2})?$/;
const YES = ["yes", "y", "true", "1", "xl"];
const NO = ["", "no", "n", "false", "0"];

/**
 * A cell's text, trimmed. The export writes a cell that starts like a spreadsheet formula (=, +, -, @)
 * behind an apostrophe so that no spreadsheet runs it; the apostrophe is taken off again here.
 */
function cellText(record: CatalogCsvRecord, column: CatalogCsvColumnName): string {
  const text = (record[column] ?? "").trim();
  return /^'[=+\-@]/.test(text) ? text.slice(1) : text;
}

/**
 * Reads one CSV record into a stock item, or says what is wrong with it, cell by cell: every cell
 * whose format is wrong is named, then the tire itself is checked by the catalog's own write path
 * (buildStockRow), so the upload preview and the server refuse the same rows for the same reasons.
 * Brand and line are judged against the catalog's by lineJudge (judge-lines.ts), SKUs by the import.
 */
export function readCsvRow(record: CatalogCsvRecord, line: number): CsvRowResult {
  const refusals: CsvRefusal[] = [];
  const refuse = (column: CatalogCsvColumnName, reason: string) => refusals.push({ line, column, reason });
  const required = (column: CatalogCsvColumnName): string => {
    const text = cellText(record, column);
    if (text === "") refuse(column, `${column} is empty; every row needs one`);
    return text;
  };

  const sku = required("sku");
  if (sku !== "" && !isSku(sku)) refuse("sku", `SKU "${sku}" breaks the rule: ${SKU_RULE}`);
  const brand = required("brand");
  const tireLine = required("line");
  for (const [column, name] of [["brand", brand], ["line", tireLine]] as const) {
    if (name.length > 100) refuse(column, `${column} is longer than 100 characters`);
    if (hasControlCharacters(name)) refuse(column, `${column} holds a control character (such as NUL); type the name again`);
  }
  const size = required("size");
  const speedSymbol = required("speed_symbol");
  const loadIndex = readLoadIndex(required("load_index"), "load_index", refuse);
  const loadIndexDualText = cellText(record, "load_index_dual");
  const loadIndexDual = loadIndexDualText === "" ? null : readLoadIndex(loadIndexDualText, "load_index_dual", refuse);
  const loadRangeText = cellText(record, "load_range");

  const extraLoadText = cellText(record, "extra_load").toLowerCase();
  const extraLoad = YES.includes(extraLoadText);
  if (!extraLoad && !NO.includes(extraLoadText)) refuse("extra_load", `extra_load "${cellText(record, "extra_load")}" should be yes or no`);

  const priceText = required("price");
  const priceCents = priceText === "" ? null : parseDollars(priceText);
  if (priceText !== "" && priceCents === null) {
    refuse("price", AMOUNT_SHAPE.test(priceText)
      ? `price ${priceText} is more than a catalog price can be (at most ${centsToDollarsText(MAX_PRICE_CENTS)})`
      : `price "${priceText}" is not an amount in dollars such as 129.99`);
  }
  const quantityText = required("quantity");
  const quantity = quantityText === "" ? null : readWholeNumber(quantityText);
  if (quantityText !== "" && quantity === null) refuse("quantity", `quantity "${quantityText}" is not a whole number of tires such as 8`);

  if (refusals.length > 0 || loadIndex === null || priceCents === null || quantity === null) return { ok: false, refusals };

  const item: StockItemInput = {
    sku,
    designation: size,
    loadIndex,
    loadIndexDual,
    speedSymbol,
    loadRange: loadRangeText === "" ? null : loadRangeText,
    extraLoad,
    priceCents,
    quantity,
  };
  const built = buildStockRow(item, PLACEHOLDER_LINE);
  if (!built.ok) return { ok: false, refusals: [{ line, column: COLUMN_OF_FIELD[built.problem.field], reason: explain(built.problem, item) }] };
  return { ok: true, row: { line, brand, tireLine, item, stockRow: built.row } };
}

/**
 * The row on its real line, without building it again: buildStockRow only takes the line's id and
 * whether the line is run-flat (an item is run-flat when its size or its line is).
 */
export function onLine(row: CatalogCsvRow, line: StockLine): NewStockItem {
  return { ...row.stockRow, lineId: line.id, runFlat: row.stockRow.runFlat || line.runFlat };
}

/** The write path's reason, with the value and an example where a person needs one to fix the cell. */
function explain(problem: StockRowProblem, item: StockItemInput): string {
  const speedSymbol = item.speedSymbol.trim().toUpperCase();
  const loadRange = item.loadRange?.trim().toUpperCase() ?? null;
  if (problem.field === "designation" && !problem.unmeasurable) return `size "${item.designation}" is not a tire size; write it as on the sidewall, such as 225/65R17`;
  if (problem.field === "speedSymbol" && !isSpeedSymbol(speedSymbol)) return `speed symbol "${item.speedSymbol}" is not in the published table (such as T, H, V or W)`;
  if (problem.field === "loadRange" && loadRange !== null && !isLoadRange(loadRange)) return `load range "${item.loadRange}" is not a load range letter such as C, D or E`;
  return problem.reason;
}

function readWholeNumber(text: string): number | null {
  if (!WHOLE.test(text)) return null;
  const value = Number(text);
  return value <= 2_147_483_647 ? value : null;
}

function readLoadIndex(text: string, column: "load_index" | "load_index_dual", refuse: (column: CatalogCsvColumnName, reason: string) => void): number | null {
  if (text === "") return null;
  const label = column === "load_index" ? "load index" : "dual load index";
  const value = readWholeNumber(text);
  if (value === null) {
    refuse(column, `${label} "${text}" is not a whole number such as 102`);
    return null;
  }
  if (value < LOAD_INDEX_MIN || value > LOAD_INDEX_MAX) {
    refuse(column, `${label} ${value} is outside the published table (${LOAD_INDEX_MIN}–${LOAD_INDEX_MAX})`);
    return null;
  }
  return value;
}
