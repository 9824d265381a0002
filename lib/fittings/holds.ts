import { countOf } from "@/lib/format/format";

/**
 * Tires held on the rack for booked fittings stay on hand but can no longer be sold to anyone else.
 * Counts are whole numbers of tires, 0 or more; anything else is a programming error and throws.
 */

function requireCount(count: number, name: string): number {
  if (!Number.isInteger(count) || count < 0) throw new RangeError(`${name} must be a whole number of tires, 0 or more (got ${count})`);
  return count;
}

/** How many of the tires on hand can still be sold or held: never below 0. */
export function sellableQuantity(onHand: number, held: number): number {
  return Math.max(0, requireCount(onHand, "onHand") - requireCount(held, "held"));
}

/** Whether `wanted` more tires (at least one) can be held without holding a tire twice. */
export function canHold({ onHand, held, wanted }: { onHand: number; held: number; wanted: number }): boolean {
  return requireCount(wanted, "wanted") >= 1 && wanted <= sellableQuantity(onHand, held);
}

/** Whether a new quantity on hand still covers every tire held; a change that does not is refused with `belowHeldMessage`. */
export function coversHeld(onHand: number, held: number): boolean {
  return requireCount(onHand, "onHand") >= requireCount(held, "held");
}

/** Why the quantity on hand may not go below what is held. */
export function belowHeldMessage(held: number): string {
  return `${countOf(requireCount(held, "held"), "tire")} of this item ${held === 1 ? "is" : "are"} held for booked fittings: the quantity on hand cannot go below ${held}.`;
}

/** Why a hold was refused: fewer tires can be sold than the fitting needs. */
export function notEnoughToHoldMessage({ onHand, held, wanted }: { onHand: number; held: number; wanted: number }): string {
  const sellable = sellableQuantity(onHand, held);
  return `Only ${countOf(sellable, "tire")} of this item can be held now; the fitting needs ${wanted}.`;
}
