import { diameterChangePct } from "../diameter-change";
import { loadIndexKg } from "../load-index";
import { isLoadRange, plyRatingForLoadRange, type LoadRange } from "../load-range";
import { sizeGeometry, type MeasurableSize } from "../geometry";
import { serviceType, type ServiceType } from "../service-type";
import { isSpeedSymbol, speedSymbolRank, ZR_UNRATED_RANK, type SpeedSymbol } from "../speed-symbols";
import type { Construction } from "../types";
import type { Season } from "../vocabulary";

/** The tire on the car and what the vehicle asks of its replacement. */
export interface JudgedOriginal {
  rimDiameterIn: number;
  construction: Construction;
  serviceType: ServiceType;
  /** Marked with a P before the size (P-metric), as opposed to ETRTO (Euro) metric. */
  pMetric: boolean;
  runFlat: boolean;
  overallDiameterMm: number;
  /** The original's own load indices; null when none was given (the Plus planner may leave it out). */
  loadIndex: number | null;
  loadIndexDual: number | null;
  /** The Placard check's minimums for this axle, when it was made. */
  minLoadIndex: number | null;
  minLoadIndexDual: number | null;
  /** "ZR" for a ZR size given without a service description (above 240 km/h); null when no speed is asked for. */
  speedSymbol: SpeedSymbol | "ZR" | null;
  loadRange: LoadRange | null;
  /** What kind of tire is on the car now, when the driver said. */
  season: Season | null;
}

/** A stocked tire, as the rules read it. */
export interface JudgedCandidate {
  rimDiameterIn: number;
  construction: Construction;
  serviceType: ServiceType;
  pMetric: boolean;
  extraLoad: boolean;
  runFlat: boolean;
  overallDiameterMm: number;
  loadIndex: number;
  loadIndexDual: number | null;
  speedSymbol: string;
  loadRange: string | null;
  season: Season | null;
}

/** Which limit set a load requirement: the original's own index or the Placard check's minimum. */
export type LoadSource = "original" | "placard";

/** One rule's finding, with the figures it was decided on. `rule` names the check, `number` the rule (1–7). */
export type RuleCheck =
  | { rule: "rim"; number: 1; passed: boolean; candidate: number; required: number }
  | { rule: "construction"; number: 1; passed: boolean; candidate: Construction; required: Construction }
  | { rule: "diameter"; number: 2; passed: boolean; diffPct: number; diffMm: number; tolerancePct: number }
  | { rule: "loadIndex"; number: 3; passed: boolean; candidate: number; required: number; source: LoadSource; marginKg: number }
  | { rule: "loadIndexDual"; number: 3; passed: boolean; candidate: number | null; required: number; source: LoadSource; marginKg: number | null }
  | { rule: "speed"; number: 4; passed: boolean; candidate: SpeedSymbol | null; required: SpeedSymbol | "ZR" }
  | { rule: "loadRange"; number: 5; passed: boolean; candidate: LoadRange | null; required: LoadRange }
  | { rule: "serviceType"; number: 6; passed: boolean; candidate: ServiceType; required: ServiceType }
  | { rule: "runFlat"; number: 7; passed: boolean; candidate: boolean };

export type RuleName = RuleCheck["rule"];
export type RuleNumber = RuleCheck["number"];

/** What a driver should know about a tire that qualifies, beyond the rules. */
export type RuleNote =
  | { note: "seasonChange"; from: Season; to: Season }
  | { note: "inflation"; euroMetric: boolean; extraLoad: boolean };

export interface Verdict {
  /** Every rule holds. */
  qualifies: boolean;
  checks: RuleCheck[];
  /** The numbers of the rules that fail, each once, in order. */
  failedRules: RuleNumber[];
  notes: RuleNote[];
}

export interface JudgeOptions {
  tolerancePct: number;
  /**
   * The Plus planner's reading: every candidate sits on a wheel of its own diameter, so the rim is not
   * compared (every other rule still is).
   */
  ownRim?: boolean;
}

function requirement(own: number | null, minimum: number | null): { required: number; source: LoadSource } | null {
  if (own === null && minimum === null) return null;
  if (minimum !== null && (own === null || minimum > own)) return { required: minimum, source: "placard" };
  return { required: own as number, source: "original" };
}

const kgMargin = (candidate: number, required: number) => (loadIndexKg(candidate) ?? 0) - (loadIndexKg(required) ?? 0);
const requiredSpeedRank = (symbol: SpeedSymbol | "ZR") => (symbol === "ZR" ? ZR_UNRATED_RANK : speedSymbolRank(symbol));

/** The load indices a candidate must reach: the higher of the original's and the Placard check's, single and dual. */
export function loadRequirements(original: Pick<JudgedOriginal, "loadIndex" | "loadIndexDual" | "minLoadIndex" | "minLoadIndexDual">) {
  return {
    single: requirement(original.loadIndex, original.minLoadIndex),
    dual: requirement(original.loadIndexDual, original.minLoadIndexDual),
  };
}

