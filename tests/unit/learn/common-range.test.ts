import { describe, expect, it } from "vitest";
import { foldedKeys, type CommonRange } from "@/components/learn/common-range";

const rows = [1, 2, 3, 4, 5].map((value) => ({ key: String(value), value }));
const middle: CommonRange<(typeof rows)[number]> = { description: "the middle ones", includes: (row) => row.value >= 2 && row.value <= 4, showAllLabel: "Show all" };

describe("a table's common range", () => {
  it("folds away the rows outside it", () => {
    expect([...foldedKeys(rows, middle, { query: "", showAll: false })]).toEqual(["1", "5"]);
  });

  it("folds nothing once everything is asked for, while a search is typed, or for a table without one", () => {
    expect(foldedKeys(rows, middle, { query: "", showAll: true }).size).toBe(0);
    expect(foldedKeys(rows, middle, { query: "5", showAll: false }).size).toBe(0);
    expect(foldedKeys(rows, undefined, { query: "", showAll: false }).size).toBe(0);
  });

  it("treats a search of spaces as no search", () => {
    expect(foldedKeys(rows, middle, { query: "  ", showAll: false }).size).toBe(2);
  });
});
