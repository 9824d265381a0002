import { CATALOG_CSV_COLUMN_NAMES } from "@/lib/catalog-csv/columns";

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
