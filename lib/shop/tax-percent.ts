/**
 * The sales tax rate as people type it (a percent, "7.25" or "7.25 %") and as it is kept (basis
 * points, 725). Read from the text's digits, never through a float, so 7.29 % is 729 and not 728.
 */

export const MAX_TAX_RATE_BP = 10_000;

// Up to three whole digits, then optionally "." and up to two decimals, then optionally "%".
const PERCENT = /^(\d{0,3})(?:\.(\d{0,2}))?\s*%?$/;

/** Basis points from a typed percent; null for anything that is not 0–100 % with at most two decimals. */
export function parseTaxPercent(text: string): number | null {
  const match = PERCENT.exec(text.trim());
  if (!match) return null;
  const whole = match[1] ?? "";
  const decimals = match[2] ?? "";
  if (whole === "" && decimals === "") return null;
  const basisPoints = Number(whole || "0") * 100 + Number(decimals.padEnd(2, "0"));
  return basisPoints <= MAX_TAX_RATE_BP ? basisPoints : null;
}

/** Basis points as a percent without trailing zeros: 725 → "7.25", 750 → "7.5", 800 → "8". */
export function taxPercentText(basisPoints: number): string {
  const whole = Math.floor(basisPoints / 100);
  const hundredths = basisPoints % 100;
  if (hundredths === 0) return String(whole);
  return `${whole}.${String(hundredths).padStart(2, "0").replace(/0$/, "")}`;
}

/** "7.25 %", as the product writes percentages. */
export const formatTaxRate = (basisPoints: number): string => `${taxPercentText(basisPoints)} %`;
