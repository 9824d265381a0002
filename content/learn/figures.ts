import { formatLength, formatLoad, formatPressure, formatSpeed, loadIndexKg, speedSymbolInfo } from "@/lib/tire";

/**
 * Figures quoted in lesson texts, always in both units and always read from the tire core,
 * so a lesson can never disagree with the tables.
 */

export function loadOfIndex(loadIndex: number): string {
  const kg = loadIndexKg(loadIndex);
  if (kg === undefined) throw new Error(`No load index ${loadIndex} in the table`);
  return `${formatLoad(kg, "metric")} / ${formatLoad(kg, "imperial")}`;
}

export function speedOfSymbol(symbol: string): string {
  const info = speedSymbolInfo(symbol);
  if (!info) throw new Error(`No speed symbol ${symbol} in the table`);
  return bothSpeeds(info.kmh);
}

export const bothSpeeds = (kmh: number): string => `${formatSpeed(kmh, "metric")} / ${formatSpeed(kmh, "imperial")}`;
export const bothLengths = (mm: number): string => `${formatLength(mm, "metric")} / ${formatLength(mm, "imperial")}`;
export const bothPressures = (kPa: number): string => `${formatPressure(kPa, "metric")} / ${formatPressure(kPa, "imperial")}`;
