import { formatUpToDecimals } from "../display";
import { formatSize } from "../format";
import { IMPLIED_ASPECT_RATIO } from "../geometry";
import { loadIndexKg, loadIndexLb } from "../load-index";
import { plyRatingForLoadRange, type LoadRange } from "../load-range";
import { rimTwinCaution } from "../rim-twins";
import type { LoadMark, PressureMark, ServiceDescription, TireSize } from "../types";
import { kgToLb, kpaToPsi } from "../units";

// As toLocaleString("en-US") writes them: grouped, up to three decimals.
const fmt = (n: number): string => formatUpToDecimals(n, 3);

/** Printed kilograms are rounded: allow 0.5 % (at least one kilogram). */
function differs(marked: number, expected: number): boolean {
  return Math.abs(marked - expected) > Math.max(1, expected * 0.005);
}

/**
 * Whether a printed pound figure disagrees with `kg` × 2.20462. Pound tables on sidewalls are rounded
 * their own way (common practice): down to a multiple of 5 or 10 lb, or converted at 2.2 lb/kg
 * (0.2 % low), so a figure up to 10 lb or 0.5 % below, whichever is more, agrees. A figure above
 * would overstate the tire, so only rounding is allowed there: to the nearest 5 or 10 lb, or a
 * kilogram figure rounded to 5 kg from a pound table, at most 6 lb or 0.2 %.
 */
function poundsDisagree(lb: number, kg: number): boolean {
  const expected = kgToLb(kg);
  const below = expected - lb;
  return below > Math.max(10, expected * 0.005) || -below > Math.max(6, expected * 0.002);
}

function checkLoadMark(label: string, mark: LoadMark, loadIndex: number | null, warnings: string[]): void {
  if (mark.kg !== null && mark.lb !== null && poundsDisagree(mark.lb, mark.kg)) {
    warnings.push(`The maximum ${label}load reads ${fmt(mark.kg)} kg but ${fmt(mark.lb)} lb; the two do not agree.`);
  }
  if (loadIndex === null) return;
  const kg = loadIndexKg(loadIndex) ?? Number.NaN;
  const lb = loadIndexLb(loadIndex) ?? Number.NaN;
  if (mark.kg !== null && differs(mark.kg, kg)) {
    warnings.push(`The maximum ${label}load of ${fmt(mark.kg)} kg does not match load index ${loadIndex} (${fmt(kg)} kg).`);
  } else if (mark.kg === null && mark.lb !== null && poundsDisagree(mark.lb, kg)) {
    warnings.push(`The maximum ${label}load of ${fmt(mark.lb)} lb does not match load index ${loadIndex} (${fmt(lb)} lb).`);
  }
}

export function checkMaxLoad(single: LoadMark | null, dual: LoadMark | null, service: ServiceDescription | null, warnings: string[]): void {
  if (single) checkLoadMark("", single, service?.loadIndex ?? null, warnings);
  if (dual) checkLoadMark("dual ", dual, service?.loadIndexDual ?? null, warnings);
}

export function checkPressure(p: PressureMark | null, warnings: string[]): void {
  if (p?.kPa == null || p.psi === null || Math.abs(kpaToPsi(p.kPa) - p.psi) <= 1) return;
  warnings.push(`The maximum pressure reads ${fmt(p.kPa)} kPa but ${fmt(p.psi)} psi; the two do not agree.`);
}

export function checkPly(loadRange: LoadRange | null, plyRating: number | null, warnings: string[]): void {
  if (loadRange === null || plyRating === null) return;
  const expected = plyRatingForLoadRange(loadRange);
  if (expected !== plyRating) warnings.push(`The ${plyRating}-ply rating does not match load range ${loadRange} (${expected}-ply).`);
}

export function checkSize(size: TireSize, service: ServiceDescription | null, warnings: string[]): void {
  if (size.kind === "metric" && size.aspectRatio === null) {
    warnings.push(`${formatSize(size)} has no aspect ratio marked; its dimensions use ${IMPLIED_ASPECT_RATIO} %, the usual series for such sizes (common practice).`);
  }
  if (size.prefix === "T") {
    warnings.push("T marks a temporary spare: for short distances at reduced speed, often 80 km/h (50 mph) at most; follow the label on the spare (common practice).");
  }
  const rimCaution = Number.isInteger(size.rimDiameterIn) ? null : rimTwinCaution(size.rimDiameterIn);
  if (rimCaution !== null) warnings.push(`This tire fits ${size.rimDiameterIn}-inch wheels only. ${rimCaution}`);
  if (size.zr && service && service.speedKmh < 240) {
    warnings.push(`ZR sizes are made for more than 240 km/h, yet the speed symbol ${service.speedSymbol} is lower; check the marking.`);
  }
}
