import { describe, expect, it } from "vitest";
import type { CatalogCsvRecord } from "@/lib/catalog-csv/columns";
import { onLine, readCsvRow } from "@/lib/catalog-csv/read-row";

const passenger: CatalogCsvRecord = {
  sku: "QNS-T1",
  brand: "Quensal",
  line: "Aldermoor Tour",
  size: "225/65r17",
  load_index: "102",
  load_index_dual: "",
  speed_symbol: "h",
  load_range: "",
  extra_load: "no",
  price: "159.00",
  quantity: "8",
};
const lightTruck: CatalogCsvRecord = { ...passenger, sku: "PWK-T3", size: "LT265/75R16", load_index: "123", load_index_dual: "120", speed_symbol: "R", load_range: "E" };

const refusalsOf = (changes: CatalogCsvRecord, base = passenger) => {
  const result = readCsvRow({ ...base, ...changes }, 7);
  return result.ok ? [] : result.refusals;
};
const reasonFor = (changes: CatalogCsvRecord, base = passenger) => refusalsOf(changes, base).map((refusal) => `${refusal.column}: ${refusal.reason}`);

describe("readCsvRow", () => {
  it("reads a passenger and a light-truck row into stock items, the size normalized by the tire core", () => {
    const read = readCsvRow(passenger, 2);
    expect(read.ok && read.row).toMatchObject({
      line: 2,
      brand: "Quensal",
      tireLine: "Aldermoor Tour",
      item: { sku: "QNS-T1", loadIndex: 102, loadIndexDual: null, loadRange: null, extraLoad: false, priceCents: 15_900, quantity: 8 },
      stockRow: { designation: "225/65R17", speedSymbol: "H", serviceType: "passenger" },
    });
    const truck = readCsvRow(lightTruck, 3);
    expect(truck.ok && truck.row.stockRow).toMatchObject({ designation: "LT265/75R16", loadIndexDual: 120, loadRange: "E", loadRangePly: 10, serviceType: "LT" });
  });

  it("takes yes, y, true, 1 and xl as extra load; an empty optional cell as none", () => {
    for (const yes of ["yes", "Y", "TRUE", "1", "XL"]) {
      const read = readCsvRow({ ...passenger, extra_load: yes }, 2);
      expect(read.ok && read.row.item.extraLoad).toBe(true);
    }
    const read = readCsvRow({ sku: "A", brand: "B", line: "C", size: "205/55R16", load_index: "91", speed_symbol: "V", price: "99", quantity: "0" }, 2);
    expect(read.ok && read.row.item).toMatchObject({ extraLoad: false, loadIndexDual: null, loadRange: null, priceCents: 9_900, quantity: 0 });
  });

  it("takes off the apostrophe the export puts before a cell that starts like a formula", () => {
    const read = readCsvRow({ ...passenger, sku: "'-QNS-1", brand: "'@Quensal" }, 2);
    expect(read.ok && [read.row.item.sku, read.row.brand]).toEqual(["-QNS-1", "@Quensal"]);
  });

  it("names every empty required cell on the row's line", () => {
    const refusals = refusalsOf({ sku: "", brand: " ", line: "", size: "", load_index: "", speed_symbol: "", price: "", quantity: "" });
    expect(refusals.map((refusal) => refusal.column)).toEqual(["sku", "brand", "line", "size", "speed_symbol", "load_index", "price", "quantity"]);
    expect(refusals.every((refusal) => refusal.line === 7 && refusal.reason.endsWith("is empty; every row needs one"))).toBe(true);
  });

  it("refuses each malformed cell with what was wrong and an example", () => {
    const rule = 'a SKU is 1–64 letters, digits, dots, hyphens or underscores (not "." or ".." alone, and not "new")';
    expect(reasonFor({ sku: "QNS 1" })).toEqual([`sku: SKU "QNS 1" breaks the rule: ${rule}`]);
    expect(reasonFor({ sku: "QNS/1" })).toEqual([`sku: SKU "QNS/1" breaks the rule: ${rule}`]);
    expect(reasonFor({ sku: "New" })).toEqual([`sku: SKU "New" breaks the rule: ${rule}`]);
    expect(reasonFor({ brand: "Quen\u0000sal" })).toEqual(["brand: brand holds a control character (such as NUL); type the name again"]);
    expect(reasonFor({ brand: "B".repeat(101) })).toEqual(["brand: brand is longer than 100 characters"]);
    expect(reasonFor({ line: "L".repeat(101) })).toEqual(["line: line is longer than 100 characters"]);
    expect(reasonFor({ load_index: "10a" })).toEqual(['load_index: load index "10a" is not a whole number such as 102']);
    // The load index table runs from 0 to 279 (ISO 4000-1 / ETRTO).
    expect(reasonFor({ load_index: "999" })).toEqual(["load_index: load index 999 is outside the published table (0–279)"]);
    expect(reasonFor({ load_index_dual: "280" }, lightTruck)).toEqual(["load_index_dual: dual load index 280 is outside the published table (0–279)"]);
    expect(reasonFor({ load_index_dual: "-1" }, lightTruck)).toEqual(['load_index_dual: dual load index "-1" is not a whole number such as 102']);
    expect(reasonFor({ extra_load: "maybe" })).toEqual(['extra_load: extra_load "maybe" should be yes or no']);
    expect(reasonFor({ price: "12,50" })).toEqual(['price: price "12,50" is not an amount in dollars such as 129.99']);
    expect(reasonFor({ price: "159.999" })).toEqual(['price: price "159.999" is not an amount in dollars such as 129.99']);
    expect(reasonFor({ price: "-5.00" })).toEqual(['price: price "-5.00" is not an amount in dollars such as 129.99']);
    expect(reasonFor({ price: "99999999.00" })).toEqual(["price: price 99999999.00 is more than a catalog price can be (at most 21474836.47)"]);
    expect(reasonFor({ quantity: "3.5" })).toEqual(['quantity: quantity "3.5" is not a whole number of tires such as 8']);
    expect(reasonFor({ quantity: "99999999999" })).toEqual(['quantity: quantity "99999999999" is not a whole number of tires such as 8']);
  });

  it("reports all the malformed cells of a row at once", () => {
    expect(refusalsOf({ load_index: "x", price: "free", quantity: "some" }).map((refusal) => refusal.column)).toEqual(["load_index", "price", "quantity"]);
  });

  it("refuses a tire no sidewall carries, with the same checks as the catalog's write path", () => {
    expect(reasonFor({ size: "225/65" })).toEqual(['size: size "225/65" is not a tire size; write it as on the sidewall, such as 225/65R17']);
    expect(reasonFor({ speed_symbol: "X" })).toEqual(['speed_symbol: speed symbol "X" is not in the published table (such as T, H, V or W)']);
    expect(reasonFor({ load_range: "Q" }, lightTruck)).toEqual(['load_range: load range "Q" is not a load range letter such as C, D or E']);
    // Load ranges mark light-truck tires; passenger tires are standard or extra load (common practice, TRA).
    expect(reasonFor({ load_range: "E" })).toEqual(["load_range: passenger tires are standard or extra load, not a load range"]);
    expect(reasonFor({ load_range: "" }, lightTruck)).toEqual(["load_range: light-truck tires are marked with a load range"]);
    expect(reasonFor({ extra_load: "yes" }, lightTruck)).toEqual(["extra_load: extra load (XL) applies to passenger tires only"]);
    // A dual load index is never higher than the single one (ISO 4000-1 / ETRTO service descriptions).
    expect(reasonFor({ load_index_dual: "125" }, lightTruck)).toEqual(["load_index_dual: the dual load index cannot exceed the single one"]);
    expect(reasonFor({ load_index_dual: "98" })).toEqual(["load_index_dual: passenger tires carry no dual load index"]);
  });

  it("puts a read row on its real line: run-flat when the size or the line is", () => {
    const read = readCsvRow(passenger, 2);
    if (!read.ok) throw new Error("the passenger row should read");
    expect(onLine(read.row, { id: 42, runFlat: false })).toMatchObject({ lineId: 42, runFlat: false, designation: "225/65R17" });
    expect(onLine(read.row, { id: 43, runFlat: true })).toMatchObject({ lineId: 43, runFlat: true });
    const runFlatSize = readCsvRow({ ...passenger, size: "225/45RF17", load_index: "91", speed_symbol: "W" }, 2);
    expect(runFlatSize.ok && onLine(runFlatSize.row, { id: 42, runFlat: false }).runFlat).toBe(true);
  });
});
