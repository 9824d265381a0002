import { describe, expect, it } from "vitest";
import { stockWords } from "@/lib/tire";

describe("how many are on hand, in words", () => {
  it("says how many there are when there are enough for the set", () => {
    expect(stockWords(6, 4)).toEqual({ level: "enough", text: "6 on hand" });
    expect(stockWords(4, 4)).toEqual({ level: "enough", text: "4 on hand" });
    expect(stockWords(1, 1)).toEqual({ level: "enough", text: "1 on hand" });
  });

  it("says when there are fewer than the driver needs", () => {
    expect(stockWords(2, 4)).toEqual({ level: "short", text: "2 on hand — fewer than the 4 you need" });
    expect(stockWords(5, 6)).toEqual({ level: "short", text: "5 on hand — fewer than the 6 you need" });
  });

  it("sends the driver to the shop when there is none", () => {
    expect(stockWords(0, 4)).toEqual({ level: "none", text: "none on hand: ask the shop" });
    expect(stockWords(0, 1)).toEqual({ level: "none", text: "none on hand: ask the shop" });
  });

  it("counts without a set size where none applies (the Counter)", () => {
    expect(stockWords(6)).toEqual({ level: "enough", text: "6 on hand" });
    expect(stockWords(1)).toEqual({ level: "enough", text: "1 on hand" });
    expect(stockWords(0)).toEqual({ level: "none", text: "none on hand" });
  });
});
