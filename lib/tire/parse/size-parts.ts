/** The pieces a size is read from, and what is wrong when one is missing. */
import type { Construction, SizePrefix, TireSize } from "../types";
import { numAt, punctAt, wordAt, type Reader } from "./reader";
import type { Token } from "./tokens";

/** Bounds a size must fall in to be read; outside them the text is reported as not understood. */
export const SIZE_BOUNDS = {
  sectionWidthMm: [60, 499],
  aspectRatio: [20, 95],
  rimDiameterIn: [8, 30],
  flotationDiameterIn: [15, 60],
  flotationWidthIn: [5, 25],
  inchWidthIn: [4, 25],
} as const;

export interface ConstructionCode {
  construction: Construction;
  zr: boolean;
  runFlat: boolean;
}

export const CONSTRUCTION_CODES: ReadonlyMap<string, ConstructionCode> = new Map<string, ConstructionCode>([
  ["R", { construction: "R", zr: false, runFlat: false }],
  ["ZR", { construction: "R", zr: true, runFlat: false }],
  ["RF", { construction: "R", zr: false, runFlat: true }],
  ["ZRF", { construction: "R", zr: true, runFlat: true }],
  ["D", { construction: "D", zr: false, runFlat: false }],
  ["B", { construction: "B", zr: false, runFlat: false }],
]);

/** How the construction was found: the code, how many tokens it took, and whether radial was assumed. */
interface ConstructionRead {
  code: ConstructionCode;
  tokens: 0 | 1;
  assumed: boolean;
}

const MARKED = new Map([...CONSTRUCTION_CODES].map(([k, code]) => [k, { code, tokens: 1, assumed: false } as ConstructionRead]));
export const RADIAL = CONSTRUCTION_CODES.get("R") as ConstructionCode;
export const BIAS = CONSTRUCTION_CODES.get("D") as ConstructionCode;
const BIAS_BY_HYPHEN: ConstructionRead = { code: BIAS, tokens: 1, assumed: false };
const RADIAL_FOR_MARK: ConstructionRead = { code: RADIAL, tokens: 1, assumed: true };
const RADIAL_FOR_SPACE: ConstructionRead = { code: RADIAL, tokens: 0, assumed: true };
export const PREFIXES: ReadonlySet<string> = new Set<SizePrefix>(["P", "LT", "ST", "T"]);

/**
 * Token indices of the pieces of a size (-1 when absent). A run-together size ("28550R20") has its
 * width, aspect ratio and perhaps rim in the one `first` token.
 */
export interface SizeTokens {
  prefix: number;
  first: number;
  second: number;
  construction: number;
  rim: number;
  suffix: number;
  runTogether: boolean;
}

/** A size, or size-like text with what is wrong with it. */
export interface SizeMatch {
  end: number;
  /** Where the designation itself ends (a load range letter may follow). */
  sizeEnd: number;
  size: TireSize | null;
  problem: { message: string; suggestion: string } | null;
  /** How a forgiving form was read: ": radial construction assumed", "" for a plain respelling, null for a standard form. */
  assumed: string | null;
  loadRangeLetter: string | null;
  at: SizeTokens | null;
}

/** Indexed rather than destructured: this runs for every number a size reader looks at. */
export const inRange = (value: number, bounds: readonly [number, number]): boolean => value >= bounds[0] && value <= bounds[1];
export const metricExample = (width: number, aspect: number | null): string => `${width}/${aspect ?? 55}R17`;
export const flotationExample = (diameter: Token, width: Token): string => `${diameter.text}x${width.text}R15LT`;
export const RADIAL_ASSUMED = ": radial construction assumed";

export function decimals(t: Token): number {
  const dot = t.text.indexOf(".");
  return dot < 0 ? 0 : t.text.length - dot - 1;
}

export function miss(end: number, message: string, suggestion: string): SizeMatch {
  return { end, sizeEnd: end, size: null, problem: { message, suggestion }, assumed: null, loadRangeLetter: null, at: null };
}

/** The construction at token k: a code (R, ZR, RF, D…), "-" (bias) or "/", or nothing before a spaced rim. */
export function construction(r: Reader, k: number, hyphenMeansBias: boolean): ConstructionRead | null {
  const marked = MARKED.get(wordAt(r, k) ?? "");
  if (marked) return marked;
  const p = punctAt(r, k);
  if ((p === "-" || p === "/") && numAt(r, k + 1)) return p === "-" && hyphenMeansBias ? BIAS_BY_HYPHEN : RADIAL_FOR_MARK;
  return numAt(r, k)?.gap ? RADIAL_FOR_SPACE : null;
}

export type RimStatus = "ok" | "missing" | "invalid";

export function rimStatus(r: Reader, k: number): RimStatus {
  const rim = numAt(r, k);
  if (!rim) return "missing";
  if (Number.isInteger(rim.value * 2) && inRange(rim.value, SIZE_BOUNDS.rimDiameterIn)) return "ok";
  // A spaced number that cannot be a rim belongs to what follows ("285/50R 116T").
  return rim.gap ? "missing" : "invalid";
}

export function rimMiss(r: Reader, k: number, status: RimStatus, example: string): SizeMatch {
  return status === "missing"
    ? miss(k, "the rim diameter is missing", `Add the rim diameter in inches after the construction letter, e.g. ${example}.`)
    : miss(k + 1, `a rim diameter of ${numAt(r, k)?.text} in is not a tire rim size`, `Rim diameters run from 8 to 30 inches (16.5-style half sizes included), e.g. ${example}.`);
}

export function makeSize(
  kind: TireSize["kind"], prefix: SizePrefix | null, sectionWidthMm: number, aspectRatio: number | null,
  code: ConstructionCode, rimDiameterIn: number, flotationDiameterIn: number | null,
): TireSize {
  const { construction, zr, runFlat } = code;
  return { kind, prefix, commercial: false, sectionWidthMm, aspectRatio, construction, zr, runFlat, rimDiameterIn, flotationDiameterIn };
}
