import { describe, expect, it } from "vitest";
import { sourceHref, sourceLabels } from "@/lib/quotes/labels";
import { QUOTE_SOURCES } from "@/lib/tire";

describe("where a request came from, as the Counter shows it", () => {
  it("names every source", () => {
    expect(QUOTE_SOURCES.map((source) => sourceLabels[source])).toEqual(["Fit card", "Size sheet", "Replacement finder", "Side-by-side", "Plus planner", "At the counter"]);
  });

  it.each([
    ["fit-card", "AbCdEfGhIjKlMnOpQrStUvWx", "/s/AbCdEfGhIjKlMnOpQrStUvWx"],
    ["size-sheet", "235/65R17", "/size/235-65R17"],
    ["compare", "225-45R17,235-40R18", "/compare?sizes=225-45R17%2C235-40R18"],
    ["plus", "225/45R17", "/plus?size=225%2F45R17"],
  ] as const)("links a %s request back to its page", (source, reference, href) => {
    expect(sourceHref(source, reference)).toBe(href);
  });

  it("has no page to link to for the finder, a walk-in or a request without reference", () => {
    expect(sourceHref("finder", "225/45R17")).toBeNull();
    expect(sourceHref("counter", "x")).toBeNull();
    expect(sourceHref("compare", null)).toBeNull();
  });
});
