import { CATALOG_CSV_COLUMN_NAMES } from "@/lib/catalog-csv/columns";
import type { CatalogLines } from "@/lib/catalog-csv/judge-lines";

/**
 * A catalog CSV of invented stock: the header, then `rows` rows of a passenger size. A row on one of
 * `badLines` (the header being line 1) carries load index 999, which no load-index table has.
 */
export function catalogCsv(rows: number, { badLines = [] as number[] } = {}): string {
  const lines = [CATALOG_CSV_COLUMN_NAMES.join(",")];
  for (let index = 0; index < rows; index += 1) {
    const loadIndex = badLines.includes(index + 2) ? "999" : "102";
    lines.push(`TST-${String(index).padStart(5, "0")},Quensal,Aldermoor Tour,225/65R17,${loadIndex},,H,,no,159.00,8`);
  }
  return `${lines.join("\n")}\n`;
}

export const csvFile = (text: string, name = "stock.csv") => new File([text], name, { type: "text/csv" });

const line = (id: number, name: string, retired = false) => ({ id, name, season: "all-season", terrain: "highway", threePeak: false, treadDepth32: 10, retired }) as const;

/** The brands and lines the fixtures' rows are judged against: Caddon MT is retired and still holds TST-KEEP. */
export const catalogLines: CatalogLines = {
  brands: [{ id: 1, name: "Quensal", lines: [line(1, "Aldermoor Tour"), line(2, "Caddon MT", true)] }],
  itemsOnRetiredLines: [["TST-KEEP", 2]],
};
