import { formatSignedPercent, formatUpToDecimals } from "../display";
import type { ServiceType } from "../service-type";
import { speedSymbolInfo, type SpeedSymbol } from "../speed-symbols";
import type { Season } from "../vocabulary";
import type { RuleCheck, RuleNote, Verdict } from "./judge";

/** The judge's codes in English words: one line per rule that holds, one per rule that fails, one per note. */

const CONSTRUCTION_NAMES = { R: "radial", D: "bias-ply", B: "bias-belted" } as const;
const SERVICE_NAMES: Record<ServiceType, string> = {
  passenger: "passenger",
  LT: "light-truck (LT)",
  C: "commercial (C)",
  ST: "special trailer (ST)",
  T: "temporary spare (T)",
};

const MINUS = "\u2212";

/** Rounded half away from zero, so that +37.5 and −37.5 mm read alike as 38. */
function signed(value: number, unit: string): string {
  const magnitude = Math.round(Math.abs(value));
  if (magnitude === 0) return `0 ${unit}`;
  return `${value > 0 ? "+" : MINUS}${formatUpToDecimals(magnitude, 1)} ${unit}`;
}

/** Two decimals, so that a diameter just outside the tolerance does not read as on it: −3.03 %. */
function preciseSignedPercent(pct: number): string {
  const magnitude = (Math.round(Math.abs(pct) * 100) / 100).toFixed(2);
  return `${pct > 0 ? "+" : pct < 0 ? MINUS : ""}${magnitude} %`;
}

/** "S 180 km/h", "(Y) above 300 km/h", or for a ZR size without a service description "ZR above 240 km/h". */
function speedText(symbol: SpeedSymbol | "ZR" | null): string {
  const info = symbol === null || symbol === "ZR" ? undefined : speedSymbolInfo(symbol);
  if (!info) return symbol === "ZR" ? "ZR above 240 km/h" : "no speed symbol";
  return `${info.symbol} ${info.above ? "above " : ""}${info.kmh} km/h`;
}

const placardTag = (source: "original" | "placard") => (source === "placard" ? " (Placard check)" : "");
const kgMargin = (kg: number) => `${kg >= 0 ? "+" : MINUS}${formatUpToDecimals(Math.abs(kg), 1)} kg`;

function holdsText(check: RuleCheck): string {
  switch (check.rule) {
    case "rim":
      return `same ${check.required}-inch rim`;
    case "construction":
      return `same ${CONSTRUCTION_NAMES[check.required]} construction`;
    case "diameter":
      return `diameter ${formatSignedPercent(check.diffPct)} (${signed(check.diffMm, "mm")})`;
    case "loadIndex":
      return `load index ${check.candidate} ≥ ${check.required}${placardTag(check.source)}: ${kgMargin(check.marginKg)}`;
    case "loadIndexDual":
      return `dual load index ${check.candidate} ≥ ${check.required}${placardTag(check.source)}: ${kgMargin(check.marginKg ?? 0)}`;
    case "speed":
      return `speed ${speedText(check.candidate)} ≥ ${speedText(check.required)}`;
    case "loadRange":
      return `load range ${check.candidate} ≥ ${check.required}`;
    case "serviceType":
      return `${SERVICE_NAMES[check.required]} tire, as the original`;
    case "runFlat":
      return "run-flat, as the original";
  }
}

function failsText(check: RuleCheck): string {
  switch (check.rule) {
    case "rim":
      return `${check.candidate}-inch rim, not ${check.required}-inch: a plus size needs other wheels`;
    case "construction":
      return `${CONSTRUCTION_NAMES[check.candidate]} construction, not ${CONSTRUCTION_NAMES[check.required]}`;
    case "diameter":
      return `diameter ${preciseSignedPercent(check.diffPct)} (${signed(check.diffMm, "mm")}) outside ±${check.tolerancePct} %`;
    case "loadIndex":
      return `load index ${check.candidate} < ${check.required}${placardTag(check.source)}`;
    case "loadIndexDual":
      return check.candidate === null
        ? `no dual load index: not rated for dual wheels (needs a dual index of ${check.required} or more)`
        : `dual load index ${check.candidate} < ${check.required}${placardTag(check.source)}`;
    case "speed":
      return `speed ${speedText(check.candidate)} < ${speedText(check.required)}`;
    case "loadRange":
      return `load range ${check.candidate ?? "none"} < ${check.required}`;
    case "serviceType":
      return check.required === "T"
        ? "a temporary spare is replaced by a full-size tire of the placard's size, never from this list"
        : `${SERVICE_NAMES[check.candidate]} tire, not ${SERVICE_NAMES[check.required]} as the original`;
    case "runFlat":
      return "not run-flat, though the original is";
  }
}

/** Why a tire is equal or better, one line per check, in the order the rules are numbered. */
export function qualifyingReasonWords(verdict: Verdict): string[] {
  return verdict.checks.map(holdsText);
}

/** What a tire does not meet: one line per failed rule (a load index and a dual index that both fall short share one). */
export function failedRuleWords(verdict: Verdict): string[] {
  return verdict.failedRules.map((ruleNumber) =>
    verdict.checks
      .filter((check) => check.number === ruleNumber && !check.passed)
      .map(failsText)
      .join("; "),
  );
}

/** A verdict's reasons: why it qualifies, or what it does not meet. */
export const verdictWords = (verdict: Verdict): string[] => (verdict.qualifies ? qualifyingReasonWords(verdict) : failedRuleWords(verdict));

/** "an all-season tire", "a winter tire". */
export const seasonTireWords = (season: Season): string => `${/^[aeiou]/.test(season) ? "an" : "a"} ${season} tire`;

function noteText(note: RuleNote): string {
  switch (note.note) {
    case "seasonChange":
      return `season change: ${seasonTireWords(note.to)} in place of the ${note.from} tire on the car now`;
    case "inflation": {
      const kind = note.euroMetric ? `a Euro-metric${note.extraLoad ? " extra-load (XL)" : ""}` : "an extra-load (XL)";
      return `inflation: ${kind} tire needs a different pressure than a P-metric one for the same load; use the maker's load and inflation table and the placard`;
    }
  }
}

export const noteWords = (notes: readonly RuleNote[]): string[] => notes.map(noteText);
