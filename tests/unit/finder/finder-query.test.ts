import { describe, expect, it } from "vitest";
import { DEFAULT_PAGE_SIZE } from "@/lib/catalog/query-schema";
import { readFinderQuery } from "@/lib/finder/finder-query";
import { activeFilterCount, alternativesSearch, FINDER_PAGE_SIZE, finderSearch, setSizeOf } from "@/lib/finder/finder-state";
import { readOriginalMarking } from "@/lib/finder/original-marking";
import { placardFor } from "@/lib/finder/placard-for";

describe("the finder's address", () => {
  it("round-trips its state through the query string", () => {
    const query = readFinderQuery({ size: "285-50R20", loadIndex: "119", speedSymbol: "S", season: "winter", inStock: "1", tolerancePct: "2.5", quantity: "2" });
    expect(query.quantity).toBe(2);
    expect(readFinderQuery(Object.fromEntries(new URLSearchParams(finderSearch(query))))).toEqual(query);
  });

  it("keeps a set size the finder offers and drops any other to the default set of four", () => {
    for (const quantity of ["1", "2", "4", "6"]) expect(setSizeOf(readFinderQuery({ quantity }))).toBe(Number(quantity));
    for (const quantity of ["0", "3", "8", "9", "x", "2.5", "-2", "", "1e3"]) {
      expect(readFinderQuery({ size: "285-50R20", quantity })).toEqual({ size: "285-50R20" });
      expect(setSizeOf(readFinderQuery({ quantity }))).toBe(4);
    }
    expect(readFinderQuery({ quantity: ["6", "2"] }).quantity).toBe(6);
  });

  it("drops malformed or unknown values instead of failing the page", () => {
    const query = readFinderQuery({ size: "285-50R20", loadIndex: "abc", speedSymbol: "S", season: "monsoon", tolerancePct: "9", sort: "random" });
    expect(query).toEqual({ size: "285-50R20", speedSymbol: "S" });
  });

  it("sends only the API's own parameters, not the Placard check's inputs", () => {
    const query = readFinderQuery({ size: "285-50R20", loadIndex: "119", speedSymbol: "S", gawrFront: "3000", vehicle: "passenger-car" });
    expect(Object.fromEntries(alternativesSearch(query, { loadIndex: null, loadIndexDual: null }))).toEqual({
      size: "285-50R20",
      loadIndex: "119",
      speedSymbol: "S",
      quantity: "4",
      limit: String(FINDER_PAGE_SIZE),
    });
    expect(alternativesSearch(readFinderQuery({ size: "285-50R20", quantity: "6" }), { loadIndex: null, loadIndexDual: null }).get("quantity")).toBe("6");
  });

  it("asks for a page of a dozen results, fewer than the API's default", () => {
    const search = alternativesSearch(readFinderQuery({ size: "285-50R20", loadIndex: "119", speedSymbol: "S" }), { loadIndex: null, loadIndexDual: null });
    expect(search.get("limit")).toBe("12");
    expect(FINDER_PAGE_SIZE).toBeLessThan(DEFAULT_PAGE_SIZE);
  });

  it("counts the filters that narrow the list, not the set size or the sort", () => {
    expect(activeFilterCount(readFinderQuery({ size: "285-50R20", quantity: "2", sort: "price" }))).toBe(0);
    expect(activeFilterCount(readFinderQuery({ size: "285-50R20", season: "winter", inStock: "1", maxPriceCents: "20000" }))).toBe(3);
  });

  it("turns the address's short flags into the API's true", () => {
    const query = readFinderQuery({ size: "285-50R20", loadIndex: "119", speedSymbol: "S", inStock: "1", threePeak: "1" });
    const search = alternativesSearch(query, { loadIndex: null, loadIndexDual: null });
    expect([search.get("inStock"), search.get("threePeak")]).toEqual(["true", "true"]);
  });

  it("raises the load index to the Placard check's minimum, never lowers it", () => {
    const query = readFinderQuery({ size: "285-50R20", loadIndex: "119", speedSymbol: "S" });
    expect(alternativesSearch(query, { loadIndex: 121, loadIndexDual: null }).get("loadIndex")).toBe("121");
    expect(alternativesSearch(query, { loadIndex: 110, loadIndexDual: null }).get("loadIndex")).toBe("119");
  });
});

describe("the Placard check in the finder", () => {
  it("converts pounds from the label before checking: 6,000 lb rear ÷ 2 × 1.10 on a truck with P-metric tires", () => {
    const query = readFinderQuery({ size: "P265/70R17", loadIndex: "113", speedSymbol: "S", gawrRear: "6000", vehicle: "mpv-truck-trailer" });
    const original = readOriginalMarking(query);
    expect(original.ok && original.passengerTire).toBe(true);
    // 6,000 lb = 2,721.6 kg; ÷ 2 = 1,360.8 kg; × 1.10 = 1,496.9 kg → 122 (1,500 kg) (ISO 4000-1 table; FMVSS 120 S5.1.2).
    expect(placardFor(query, true, "metric")?.minLoadIndex).toBe(122);
  });

  it("needs the size, load index and speed symbol before it can read the current tire", () => {
    expect(readOriginalMarking(readFinderQuery({ size: "285-50R20" })).ok).toBe(false);
  });
});
