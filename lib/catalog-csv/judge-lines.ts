import type { ListedBrand, ListedLine } from "@/lib/brands/brand-bodies";
import { retiredLineReason, unknownBrandReason, unknownLineReason } from "@/lib/brands/line-words";
import type { CsvRefusal } from "./columns";
import type { CatalogCsvRow } from "./read-row";

/**
 * What the rows' brand and line names are judged against: the brand list (listBrands, the answer of
 * GET /api/v1/brands) and the current items of retired lines (listItemsOnRetiredLines). The server
 * reads both inside the import's transaction; the import page hands the browser the same two.
 */
export interface CatalogLines {
  brands: readonly ListedBrand[];
  /** [SKU, line id] of each current item on a retired line. */
  itemsOnRetiredLines: readonly (readonly [sku: string, lineId: number])[];
}

/** A row whose brand and line the catalog has and may use, with the line's id. */
export interface LinedRow {
  row: CatalogCsvRow;
  lineId: number;
}

export type LineJudge = (row: CatalogCsvRow) => { ok: true; lineId: number } | { ok: false; refusal: CsvRefusal };

/**
 * Judges rows by their brand and line, names compared without case: an unknown brand, an unknown
 * line of a known brand, and a retired line are refused, except that an item a retired line already
 * holds may be updated (a retired line takes no new items, yet its remaining stock is still sold).
 * Pure: the import on the server and the preview in the browser judge with this one function.
 */
export function lineJudge({ brands, itemsOnRetiredLines }: CatalogLines): LineJudge {
  const byName = new Map(
    brands.map((brand) => [brand.name.toLowerCase(), { brand, lines: new Map<string, ListedLine>(brand.lines.map((line) => [line.name.toLowerCase(), line])) }]),
  );
  const retiredLineOfSku = new Map(itemsOnRetiredLines);
  return (row) => {
    const refuse = (column: "brand" | "line", reason: string) => ({ ok: false as const, refusal: { line: row.line, column, reason } });
    const found = byName.get(row.brand.toLowerCase());
    if (!found) return refuse("brand", unknownBrandReason(row.brand));
    const line = found.lines.get(row.tireLine.toLowerCase());
    if (!line) return refuse("line", unknownLineReason(found.brand.name, row.tireLine));
    if (line.retired && retiredLineOfSku.get(row.item.sku) !== line.id) return refuse("line", retiredLineReason(`${found.brand.name} ${line.name}`));
    return { ok: true, lineId: line.id };
  };
}

/** Splits rows into those on a line the catalog can take and the refusals for the rest, in file order. */
export function judgeRowLines(rows: readonly CatalogCsvRow[], judge: LineJudge): { lined: LinedRow[]; refusals: CsvRefusal[] } {
  const lined: LinedRow[] = [];
  const refusals: CsvRefusal[] = [];
  for (const row of rows) {
    const judged = judge(row);
    if (judged.ok) lined.push({ row, lineId: judged.lineId });
    else refusals.push(judged.refusal);
  }
  return { lined, refusals };
}
