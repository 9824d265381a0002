/**
 * How many of a tire the shop can sell now, in words a driver reads, measured against how many they
 * need: "6 on hand", "2 on hand — fewer than the 4 you need", "none on hand: ask the shop". Where no
 * set size applies (the Counter's catalog), only "6 on hand" or "none on hand".
 */

/** enough: at least as many as needed; short: some, but fewer; none: not one to sell now. */
export type StockLevel = "enough" | "short" | "none";

export interface StockWords {
  level: StockLevel;
  text: string;
}

/** `quantity` is how many can be sold now (a whole number ≥ 0); `needed`, when given, how many the driver needs. */
export function stockWords(quantity: number, needed?: number): StockWords {
  const onHand = Math.max(0, Math.floor(quantity));
  if (onHand === 0) return { level: "none", text: needed === undefined ? "none on hand" : "none on hand: ask the shop" };
  if (needed !== undefined && onHand < needed) return { level: "short", text: `${onHand} on hand — fewer than the ${needed} you need` };
  return { level: "enough", text: `${onHand} on hand` };
}
