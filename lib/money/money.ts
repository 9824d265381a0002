/**
 * Money, one rule everywhere: prices are whole US cents; a person may type them as "$1,204.50",
 * "1204.5" or "159" (a dollar sign, thousands commas in groups of three, up to two decimals), and
 * they are shown as "$1,204.50". Only integer arithmetic touches an amount, so nothing is a cent off.
 */
import { groupThousands } from "@/lib/tire/display";

/** The largest price a catalog row holds: its cents are a 32-bit integer. */
export const MAX_PRICE_CENTS = 2_147_483_647;

// "$", then whole dollars (plain, or in comma-separated groups of three), then optionally "." and up to two digits.
const DOLLARS = /^\$?\s*(\d{1,3}(?:,\d{3})+|\d+)(?:\.(\d{0,2}))?$/;

/** Cents from a typed amount; null when it is no amount in dollars or exceeds MAX_PRICE_CENTS. */
export function parseDollars(text: string): number | null {
  const match = DOLLARS.exec(text.trim());
  if (!match?.[1]) return null;
  const whole = match[1].replaceAll(",", "");
  if (whole.length > 10) return null;
  const cents = Number(whole) * 100 + Number((match[2] ?? "").padEnd(2, "0"));
  return cents <= MAX_PRICE_CENTS ? cents : null;
}

/** Cents as an input or a CSV cell holds them: 15900 → "159.00". */
export function centsToDollarsText(cents: number): string {
  return `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, "0")}`;
}

/** Cents as a price reads: 120450 → "$1,204.50", −250 → "-$2.50". */
export function formatPrice(cents: number): string {
  const whole = Math.abs(Math.round(cents));
  return `${cents < 0 ? "-" : ""}$${groupThousands(String(Math.floor(whole / 100)))}.${String(whole % 100).padStart(2, "0")}`;
}
