import { MM_PER_INCH } from "./units";

/** Tread depth is measured in 32nds of an inch: 25.4 / 32 = 0.79375 mm, exactly. */
export const MM_PER_32ND = MM_PER_INCH / 32;

/** The limit when a shop has set none: 2/32 in of tread depth between any two tires on the vehicle (common practice). */
export const DEFAULT_WEAR_LIMIT_32 = 2;

/** A vehicle maker states its limit either as a tread-depth difference or as a rolling-circumference difference. */
export type WearLimit = { kind: "depth32"; value: number } | { kind: "circumferenceMm"; value: number };

export interface TireOnVehicle {
  depth32: number;
  overallDiameterMm: number;
  /** The free circumference, π × diameter. */
  circumferenceMm: number;
}

export type WearVerdict = "fitsAsIs" | "shave" | "replaceSet";

export interface WearMatch {
  newTire: TireOnVehicle;
  remaining: TireOnVehicle[];
  /** The deepest staying tire less the shallowest, in 32nds. */
  spread32: number;
  /** The limit as a tread-depth difference in 32nds (a circumference limit converted; unrounded). */
  limit32: number;
  verdict: WearVerdict;
  /** Why the set must be replaced: the staying tires already differ too much, or the new one is too shallow. */
  replaceReason: "spread" | "newTooShallow" | null;
  /** The deepest depth the new tire may keep, when shaving is the answer; unrounded. */
  shaveTo32: number | null;
}

export interface WearMatchInput {
  /** The size's nominal overall diameter, taken as the diameter of a new tire (common practice). */
  newDiameterMm: number;
  newDepth32: number;
  /** The depths left on the tires that stay (two or three of four). */
  remaining32: readonly number[];
  limit: WearLimit;
}

// Depths typed in halves and limits converted from millimetres meet in floating point: a difference
// this small is equality, so that a tire exactly at the limit is within it.
const EPSILON = 1e-9;

/** A tire worn from `newDepth32` to `depth32` has lost twice the tread of diameter. */
export function wornTire(newDiameterMm: number, newDepth32: number, depth32: number): TireOnVehicle {
  const overallDiameterMm = newDiameterMm - 2 * (newDepth32 - depth32) * MM_PER_32ND;
  return { depth32, overallDiameterMm, circumferenceMm: Math.PI * overallDiameterMm };
}

/** The limit as a tread-depth difference: a circumference difference c is a depth difference c / (2π × 0.79375 mm). */
export function depthLimit32(limit: WearLimit): number {
  return limit.kind === "depth32" ? limit.value : limit.value / (2 * Math.PI * MM_PER_32ND);
}

/**
 * Whether a new tire can join the tires that stay on an all-wheel-drive vehicle, so that every tire
 * lies within the limit of every other. The staying tires are taken to have started at the new
 * tire's depth (so their diameters can be drawn); shaving can only take tread off, never add it.
 */
export function wearMatch({ newDiameterMm, newDepth32, remaining32, limit }: WearMatchInput): WearMatch {
  const limit32 = depthLimit32(limit);
  const shallowest = Math.min(...remaining32);
  const deepest = Math.max(...remaining32);
  const spread32 = deepest - shallowest;
  const base = {
    newTire: wornTire(newDiameterMm, newDepth32, newDepth32),
    remaining: remaining32.map((depth32) => wornTire(newDiameterMm, newDepth32, depth32)),
    spread32,
    limit32,
  };
  if (spread32 > limit32 + EPSILON) return { ...base, verdict: "replaceSet", replaceReason: "spread", shaveTo32: null };
  if (newDepth32 < deepest - limit32 - EPSILON) return { ...base, verdict: "replaceSet", replaceReason: "newTooShallow", shaveTo32: null };
  if (newDepth32 <= shallowest + limit32 + EPSILON) return { ...base, verdict: "fitsAsIs", replaceReason: null, shaveTo32: null };
  return { ...base, verdict: "shave", replaceReason: null, shaveTo32: shallowest + limit32 };
}

/**
 * The shaving depth as a fitter reads it: rounded down to a whole 32nd, or to a half where a whole
 * 32nd would take too much off for the deepest staying tire (a limit under 1/32, from a small
 * circumference limit).
 */
export function shaveDepthToShow(match: WearMatch): number | null {
  if (match.shaveTo32 === null) return null;
  const lowestAllowed = Math.max(...match.remaining.map((tire) => tire.depth32)) - match.limit32 - EPSILON;
  const whole = Math.floor(match.shaveTo32 + EPSILON);
  if (whole >= lowestAllowed) return whole;
  const half = Math.floor((match.shaveTo32 + EPSILON) * 2) / 2;
  return half >= lowestAllowed ? half : match.shaveTo32;
}
