import { formatInchesAsMarked, formatLength, formatLoad, formatMillimetresAsMarked, formatPressure, formatSpeed, type UnitSystem } from "./display";
import { loadIndexKg } from "./load-index";
import { rimTwin } from "./rim-twins";
import { serviceType } from "./service-type";
import type { DetailKind, Marking, PartKind, ServiceDescription, Span, TireSize } from "./types";
import { lbToKg, psiToKpa } from "./units";

export interface PartSpan {
  start: number;
  end: number;
}

/** The parts a marking is explained by: the pieces of a size and service description, and the other marks. */
export type SidewallPartKey =
  | Exclude<DetailKind, "loadIndexDual">
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

function describeSize(marking: Marking, size: TireSize, units: UnitSystem, add: AddPart): void {
  const { geometry } = marking;
  const sizeSpan = spanOf(marking.spans, "size");
  const sub = (detail: DetailKind) => detailSpan(marking, detail) ?? sizeSpan;
  if (size.prefix) add("prefix", `${size.prefix}: ${PREFIX_MEANING[size.prefix]}`, sub("prefix"));
  if (size.flotationDiameterIn !== null && geometry) {
    add("overallDiameter", `${formatInchesAsMarked(geometry.overallDiameterMm, units)} tall overall; sidewall ${formatLength(geometry.sidewallMm, units)} high`, sub("overallDiameter"), "overall");
  }
  // Metric sizes mark the width in millimetres; the others (flotation, inch-width) in inches.
  const width = size.kind === "metric" ? formatMillimetresAsMarked(size.sectionWidthMm, units) : formatInchesAsMarked(size.sectionWidthMm, units);
  add("sectionWidth", `${width} wide`, sub("sectionWidth"), "sectionWidth");
  const aspect = geometry?.aspectRatio ?? null;
  if (geometry && aspect !== null) {
    const marked = size.aspectRatio === null ? ` (not marked: the ${aspect} series is assumed)` : "";
    add("aspectRatio", `sidewall ${aspect} % of the width: ${formatLength(geometry.sidewallMm, units)} high${marked}`, sub("aspectRatio"), "sidewall");
  }
  const zr = size.zr ? ", ZR: built for speeds above 240 km/h (149 mph)" : "";
  add("construction", `${CONSTRUCTION_MEANING[size.construction]}${zr}`, sub("construction"));
  const twin = rimTwin(size.rimDiameterIn);
  const never = twin === null ? "" : `, never ${twin}-inch ones`;
  add("rimDiameter", `fits ${size.rimDiameterIn}-inch wheels only${never}`, sub("rimDiameter"), "rim");
  if (size.commercial) add("commercial", size.kind === "metric" ? "commercial tire for vans and light trucks" : "truck or commercial tire", sub("commercial"));
}

function loadIndexReading(service: ServiceDescription, size: TireSize | null, units: UnitSystem): string {
  const single = `${service.loadIndex}: carries up to ${formatLoad(service.loadKg, units)} per tire`;
  const dualKg = service.loadIndexDual === null ? undefined : loadIndexKg(service.loadIndexDual);
  if (dualKg !== undefined) return `${single}; ${service.loadIndexDual} on dual wheels: ${formatLoad(dualKg, units)} each`;
  return size !== null && serviceType(size) === "passenger" ? `${single}; no dual rating: not for dual wheels` : single;
}

type AddPart = (key: SidewallPartKey, reading: string, span: PartSpan | null, dimension?: DrawnDimension | null) => void;

/** Every part the marking holds, in sidewall order, each with its reading in plain words. */
export function describeMarking(marking: Marking, units: UnitSystem): DescribedPart[] {
  const parts: DescribedPart[] = [];
  const add: AddPart = (key, reading, span, dimension = null) => parts.push({ key, reading, span, dimension });
  const { size, service } = marking;
  if (size) describeSize(marking, size, units, add);

  if (service) {
    const serviceSpan = spanOf(marking.spans, "service");
    add("loadIndex", loadIndexReading(service, size, units), detailSpan(marking, "loadIndex", "loadIndexDual") ?? serviceSpan);
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
