import { describe, expect, it } from "vitest";
import { askBarLabel, isStaffRole, pickLabel } from "@/components/finder/pick-words";

describe("the finder's words for picking tires", () => {
  it("treats staff and admin as staff, and a customer or an unknown role as a driver", () => {
    expect(isStaffRole("staff")).toBe(true);
    expect(isStaffRole("admin")).toBe(true);
    expect(isStaffRole("customer")).toBe(false);
    expect(isStaffRole("owner")).toBe(false);
    expect(isStaffRole("")).toBe(false);
  });

  it("says what ticking a result does for each", () => {
    expect(pickLabel(false)).toBe("Add to my price request");
    expect(pickLabel(true)).toBe("Add to a Fit card");
  });

  it("counts the picked tires on the ask bar", () => {
    expect(askBarLabel(1)).toBe("Ask for a price (1 picked)");
    expect(askBarLabel(2)).toBe("Ask for a price (2 picked)");
  });
});