function loadChecks(original: JudgedOriginal, candidate: JudgedCandidate): RuleCheck[] {
  const checks: RuleCheck[] = [];
  const { single, dual } = loadRequirements(original);
  if (single) {
    const { required, source } = single;
    checks.push({ rule: "loadIndex", number: 3, passed: candidate.loadIndex >= required, candidate: candidate.loadIndex, required, source, marginKg: kgMargin(candidate.loadIndex, required) });
  }
  // A tire with no dual rating is never fit for dual mounting, whatever its single index.
  if (dual) {
    const { required, source } = dual;
    const rated = candidate.loadIndexDual;
    checks.push({
      rule: "loadIndexDual", number: 3, passed: rated !== null && rated >= required, candidate: rated, required, source,
      marginKg: rated === null ? null : kgMargin(rated, required),
    });
  }
  return checks;
}

function speedCheck(original: JudgedOriginal, candidate: JudgedCandidate): RuleCheck[] {
  if (original.speedSymbol === null) return [];
  const symbol = isSpeedSymbol(candidate.speedSymbol) ? candidate.speedSymbol : null;
  const passed = symbol !== null && speedSymbolRank(symbol) >= requiredSpeedRank(original.speedSymbol);
  return [{ rule: "speed", number: 4, passed, candidate: symbol, required: original.speedSymbol }];
}

function loadRangeCheck(original: JudgedOriginal, candidate: JudgedCandidate): RuleCheck[] {
  if (original.loadRange === null) return [];
  const range = candidate.loadRange !== null && isLoadRange(candidate.loadRange) ? candidate.loadRange : null;
  const passed = range !== null && plyRatingForLoadRange(range) >= plyRatingForLoadRange(original.loadRange);
  return [{ rule: "loadRange", number: 5, passed, candidate: range, required: original.loadRange }];
}

function notesFor(original: JudgedOriginal, candidate: JudgedCandidate): RuleNote[] {
  const notes: RuleNote[] = [];
  if (original.season !== null && candidate.season !== null && candidate.season !== original.season) {
    notes.push({ note: "seasonChange", from: original.season, to: candidate.season });
  }
  // P-metric and ETRTO (and SL and XL) tires reach their load at different pressures (common practice).
  const euroMetric = candidate.serviceType === "passenger" && !candidate.pMetric;
  if (original.pMetric && (euroMetric || candidate.extraLoad)) notes.push({ note: "inflation", euroMetric, extraLoad: candidate.extraLoad });
  return notes;
}

/**
 * The one judge of equal-or-better: rules 1–7 of the finder's contract for one original and one
 * candidate, as codes with their figures (words come later, from these codes). The finder's SQL,
 * the Fit card, the Plus planner's counts and the tests all take their verdicts from here.
 */
export function judgeCandidate(original: JudgedOriginal, candidate: JudgedCandidate, options: JudgeOptions): Verdict {
  const diffPct = diameterChangePct(original.overallDiameterMm, candidate.overallDiameterMm);
  const checks: RuleCheck[] = [];
  if (!options.ownRim) {
    checks.push({ rule: "rim", number: 1, passed: candidate.rimDiameterIn === original.rimDiameterIn, candidate: candidate.rimDiameterIn, required: original.rimDiameterIn });
  }
  checks.push(
    { rule: "construction", number: 1, passed: candidate.construction === original.construction, candidate: candidate.construction, required: original.construction },
    { rule: "diameter", number: 2, passed: Math.abs(diffPct) <= options.tolerancePct, diffPct, diffMm: candidate.overallDiameterMm - original.overallDiameterMm, tolerancePct: options.tolerancePct },
    ...loadChecks(original, candidate),
    ...speedCheck(original, candidate),
    ...loadRangeCheck(original, candidate),
    {
      rule: "serviceType", number: 6,
      // A temporary spare is never a candidate, not even for another temporary spare.
      passed: original.serviceType !== "T" && candidate.serviceType === original.serviceType,
      candidate: candidate.serviceType, required: original.serviceType,
    },
  );
  if (original.runFlat) checks.push({ rule: "runFlat", number: 7, passed: candidate.runFlat, candidate: candidate.runFlat });
  const failedRules = [...new Set(checks.filter((check) => !check.passed).map((check) => check.number))];
  return { qualifies: failedRules.length === 0, checks, failedRules, notes: notesFor(original, candidate) };
}

/** Rules 2–5 may each be missed alone: such a tire is shown as a near miss, with the one rule it fails. */
export const NEAR_MISS_RULES: readonly RuleNumber[] = [2, 3, 4, 5];

export function isNearMiss(verdict: Verdict): boolean {
  return verdict.failedRules.length === 1 && NEAR_MISS_RULES.includes(verdict.failedRules[0] as RuleNumber);
}

/** What the rules read from a size itself, for an original or a candidate. */
export function sizeFacts(size: MeasurableSize): Pick<JudgedOriginal, "rimDiameterIn" | "construction" | "serviceType" | "pMetric" | "runFlat" | "overallDiameterMm"> {
  return {
    rimDiameterIn: size.rimDiameterIn,
    construction: size.construction,
    serviceType: serviceType(size),
    pMetric: size.prefix === "P",
    runFlat: size.runFlat,
    overallDiameterMm: sizeGeometry(size).overallDiameterMm,
  };
}
