/** The largest price a catalog row holds: its cents are a 32-bit integer. */
export const MAX_PRICE_CENTS = 2_147_483_647;

// Whole dollars, then optionally a dot and one or two digits of cents; a leading "$" as spreadsheets write it.
const DOLLARS = /^\$?(\d{1,10})(?:\.(\d{1,2}))?$/;

/**
 * Reads a price in US dollars ("159", "159.5", "$159.00") as whole cents, with integer arithmetic
 * only, so that no amount is off by a cent through floating point. Null when it is not such an amount
 * or exceeds MAX_PRICE_CENTS.
 */
export function dollarsToCents(text: string): number | null {
  const match = DOLLARS.exec(text.trim());
  if (!match) return null;
  const cents = Number(match[1]) * 100 + Number((match[2] ?? "").padEnd(2, "0"));
  return cents <= MAX_PRICE_CENTS ? cents : null;
}

/** Whole cents as dollars with two decimals: 15900 → "159.00". */
export function centsToDollars(cents: number): string {
  return `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, "0")}`;
}
