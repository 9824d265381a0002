import { describe, expect, it } from "vitest";
import { belowHeldMessage, canHold, coversHeld, notEnoughToHoldMessage, sellableQuantity } from "@/lib/fittings";

describe("tires held for booked fittings", () => {
  it("can be sold to no one else, and never leave a negative count", () => {
    expect(sellableQuantity(10, 4)).toBe(6);
    expect(sellableQuantity(4, 4)).toBe(0);
    expect(sellableQuantity(3, 4)).toBe(0);
  });

  it("are held only while enough stay sellable, at least one at a time", () => {
    expect(canHold({ onHand: 10, held: 4, wanted: 6 })).toBe(true);
    expect(canHold({ onHand: 10, held: 4, wanted: 7 })).toBe(false);
    expect(canHold({ onHand: 10, held: 0, wanted: 0 })).toBe(false);
    expect(notEnoughToHoldMessage({ onHand: 10, held: 7, wanted: 4 })).toBe("Only 3 tires of this item can be held now; the fitting needs 4.");
  });

  it("keep the quantity on hand from going below them, and the refusal says why", () => {
    expect(coversHeld(4, 4)).toBe(true);
    expect(coversHeld(3, 4)).toBe(false);
    expect(belowHeldMessage(4)).toBe("4 tires of this item are held for booked fittings: the quantity on hand cannot go below 4.");
    expect(belowHeldMessage(1)).toBe("1 tire of this item is held for booked fittings: the quantity on hand cannot go below 1.");
  });

  it("are counted in whole tires, 0 or more", () => {
    expect(() => sellableQuantity(-1, 0)).toThrow("onHand must be a whole number of tires, 0 or more (got -1)");
    expect(() => canHold({ onHand: 4, held: 0, wanted: 1.5 })).toThrow(/^wanted must be a whole number/);
    expect(() => sellableQuantity(4, Number.NaN)).toThrow(/^held must be a whole number/);
  });
});
