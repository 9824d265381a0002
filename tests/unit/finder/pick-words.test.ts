import { describe, expect, it } from "vitest";
import { askBarLabel, pickLabel } from "@/components/finder/pick-words";

describe("the finder's words for picking tires", () => {
  it("says what ticking a result does for each", () => {
    expect(pickLabel(false)).toBe("Add to my price request");
    expect(pickLabel(true)).toBe("Add to a Fit card");
  });

  it("counts the picked tires on the ask bar", () => {
    expect(askBarLabel(1)).toBe("Ask for a price (1 picked)");
    expect(askBarLabel(2)).toBe("Ask for a price (2 picked)");
  });
});
