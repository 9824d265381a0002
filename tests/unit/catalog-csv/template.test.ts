import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { DEMO_BRANDS } from "@/lib/demo/catalog-lines";
import { CATALOG_CSV_COLUMN_NAMES, CATALOG_CSV_COLUMNS } from "@/lib/catalog-csv/columns";
import { readCatalogCsv } from "@/lib/catalog-csv/read-file";
import { readCsvRow } from "@/lib/catalog-csv/read-row";
import { writeCatalogTemplateCsv, writeColumnGuideCsv } from "@/lib/catalog-csv/write-file";

const template = readFileSync(path.join(process.cwd(), "public", "downloads", "sidewise-catalog-template.csv"), "utf8");

describe("the catalog CSV template", () => {
  it("has the column list as its header", () => {
    expect(template.split(/\r?\n/)[0]).toBe(CATALOG_CSV_COLUMN_NAMES.join(","));
  });

  it("holds the header and a comment row only, written from the column list, so it imports no item", () => {
    expect(template).toBe(`${writeCatalogTemplateCsv()}\r\n`);
    expect(template.trimEnd().split("\r\n")).toHaveLength(2);
    expect(template.split("\r\n")[1]).toMatch(/^# .*column guide/);
    expect(readCatalogCsv(template)).toEqual({ ok: true, rows: [], refusals: [], headerRefused: false, rowCount: 0 });
  });

  it("leaves the examples to the column guide, in lines the demo catalog has", () => {
    const demoLines = new Set(DEMO_BRANDS.flatMap((brand) => brand.lines.map(([line]) => `${brand.name}/${line}`)));
    const example = Object.fromEntries(CATALOG_CSV_COLUMNS.map((column) => [column.name, column.example]));
    expect(demoLines.has(`${example.brand}/${example.line}`)).toBe(true);
  });

  it("describes every column with an example that reads", () => {
    const example = Object.fromEntries(CATALOG_CSV_COLUMNS.map((column) => [column.name, column.example]));
    expect(readCsvRow(example, 2)).toMatchObject({ ok: true });
    expect(CATALOG_CSV_COLUMNS.every((column) => column.meaning.length > 10)).toBe(true);
  });

  it("ships a downloadable column guide written from the same column list", () => {
    const guide = readFileSync(path.join(process.cwd(), "public", "downloads", "sidewise-catalog-columns.csv"), "utf8");
    expect(guide).toBe(`${writeColumnGuideCsv()}\r\n`);
  });
});
