import { formatSignedPercent, loadIndexKg, speedSymbolInfo, type ServiceType } from "@/lib/tire";
import type { Original } from "./original";

/** What the rules read from a candidate. */
export interface RuleFacts {
  overallDiameterMm: number;
  loadIndex: number;
  loadIndexDual: number | null;
  speedSymbol: string;
  speedRank: number;
  loadRange: string | null;
  loadRangePly: number | null;
}

const CONSTRUCTION_NAMES = { R: "radial", D: "bias-ply", B: "bias-belted" } as const;
const SERVICE_NAMES: Record<ServiceType, string> = {
  passenger: "passenger",
  LT: "light-truck (LT)",
  C: "commercial (C)",
  ST: "special trailer (ST)",
  T: "temporary spare (T)",
};

const number = new Intl.NumberFormat("en-US", { maximumFractionDigits: 1 });
const minus = "\u2212";

function signed(value: number, unit: string): string {
  const rounded = Math.round(value);
  if (rounded === 0) return `0 ${unit}`;
  return `${rounded > 0 ? "+" : minus}${number.format(Math.abs(rounded))} ${unit}`;
}

/** "S 180 km/h", "(Y) above 300 km/h", or for a ZR size without a service description "ZR above 240 km/h". */
function speedText(symbol: string | null): string {
  const info = symbol === null ? undefined : speedSymbolInfo(symbol);
  if (!info) return "ZR above 240 km/h";
  return `${info.symbol} ${info.above ? "above " : ""}${info.kmh} km/h`;
}

/** "load index 116 < 119" */
function loadComparison(label: string, candidate: number, original: number): string {
  return `${label} ${candidate} ${candidate >= original ? "≥" : "<"} ${original}`;
}

/** "load index 121 ≥ 119: +90 kg" */
function loadWithMargin(label: string, candidate: number, original: number): string {
  const marginKg = (loadIndexKg(candidate) ?? 0) - (loadIndexKg(original) ?? 0);
  return `${loadComparison(label, candidate, original)}: ${marginKg >= 0 ? "+" : minus}${number.format(Math.abs(marginKg))} kg`;
}

const diameterText = (diffPct: number, diffMm: number) => `diameter ${formatSignedPercent(diffPct)} (${signed(diffMm, "mm")})`;

/** Two decimals, so that a diameter just outside the tolerance does not read as on it: −3.03 %. */
function preciseSignedPercent(pct: number): string {
  const magnitude = (Math.round(Math.abs(pct) * 100) / 100).toFixed(2);
  return `${pct > 0 ? "+" : pct < 0 ? minus : ""}${magnitude} %`;
}

function diameterFits(diffPct: number, tolerancePct: number): boolean {
  return Math.abs(diffPct) <= tolerancePct;
}

const speedHolds = (original: Original, candidate: RuleFacts): boolean => candidate.speedRank >= original.speedRank;

function loadRangeHolds(original: Original, candidate: RuleFacts): boolean {
  return original.loadRangePly === null || (candidate.loadRangePly !== null && candidate.loadRangePly >= original.loadRangePly);
}

/** [candidate, original] dual load indices, when both tires have one. */
function dualPair(original: Original, candidate: RuleFacts): [number, number] | null {
  return original.loadIndexDual !== null && candidate.loadIndexDual !== null ? [candidate.loadIndexDual, original.loadIndexDual] : null;
}

/** Why a qualifying candidate is equal or better, one line per rule. */
export function qualifyingReasons(original: Original, candidate: RuleFacts, diffPct: number): string[] {
  const reasons = [
    `same ${original.rimDiameterIn}-inch rim`,
    `same ${CONSTRUCTION_NAMES[original.construction]} construction`,
    diameterText(diffPct, candidate.overallDiameterMm - original.overallDiameterMm),
    loadWithMargin("load index", candidate.loadIndex, original.loadIndex),
  ];
  const dual = dualPair(original, candidate);
  if (dual) reasons.push(loadWithMargin("dual load index", ...dual));
  reasons.push(`speed ${speedText(candidate.speedSymbol)} ≥ ${speedText(original.speedSymbol)}`);
  if (original.loadRange !== null) reasons.push(`load range ${candidate.loadRange} ≥ ${original.loadRange}`);
  reasons.push(`${SERVICE_NAMES[original.serviceType]} tire, as the original`);
  if (original.runFlat) reasons.push("run-flat, as the original");
  return reasons;
}

/** What a near miss fails: the one rule of 2–5 it breaks, in words. */
export function failedRules(original: Original, candidate: RuleFacts, diffPct: number, tolerancePct: number): string[] {
  const failed: string[] = [];
  if (!diameterFits(diffPct, tolerancePct)) {
    const diffMm = candidate.overallDiameterMm - original.overallDiameterMm;
    failed.push(`diameter ${preciseSignedPercent(diffPct)} (${signed(diffMm, "mm")}) outside ±${tolerancePct} %`);
  }
  if (candidate.loadIndex < original.loadIndex) failed.push(loadComparison("load index", candidate.loadIndex, original.loadIndex));
  const dual = dualPair(original, candidate);
  if (dual && dual[0] < dual[1]) failed.push(loadComparison("dual load index", ...dual));
  if (!speedHolds(original, candidate)) failed.push(`speed ${speedText(candidate.speedSymbol)} < ${speedText(original.speedSymbol)}`);
  if (!loadRangeHolds(original, candidate)) {
    failed.push(`load range ${candidate.loadRange ?? "none"} < ${original.loadRange}`);
  }
  return failed;
}
