// @vitest-environment jsdom
import { describe, expect, it } from "vitest";
import { checkCsvFile, fileRefusal, LISTED_PROBLEM_COUNT, type CsvCheck } from "@/components/counter/import-csv-check";
import { catalogCsv, catalogLines, csvFile } from "./import-csv-fixtures";

describe("checking a catalog CSV in the browser", () => {
  it("refuses a file that is not a CSV, one over 5 MB and an empty one, saying what to do", () => {
    expect(fileRefusal(new File(["x"], "stock.xlsx"))).toMatch(/is a spreadsheet workbook, not a CSV file: export one from your spreadsheet as CSV/);
    expect(fileRefusal(new File(["x"], "scan.png", { type: "image/png" }))).toMatch(/is a picture, not a CSV file/);
    const big = new File(["x"], "big.csv", { type: "text/csv" });
    Object.defineProperty(big, "size", { value: 6 * 1024 * 1024 });
    expect(fileRefusal(big)).toMatch(/6\.0 MB; the limit is 5 MB\. Split it/);
    expect(fileRefusal(new File([""], "empty.csv"))).toMatch(/is empty/);
    expect(fileRefusal(csvFile(catalogCsv(1)))).toBeNull();
  });

  it("reads a large file in chunks, reporting growing progress, and counts valid rows and problems", async () => {
    const updates: CsvCheck[] = [];
    const text = catalogCsv(3000, { badLines: [5, 2500] });
    const check = await checkCsvFile(csvFile(text), catalogLines, (update) => updates.push(update));
    expect(updates.length).toBeGreaterThan(2);
    const fractions = updates.map((update) => update.fraction);
    expect(fractions).toEqual([...fractions].sort((a, b) => a - b));
    expect(updates[0]!.done).toBe(false);
    expect(check).toMatchObject({ done: true, fraction: 1, rowsRead: 3000, validRows: 2998, problemRows: 2, problemCount: 2 });
    expect(check.previewRows).toHaveLength(10);
    expect(check.fields[0]).toBe("sku");
    // Load index 0–279 is the span of the ISO 4000-1 load-index table.
    expect(check.problems[0]).toMatchObject({ line: 5, column: "load_index" });
    expect(check.problems[0]!.reason).toMatch(/999/);
  });

  it("reads rows ending in LF and CRLF behind a byte-order mark as the server does, and skips comment rows", async () => {
    const [header, ...rows] = catalogCsv(4, { badLines: [4] }).trimEnd().split(/\r?\n/);
    const mixed = `\uFEFF${header}\r\n# edited by hand\n${rows[0]}\n${rows[1]}\r\n${rows[2]}\n${rows[3]}\r\n`;
    const check = await checkCsvFile(csvFile(mixed), catalogLines, () => {});
    expect(check).toMatchObject({ done: true, unreadable: null, rowsRead: 4, validRows: 3, problemRows: 1 });
    expect(check.fields[0]).toBe("sku");
    expect(check.previewRows).toHaveLength(4);
    expect(check.previewRows.flat().some((cell) => /[\r\n]/.test(cell))).toBe(false);
    // Line 4 of the original file is line 5 here: the comment row counts as a line, as in a spreadsheet.
    expect(check.problems.map((problem) => problem.line)).toEqual([5]);
  });

  it("lists at most the first problems but counts them all", async () => {
    const badLines = Array.from({ length: 30 }, (_, index) => index + 2);
    const check = await checkCsvFile(csvFile(catalogCsv(40, { badLines })), catalogLines, () => {});
    expect(check.problems).toHaveLength(LISTED_PROBLEM_COUNT);
    expect(check.problemCount).toBe(30);
  });

  it("reads headers in any letter case and skips blank lines without losing line numbers", async () => {
    const text = catalogCsv(4, { badLines: [4] }).replace(/^[^\n]*/, (header) => header.toUpperCase().replaceAll("_", " ")).replace("\n", "\n\n");
    const check = await checkCsvFile(csvFile(text), catalogLines, () => {});
    expect(check.rowsRead).toBe(4);
    expect(check.problems.map((problem) => problem.line)).toEqual([5]);
  });

  it("stops at a header without the required columns and names each missing one", async () => {
    const check = await checkCsvFile(csvFile("sku,brand\nA-1,Quensal\n"), catalogLines, () => {});
    expect(check.headerRefused).toBe(true);
    expect(check.rowsRead).toBe(0);
    expect(check.problems.map((problem) => problem.column)).toContain("size");
    expect(check.problems.every((problem) => problem.line === 1)).toBe(true);
  });

  it("refuses a SKU repeated anywhere in the file, also across chunks, on its later line", async () => {
    const text = `${catalogCsv(3000)}TST-00000,Quensal,Aldermoor Tour,225/65R17,102,,H,,no,159.00,8\n`;
    const check = await checkCsvFile(csvFile(text), catalogLines, () => {});
    expect(check.problems).toEqual([{ line: 3002, column: "sku", reason: 'SKU "TST-00000" is already on line 2 of this file; each SKU may appear once' }]);
  });

  it("says when a file is not a comma-separated CSV, and when a quote never closes", async () => {
    const semicolons = await checkCsvFile(csvFile("sku;brand;line\nA;B;C\n"), catalogLines, () => {});
    expect(semicolons.unreadable).toMatch(/separated by semicolons/);
    const quote = await checkCsvFile(csvFile(`${catalogCsv(2)}"TST-9,Quensal\n`), catalogLines, () => {});
    expect(quote.unreadable).toMatch(/never closes/);
  });

  it("judges brands and lines as the server does: unknown brand, unknown line, retired line, and an item a retired line already holds", async () => {
    const row = (sku: string, brand: string, line: string) => `${sku},${brand},${line},225/65R17,102,,H,,no,159.00,8`;
    const text = [
      catalogCsv(1).trimEnd(),
      row("TST-A", "Nobrand", "Aldermoor Tour"),
      row("TST-B", "quensal", "No Such Line"),
      row("TST-C", "Quensal", "caddon mt"),
      row("TST-KEEP", "Quensal", "Caddon MT"),
    ].join("\n");
    const check = await checkCsvFile(csvFile(text), catalogLines, () => {});
    expect(check).toMatchObject({ rowsRead: 5, validRows: 2, problemRows: 3 });
    expect(check.problems).toEqual([
      { line: 3, column: "brand", reason: 'the catalog has no brand "Nobrand"; add it on the Lines page (Counter → Lines), or correct the name' },
      { line: 4, column: "line", reason: 'the brand "Quensal" has no line "No Such Line"; add it on the Lines page (Counter → Lines), or correct the name' },
      { line: 5, column: "line", reason: 'the line "Quensal Caddon MT" is retired and takes no new items; un-retire it on the Lines page (Counter → Lines), or pick another line' },
    ]);
  });
});
