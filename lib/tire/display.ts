import { kgToLb, kmhToMph, kpaToPsi, mmToIn } from "./units";

/** How figures are shown to a person; the API always answers in both. */
export type UnitSystem = "metric" | "imperial";

const grouped = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });
const oneDecimal = new Intl.NumberFormat("en-US", { minimumFractionDigits: 1, maximumFractionDigits: 1 });

export const formatInteger = (value: number): string => grouped.format(Math.round(value));
export const formatOneDecimal = (value: number): string => oneDecimal.format(value);

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
  return `${rounded > 0 ? "+" : "−"}${oneDecimal.format(Math.abs(rounded))} %`;
}

/** The default unit system for a browser locale: imperial for the United States, Liberia and Myanmar. */
export function defaultUnitSystem(locale: string | undefined): UnitSystem {
  const region = locale?.split(/[-_]/)[1]?.toUpperCase();
  return region === "US" || region === "LR" || region === "MM" ? "imperial" : "metric";
}
