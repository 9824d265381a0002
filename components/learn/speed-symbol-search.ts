import { formatSpeed } from "@/lib/tire/display";
import { isSpeedSymbol, SPEED_SYMBOLS, type SpeedSymbolInfo } from "@/lib/tire/speed-symbols";
import { mphToKmh } from "@/lib/tire/units";
import { everyRow, noRow, readAmount, readServiceDescription, type SearchOutcome } from "./search-terms";

export interface SpeedSymbolRow extends SpeedSymbolInfo {
  key: string;
}

/** Every speed symbol, slowest first: ordered by km/h, so H sits between U and V. */
export const speedSymbolRows: readonly SpeedSymbolRow[] = SPEED_SYMBOLS.map((info) => ({ ...info, key: info.symbol }));

type SpeedUnit = "kmh" | "mph";
const speedWords: Record<string, SpeedUnit> = { "km/h": "kmh", kmh: "kmh", kph: "kmh", mph: "mph" };

const only = (...symbols: string[]): SearchOutcome => ({ keys: new Set(symbols), notes: [], tags: new Map() });

/** The slowest symbol rated for `kmh`: the first at or above it, or "(Y)" above the top speed. */
function slowestFor(kmh: number): number {
  const at = speedSymbolRows.findIndex((row) => !row.above && row.kmh >= kmh);
  return at === -1 ? speedSymbolRows.length - 1 : at;
}

/** Symbols by letter ("h", "y" finds Y and (Y), "a" finds A1–A8). */
function byLetters(query: string): SearchOutcome {
  const typed = query.trim().toUpperCase().replace(/\s+/g, "");
  if (!/^\(?[A-Z]\d?\)?$/.test(typed)) return noRow;
  if (typed.startsWith("(")) return typed.startsWith("(Y") ? only("(Y)") : noRow;
  return only(...speedSymbolRows.filter((row) => row.symbol.replace(/[()]/g, "").startsWith(typed)).map((row) => row.symbol));
}

/**
 * Finds rows for what was typed: a symbol ("H"), a service description ("95H"), or a speed
 * ("210", "130 mph"). A speed shows the slowest symbol rated for it and the one just below;
 * a bare number is read both as km/h and as mph.
 */
export function searchSpeedSymbols(query: string): SearchOutcome {
  if (!query.trim()) return everyRow;
  const service = readServiceDescription(query);
  if (service) return isSpeedSymbol(service.speedSymbol) ? only(service.speedSymbol) : noRow;
  const amount = readAmount(query, speedWords);
  if (!amount) return byLetters(query);
  const units: readonly SpeedUnit[] = amount.unit ? [amount.unit] : ["kmh", "mph"];
  const keys = new Set<string>();
  const notes: string[] = [];
  const tags = new Map<string, string>();
  for (const unit of units) {
    const kmh = unit === "kmh" ? amount.value : mphToKmh(amount.value);
    const speed = formatSpeed(kmh, unit === "kmh" ? "metric" : "imperial");
    const at = slowestFor(kmh);
    const slowest = speedSymbolRows[at];
    const below = speedSymbolRows[at - 1];
    if (!slowest) continue;
    if (below) keys.add(below.symbol);
    keys.add(slowest.symbol);
    tags.set(slowest.symbol, `slowest for ${speed}`);
    notes.push(`${speed} needs speed symbol ${slowest.symbol} or faster.`);
  }
  return { keys, notes, tags };
}
