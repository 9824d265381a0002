import { formatLength, formatLoad, formatPressure, formatSpeed, type UnitSystem } from "./display";
import { loadIndexKg } from "./load-index";
import type { DetailKind, Marking, PartKind, Span } from "./types";
import { lbToKg, psiToKpa } from "./units";

export interface PartSpan {
  start: number;
  end: number;
}

/** The parts a marking is explained by: the pieces of a size and service description, and the other marks. */
export type SidewallPartKey =
  | Exclude<DetailKind, "overallDiameter" | "loadIndexDual">
  | "loadRange"
  | "plyRating"
  | "extraLoad"
  | "runFlat"
  | "dot"
  | "utqg"
  | "winter"
  | "maxLoad"
  | "maxPressure";

/** Which dimension of a drawing a part of the marking describes. */
export type DrawnDimension = "overall" | "rim" | "sectionWidth" | "sidewall";

export interface DescribedPart {
  key: SidewallPartKey;
  /** What this part says, with its numbers in the chosen units: "carries 1,360 kg per tire". */
  reading: string;
  /** Where the part was typed, when it can be pointed at. */
  span: PartSpan | null;
  dimension: DrawnDimension | null;
}

const PREFIX_MEANING = { P: "passenger car", LT: "light truck", ST: "special trailer, for trailers only", T: "temporary spare" } as const;
const CONSTRUCTION_MEANING = { R: "radial", D: "bias (diagonal) ply", B: "bias-belted" } as const;

/** Where the given pieces of a size or service description were typed, from the first to the last. */
function detailSpan(marking: Marking, ...details: DetailKind[]): PartSpan | null {
  const found = marking.details.filter((span) => details.includes(span.detail));
  if (found.length === 0) return null;
  return { start: found[0]!.start, end: found[found.length - 1]!.end };
}

function spanOf(spans: Span[], part: PartKind): PartSpan | null {
  const found = spans.filter((span) => span.part === part);
  if (found.length === 0) return null;
  return { start: found[0]!.start, end: found[found.length - 1]!.end };
}

/** Every part the marking holds, in sidewall order, each with its reading in plain words. */
export function describeMarking(marking: Marking, units: UnitSystem): DescribedPart[] {
  const parts: DescribedPart[] = [];
  const add = (key: SidewallPartKey, reading: string, span: PartSpan | null, dimension: DrawnDimension | null = null) =>
    parts.push({ key, reading, span, dimension });
  const { size, geometry, service } = marking;

  if (size && geometry) {
    const sizeSpan = spanOf(marking.spans, "size");
    const sub = (detail: DetailKind) => detailSpan(marking, detail) ?? sizeSpan;
    if (size.prefix) add("prefix", `${size.prefix}: ${PREFIX_MEANING[size.prefix]}`, sub("prefix"));
    add("sectionWidth", `${formatLength(size.sectionWidthMm, units)} wide`, sub("sectionWidth"), "sectionWidth");
    const aspect = geometry.aspectRatio;
    if (aspect !== null) {
      const marked = size.aspectRatio === null ? ` (not marked: the ${aspect} series is assumed)` : "";
      add("aspectRatio", `sidewall ${aspect} % of the width: ${formatLength(geometry.sidewallMm, units)} high${marked}`, sub("aspectRatio"), "sidewall");
    } else {
      add("aspectRatio", `sidewall ${formatLength(geometry.sidewallMm, units)} high (flotation sizes give the overall diameter instead)`, sub("overallDiameter"), "sidewall");
    }
    const zr = size.zr ? ", ZR: built for speeds above 240 km/h (149 mph)" : "";
    add("construction", `${CONSTRUCTION_MEANING[size.construction]}${zr}`, sub("construction"));
    add("rimDiameter", `fits ${size.rimDiameterIn}-inch wheels only`, sub("rimDiameter"), "rim");
    if (size.commercial) add("commercial", "commercial tire for vans and light trucks", sub("commercial"));
  }

  if (service) {
    const serviceSpan = spanOf(marking.spans, "service");
    const dualKg = service.loadIndexDual === null ? undefined : loadIndexKg(service.loadIndexDual);
    const dual = dualKg === undefined ? "" : `; ${service.loadIndexDual} on dual wheels: ${formatLoad(dualKg, units)} each`;
    add("loadIndex", `${service.loadIndex}: carries up to ${formatLoad(service.loadKg, units)} per tire${dual}`, detailSpan(marking, "loadIndex", "loadIndexDual") ?? serviceSpan);
    const above = service.speedAbove ? "above " : "up to ";
    add("speedSymbol", `${service.speedSymbol}: built for ${above}${formatSpeed(service.speedKmh, units)}`, detailSpan(marking, "speedSymbol") ?? serviceSpan);
  }

  if (marking.loadRange) add("loadRange", `load range ${marking.loadRange}`, spanOf(marking.spans, "loadRange"));
  if (marking.plyRating !== null) add("plyRating", `${marking.plyRating}-ply rating`, spanOf(marking.spans, "plyRating"));
  if (marking.extraLoad) add("extraLoad", "Extra Load: reinforced, carries more at a higher pressure", spanOf(marking.spans, "loadType"));
  if (size?.runFlat) add("runFlat", "run-flat: can be driven a short way after losing pressure", spanOf(marking.spans, "runFlat") ?? spanOf(marking.spans, "size"));

  if (marking.dot) {
    const { week, year, yearAmbiguous, ageYears } = marking.dot;
    const age = ageYears === null ? "" : `, about ${Math.max(0, Math.floor(ageYears))} years old`;
    const when = yearAmbiguous ? `week ${week} of a year in the 1990s (three-digit code)` : `week ${week} of ${year}`;
    add("dot", `made in ${when}${age}`, spanOf(marking.spans, "dot"));
  }
  if (marking.utqg) {
    const { treadwear, traction, temperature } = marking.utqg;
    add("utqg", `treadwear ${treadwear}, traction ${traction}, temperature ${temperature}`, spanOf(marking.spans, "utqg"));
  }
  const { mudAndSnow, threePeak } = marking.winter;
  if (mudAndSnow || threePeak) {
    const marks = [mudAndSnow ? "M+S: tread designed for mud and snow" : "", threePeak ? "3PMSF: passed a standard snow traction test" : ""];
    add("winter", marks.filter(Boolean).join("; "), spanOf(marking.spans, "winter"));
  }
  const maxLoad = marking.maxLoad?.single;
  if (maxLoad) {
    const kg = maxLoad.kg ?? (maxLoad.lb === null ? null : lbToKg(maxLoad.lb));
    if (kg !== null) add("maxLoad", `${formatLoad(kg, units)} at most per tire`, spanOf(marking.spans, "maxLoad"));
  }
  const pressure = marking.maxPressure;
  const kPa = pressure?.kPa ?? (pressure?.psi == null ? null : psiToKpa(pressure.psi));
  if (kPa !== null) add("maxPressure", `${formatPressure(kPa, units)} cold, at most`, spanOf(marking.spans, "maxPressure"));
  return parts;
}
