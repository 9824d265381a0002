import { formatSize } from "../format";
import { hasNominalDiameter, NO_NOMINAL_DIAMETER, sizeGeometry } from "../geometry";
import { loadRangeForPlyRating, plyRatingForLoadRange } from "../load-range";
import type { ParseOptions, ParseResult, Utqg } from "../types";
import { checkMaxLoad, checkPly, checkPressure, checkSize } from "./checks";
import { withAge } from "./dot-age";
import type { Reader } from "./reader";
import { unreadableError } from "./unreadable";

function utqgOf(r: Reader, warnings: string[]): Utqg | null {
  const { treadwear, traction, temperature } = r.draft;
  if (treadwear !== null && traction !== null && temperature !== null) return { treadwear, traction, temperature };
  if (treadwear !== null || traction !== null || temperature !== null) {
    const missing = [treadwear === null && "treadwear", traction === null && "traction", temperature === null && "temperature"].filter(Boolean);
    warnings.push(`UTQG grades are incomplete: ${missing.join(" and ")} not found.`);
  }
  return null;
}

function inOrder(spans: readonly { start: number }[]): boolean {
  let previous = Number.NEGATIVE_INFINITY;
  for (const { start } of spans) {
    if (start < previous) return false;
    previous = start;
  }
  return true;
}

function readSomething(r: Reader): boolean {
  for (const span of r.draft.spans) if (span.part !== "unread") return true;
  return false;
}

/** Turns what the part readers found into the result, with cross-checks between the parts. */
export function finish(r: Reader, options: ParseOptions): ParseResult {
  const d = r.draft;
  if (d.fatal) return { ok: false, input: r.input, error: d.fatal };
  if (!readSomething(r)) return { ok: false, input: r.input, error: unreadableError(r) };

  const warnings = d.warnings;
  const size = d.size;
  if (size && d.runFlat) size.runFlat = true;
  let loadRange = d.loadRange;
  if (loadRange === null && d.plyRating !== null) {
    loadRange = loadRangeForPlyRating(d.plyRating) ?? null;
    if (loadRange) d.assumptions.push(`Load range ${loadRange} is implied by the ${d.plyRating}-ply rating.`);
  }
  checkPly(d.loadRange, d.plyRating, warnings);
  if (size) checkSize(size, d.service, warnings);
  if (size && !hasNominalDiameter(size)) warnings.push(`No overall diameter for ${formatSize(size)}: ${NO_NOMINAL_DIAMETER}.`);
  const utqg = utqgOf(r, warnings);
  checkMaxLoad(d.maxLoadSingle, d.maxLoadDual, d.service, warnings);
  checkPressure(d.maxPressure, warnings);
  const dot = d.dot ? withAge(d.dot, options.today, warnings) : null;
  if (!inOrder(d.spans)) d.spans.sort((a, b) => a.start - b.start);
  if (!inOrder(d.details)) d.details.sort((a, b) => a.start - b.start);

  return {
    ok: true,
    input: r.input,
    size,
    service: d.service,
    loadRange,
    plyRating: d.plyRating ?? (loadRange ? plyRatingForLoadRange(loadRange) : null),
    extraLoad: d.loadType === "XL",
    loadType: d.loadType,
    runFlat: d.runFlat || (size?.runFlat ?? false),
    geometry: size && hasNominalDiameter(size) ? sizeGeometry(size) : null,
    dot,
    utqg,
    winter: { mudAndSnow: d.mudAndSnow, threePeak: d.threePeak },
    maxLoad: d.maxLoadSingle || d.maxLoadDual ? { single: d.maxLoadSingle, dual: d.maxLoadDual } : null,
    maxPressure: d.maxPressure,
    assumptions: d.assumptions,
    warnings,
    spans: d.spans,
    details: d.details,
  };
}
