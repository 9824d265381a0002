import { describe, expect, it } from "vitest";
import { CATALOG_CSV_COLUMN_NAMES } from "@/lib/catalog-csv/columns";
import { readCatalogCsv } from "@/lib/catalog-csv/read-file";
import { writeCatalogCsv, type CatalogCsvItem } from "@/lib/catalog-csv/write-file";

const HEADER = CATALOG_CSV_COLUMN_NAMES.join(",");
const ROW = "QNS-T1,Quensal,Aldermoor Tour,225/65R17,102,,H,,no,159.00,8";
const read = (text: string) => {
  const result = readCatalogCsv(text);
  if (!result.ok) throw new Error(result.message);
  return result;
};
const unreadable = (text: string) => {
  const result = readCatalogCsv(text);
  if (result.ok) throw new Error("the file should not read");
  return result.message;
};

describe("readCatalogCsv", () => {
  it("reads rows with spreadsheet line numbers, skipping blank lines, whatever the column order and header case", () => {
    const result = read(`\uFEFF${HEADER}\r\n${ROW}\r\n\r\n,,,,,,,,,,\r\n${ROW.replace("QNS-T1", "QNS-T2")}\r\n`);
    expect(result.rows.map((row) => [row.line, row.item.sku])).toEqual([[2, "QNS-T1"], [5, "QNS-T2"]]);
    expect(result).toMatchObject({ refusals: [], headerRefused: false, rowCount: 2 });

    // A price as a person writes it, thousands comma and dollar sign included, reads as everywhere else.
    const shuffled = read('Price,SKU,Quantity,Load Index,Speed-Symbol,Size,Brand,LINE\n"$1,159.00",X-1,4,102,H,225/65R17,Quensal,Aldermoor Tour\n');
    expect(shuffled.refusals).toEqual([]);
    expect(shuffled.rows[0]?.item).toMatchObject({ sku: "X-1", priceCents: 115_900 });
    const unreadable = read('price,sku,quantity,load_index,speed_symbol,size,brand,line\n"11,59.00",X-1,4,102,H,225/65R17,Quensal,Aldermoor Tour\n');
    expect(unreadable.refusals).toEqual([{ line: 2, column: "price", reason: 'price "11,59.00" is not an amount in dollars such as 129.99' }]);
    const quoted = read('price,sku,quantity,load_index,speed_symbol,size,brand,line\n"1159.00",X-1,4,102,H,225/65R17,"Quensal","Aldermoor Tour"\n');
    expect(quoted.rows[0]?.item).toMatchObject({ sku: "X-1", priceCents: 115_900, quantity: 4 });
  });

  it("refuses the later of two rows with one SKU, naming the earlier line", () => {
    const result = read([HEADER, ROW, ROW].join("\n"));
    expect(result.rows).toHaveLength(1);
    expect(result.refusals).toEqual([{ line: 3, column: "sku", reason: 'SKU "QNS-T1" is already on line 2 of this file; each SKU may appear once' }]);
  });

  it("refuses a row with more cells than the header names (an unquoted comma)", () => {
    const result = read([HEADER, ROW.replace("159.00", "1,159.00"), `${ROW},,`.replace("QNS-T1", "QNS-T2")].join("\n"));
    expect(result.refusals).toEqual([{ line: 2, column: "", reason: "the row has 12 cells but the header names 11 columns; put a value that contains a comma in double quotes" }]);
    expect(result.rows.map((row) => row.item.sku)).toEqual(["QNS-T2"]);
  });

  it("refuses a header with missing, unknown or doubled columns on line 1, and reads no row", () => {
    const result = read(`sku,brand,line,size,load_index,speed_symbol,price,notes,brand\n${ROW}`);
    expect(result.headerRefused).toBe(true);
    expect(result.rows).toEqual([]);
    expect(result.refusals).toEqual([
      { line: 1, column: "notes", reason: expect.stringMatching(/^the column "notes" is not one the catalog reads; remove it, or rename it to one of sku, brand, /) },
      { line: 1, column: "brand", reason: "the column brand appears twice in the header row; keep one" },
      { line: 1, column: "quantity", reason: "the required column quantity is missing from the header row; add it" },
    ]);
  });

  it("ignores an unnamed column, as spreadsheets add at the end", () => {
    expect(read(`${HEADER},\n${ROW},\n`).rows).toHaveLength(1);
  });

  it("says a file is not a CSV when it is empty, binary, separated otherwise, headerless or has an unclosed quote", () => {
    const advice = "export one from your spreadsheet as CSV (comma-separated), or start from the template.";
    expect(unreadable(" \n")).toBe(`This file is empty: ${advice}`);
    expect(unreadable("\u0089PNG\r\n\u001a\n\u0000\u0000\u0000\rIHDR")).toMatch(/^This file is not a CSV \(it looks like a picture, a workbook or another binary file\)/);
    expect(unreadable(`${"\uFFFD".repeat(50)}abc`)).toMatch(/binary file/);
    expect(unreadable(CATALOG_CSV_COLUMN_NAMES.join(";"))).toBe(`This file is not a comma-separated CSV (its columns are separated by semicolons): ${advice}`);
    expect(unreadable(CATALOG_CSV_COLUMN_NAMES.join("\t"))).toMatch(/separated by tabs/);
    expect(unreadable(ROW)).toMatch(/^This file is not a CSV with a header row \(its first line should name the columns sku, brand, line/);
    expect(unreadable(`${HEADER}\n"QNS-1,Quensal`)).toMatch(/a quote opened on line 2 never closes/);
  });

  it("reads back what the export writes, formula-like cells included", () => {
    const items: CatalogCsvItem[] = [
      { sku: "QNS-1", brand: "=SUM(A1)", line: "Aldermoor, Tour", designation: "225/65R17", loadIndex: 102, loadIndexDual: null, speedSymbol: "H", loadRange: null, extraLoad: false, priceCents: 15_999, quantity: 0 },
      { sku: "-LT1", brand: "Pellwick", line: 'Lorrimer "AT"', designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "R", loadRange: "E", extraLoad: false, priceCents: 24_900, quantity: 4 },
      { sku: "VLM-1", brand: "Velmora", line: "Estrelle GT", designation: "225/45ZR17", loadIndex: 94, loadIndexDual: null, speedSymbol: "(Y)", loadRange: null, extraLoad: true, priceCents: 5, quantity: 12 },
    ];
    const text = writeCatalogCsv(items);
    expect(text.split("\r\n")[0]).toBe(CATALOG_CSV_COLUMN_NAMES.join(","));
    expect(text).toContain("'=SUM(A1)");
    const result = read(text);
    expect(result.refusals).toEqual([]);
    expect(
      result.rows.map(({ brand, tireLine, item, stockRow }) => ({
        sku: item.sku, brand, line: tireLine, designation: stockRow.designation, loadIndex: stockRow.loadIndex, loadIndexDual: stockRow.loadIndexDual,
        speedSymbol: stockRow.speedSymbol, loadRange: stockRow.loadRange, extraLoad: stockRow.extraLoad, priceCents: stockRow.priceCents, quantity: stockRow.quantityOnHand,
      })),
    ).toEqual(items);
  });
});
