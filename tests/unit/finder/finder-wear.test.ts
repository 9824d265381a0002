import { describe, expect, it } from "vitest";
import { readFinderQuery } from "@/lib/finder/finder-query";
import { COUNT_PROBLEM, DEPTH_PROBLEM, readFinderWear, WEAR_SORT } from "@/lib/finder/finder-wear";
import { alternativesSearch, finderSearch } from "@/lib/finder/finder-state";
import { MAX_ALTERNATIVES_PAGE } from "@/lib/tire/vocabulary";

const noMinimums = { loadIndex: null, loadIndexDual: null };
const address = (params: Record<string, string>) => readFinderQuery({ size: "285-50R20", loadIndex: "119", speedSymbol: "S", ...params });

describe("the finder's tires that stay on an all-wheel-drive vehicle", () => {
  it("is off until asked for", () => {
    expect(readFinderWear(address({ remaining32: "7,7" }), 2)).toEqual({ on: false });
  });

  it("reads one depth for each tire that stays: four less those being replaced", () => {
    const two = readFinderWear(address({ awd: "1", quantity: "2", remaining32: "7,7.5" }), 2);
    expect(two).toMatchObject({ on: true, stayingCount: 2, typed: ["7", "7.5"], limit32: 2, limitFromShop: true, staying: { remaining32: [7, 7.5], limit32: 2 }, problem: null });
    const one = readFinderWear(address({ awd: "1", quantity: "1", remaining32: "6,6.5,7", wearLimit32: "3" }), 2);
    expect(one).toMatchObject({ stayingCount: 3, limitFromShop: false, staying: { remaining32: [6, 6.5, 7], limit32: 3 } });
  });

  it("says what to fix: a depth missing or not in halves, or four tires being replaced", () => {
    expect(readFinderWear(address({ awd: "1", quantity: "2", remaining32: "7" }), 2)).toMatchObject({ typed: ["7", ""], staying: null, problem: DEPTH_PROBLEM });
    expect(readFinderWear(address({ awd: "1", quantity: "2", remaining32: "7,7.25" }), 2)).toMatchObject({ staying: null, problem: DEPTH_PROBLEM });
    expect(readFinderWear(address({ awd: "1", quantity: "2", remaining32: "7,33" }), 2)).toMatchObject({ staying: null, problem: DEPTH_PROBLEM });
    expect(readFinderWear(address({ awd: "1", remaining32: "7,7" }), 2)).toMatchObject({ stayingCount: 0, staying: null, problem: COUNT_PROBLEM });
  });

  it("keeps the choice, the depths and the limit in the address, and drops a limit outside 0.5–8 or not in halves", () => {
    const query = address({ awd: "1", quantity: "2", remaining32: "7,7.5", wearLimit32: "2.5", sort: WEAR_SORT });
    expect(readFinderQuery(Object.fromEntries(new URLSearchParams(finderSearch(query))))).toEqual(query);
    expect(address({ wearLimit32: "9" }).wearLimit32).toBeUndefined();
    expect(address({ wearLimit32: "1.3" }).wearLimit32).toBeUndefined();
  });

  it("never sends the depths to the API, and asks for the whole list when the browser orders it", () => {
    const search = alternativesSearch(address({ awd: "1", quantity: "2", remaining32: "7,7.5", sort: WEAR_SORT }), noMinimums);
    expect([...search.keys()].some((key) => ["awd", "remaining32", "wearLimit32"].includes(key))).toBe(false);
    expect(search.has("sort")).toBe(false);
    expect(search.get("limit")).toBe(String(MAX_ALTERNATIVES_PAGE));
    expect(alternativesSearch(address({ sort: "price" }), noMinimums).get("sort")).toBe("price");
  });
});
