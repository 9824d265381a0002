import { describe, expect, it } from "vitest";
import { isCurrent, navFor } from "@/components/shell/nav-items";

const labels = (role: string | null) => navFor(role).map((item) => item.label);

describe("the main navigation", () => {
  it("shows the public screens to visitors and customers, without the Counter", () => {
    const everyone = ["Sidewall reader", "Side-by-side", "Plus planner", "Replacement finder", "Sidewall school"];
    expect(labels(null)).toEqual(everyone);
    expect(labels("customer")).toEqual(everyone);
    expect(labels("superuser")).toEqual(everyone);
  });

  it("adds the Counter for staff and admins", () => {
    expect(labels("staff")).toContain("Counter");
    expect(labels("admin")).toContain("Counter");
  });

  it("marks a screen current on its own pages, and the reader only on the home page", () => {
    expect(isCurrent("/counter/items/new", "/counter")).toBe(true);
    expect(isCurrent("/counterfeit", "/counter")).toBe(false);
    expect(isCurrent("/learn", "/")).toBe(false);
    expect(isCurrent("/", "/")).toBe(true);
  });
});
