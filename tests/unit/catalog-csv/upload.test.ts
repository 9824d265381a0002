import { describe, expect, it } from "vitest";
import { notCsvFileMessage } from "@/lib/catalog-csv/upload";

describe("notCsvFileMessage", () => {
  it("lets through what browsers call a CSV", () => {
    for (const [name, type] of [["stock.csv", "text/csv"], ["stock.csv", "application/vnd.ms-excel"], ["stock.txt", "text/plain"], ["stock", ""], ["stock.CSV", "application/octet-stream"]]) {
      expect(notCsvFileMessage({ name: name!, type: type! }), name).toBeNull();
    }
  });

  it("refuses pictures, workbooks, documents and archives by name or type, saying what to do", () => {
    expect(notCsvFileMessage({ name: "shelf.png", type: "image/png" })).toBe(
      '"shelf.png" is a picture, not a CSV file: export one from your spreadsheet as CSV (comma-separated), or start from the template.',
    );
    expect(notCsvFileMessage({ name: "stock.xlsx", type: "" })).toMatch(/^"stock.xlsx" is a spreadsheet workbook, not a CSV file/);
    expect(notCsvFileMessage({ name: "upload", type: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet" })).toMatch(/spreadsheet workbook/);
    expect(notCsvFileMessage({ name: "prices.pdf", type: "application/pdf" })).toMatch(/a document/);
    expect(notCsvFileMessage({ name: "all.zip", type: "application/zip" })).toMatch(/an archive/);
  });
});
