import { kgToLb, kmhToMph, kpaToPsi, mmToIn } from "./units";

/** How figures are shown to a person; the API always answers in both. */
export type UnitSystem = "metric" | "imperial";

// Figures are written out here rather than by Intl.NumberFormat: a browser's first Intl formatter
// loads its locale data, which costs a phone tens of milliseconds in the middle of the page's start.

/** Whole-number digits grouped in threes with commas, as en-US writes them: "1234567" → "1,234,567". */
export const groupThousands = (digits: string): string => digits.replace(/\B(?=(\d{3})+$)/g, ",");

/** Adds one to a string of decimal digits: "0999" → "1000". */
function incrementDigits(digits: string): string {
  let i = digits.length - 1;
  while (i >= 0 && digits[i] === "9") i--;
  if (i < 0) return `1${"0".repeat(digits.length)}`;
  return `${digits.slice(0, i)}${Number(digits[i]) + 1}${"0".repeat(digits.length - i - 1)}`;
}

/** |value| rounded to `decimals` places as its shortest decimal spelling reads, halves up: 9898.55 → "9898.6". */
function roundedDigits(magnitude: number, decimals: number): string {
  const spelled = String(magnitude);
  // Below 1e-6 or from 1e21 up, the spelling has an exponent; toFixed rounds those as well as anything would.
  if (spelled.includes("e")) return magnitude.toFixed(decimals);
  const [whole = "0", fraction = ""] = spelled.split(".");
  if (fraction.length <= decimals) return decimals === 0 ? whole : `${whole}.${fraction.padEnd(decimals, "0")}`;
  const kept = `${whole}${fraction.slice(0, decimals)}`;
  const digits = fraction[decimals]! >= "5" ? incrementDigits(kept) : kept;
  const point = digits.length - decimals;
  return decimals === 0 ? digits : `${digits.slice(0, point)}.${digits.slice(point)}`;
}

/**
 * `value` with exactly `decimals` decimals, thousands grouped (en-US): 1234.56 → "1,234.6" with 1.
 * Rounds the number as written, halves away from zero, as Intl.NumberFormat does (9898.55 → 9,898.6,
 * where toFixed gives 9898.5); a value that rounds to zero has no sign.
 */
export function formatDecimals(value: number, decimals: number): string {
  const fixed = roundedDigits(Math.abs(value), decimals);
  const point = fixed.indexOf(".");
  const whole = groupThousands(point < 0 ? fixed : fixed.slice(0, point));
  const sign = value < 0 && /[1-9]/.test(fixed) ? "-" : "";
  return `${sign}${whole}${point < 0 ? "" : fixed.slice(point)}`;
}

/** `value` with at most `decimals` decimals, trailing zeros dropped, thousands grouped: 2.50 → "2.5", 3.0 → "3". */
export function formatUpToDecimals(value: number, decimals: number): string {
  const text = formatDecimals(value, decimals);
  return text.includes(".") ? text.replace(/\.?0+$/, "") : text;
}

export const formatInteger = (value: number): string => formatDecimals(Math.round(value), 0);
export const formatOneDecimal = (value: number): string => formatDecimals(value, 1);

/** Millimetres to the nearest millimetre, inches to a tenth: 793 mm, 31.2 in. */
export function formatLength(mm: number, units: UnitSystem): string {
  return units === "metric" ? `${formatInteger(mm)} mm` : `${formatOneDecimal(mmToIn(mm))} in`;
}

/** Inches as a size marks them: 12.50, 7.50, 11. */
function markedInches(mm: number): string {
  const inches = mmToIn(mm);
  return Number.isInteger(Math.round(inches * 100) / 100) ? String(Math.round(inches)) : inches.toFixed(2);
}

/** A figure the tire marks in inches, as marked, with millimetres beside it for metric readers: 12.50 in (318 mm). */
export function formatInchesAsMarked(mm: number, units: UnitSystem): string {
  return units === "metric" ? `${markedInches(mm)} in (${formatLength(mm, "metric")})` : `${markedInches(mm)} in`;
}

/** A figure the tire marks in millimetres, with the millimetres as marked beside inches for imperial readers: 8.9 in (225 mm). */
export function formatMillimetresAsMarked(mm: number, units: UnitSystem): string {
  return units === "metric" ? formatLength(mm, "metric") : `${formatLength(mm, "imperial")} (${formatLength(mm, "metric")})`;
}

/** A load, as the load tables print it: 1,360 kg or 2,998 lb (kg × 2.20462, rounded). */
export function formatLoad(kg: number, units: UnitSystem): string {
  return units === "metric" ? `${formatInteger(kg)} kg` : `${formatInteger(kgToLb(kg))} lb`;
}

export function formatSpeed(kmh: number, units: UnitSystem): string {
  return units === "metric" ? `${formatInteger(kmh)} km/h` : `${formatInteger(kmhToMph(kmh))} mph`;
}

/** A speed to a tenth, as the speedometer figures show it: 67.3 mph, 103.5 km/h. */
export function formatSpeedToTenth(kmh: number, units: UnitSystem): string {
  return units === "metric" ? `${formatOneDecimal(kmh)} km/h` : `${formatOneDecimal(kmhToMph(kmh))} mph`;
}

/** A gap between two speeds, to a tenth; one that rounds to nothing is "less than 0.1 mph". */
export function formatSpeedGap(kmh: number, units: UnitSystem): string {
  const text = formatSpeedToTenth(Math.abs(kmh), units);
  return text.startsWith("0.0 ") ? `less than 0.1 ${units === "metric" ? "km/h" : "mph"}` : text;
}

export function formatPressure(kPa: number, units: UnitSystem): string {
  return units === "metric" ? `${formatInteger(kPa)} kPa` : `${formatInteger(kpaToPsi(kPa))} psi`;
}

/** Revolutions per kilometre (metric) or per mile (imperial), to a tenth. */
export function formatRevolutions(revsPerKm: number, revsPerMile: number, units: UnitSystem): string {
  return units === "metric" ? `${formatOneDecimal(revsPerKm)} per km` : `${formatOneDecimal(revsPerMile)} per mile`;
}

/** A signed percentage to a tenth: +0.4 %, −1.2 %, 0.0 %. */
export function formatSignedPercent(pct: number): string {
  const rounded = (Math.sign(pct) * Math.round(Math.abs(pct) * 10)) / 10;
  if (rounded === 0) return "0.0 %";
  return `${rounded > 0 ? "+" : "−"}${formatOneDecimal(Math.abs(rounded))} %`;
}

/** The default unit system for a browser locale: imperial for the United States, Liberia and Myanmar. */
export function defaultUnitSystem(locale: string | undefined): UnitSystem {
  const region = locale?.split(/[-_]/)[1]?.toUpperCase();
  return region === "US" || region === "LR" || region === "MM" ? "imperial" : "metric";
}
