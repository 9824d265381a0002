import type { TireSize } from "./types";
import { MM_PER_INCH } from "./units";

/** Whole numbers as they are, others to at most two decimals: 20, 16.5, 35.5. */
function inches(value: number): string {
  return String(Math.round(value * 100) / 100);
}

function constructionCode(size: TireSize): string {
  return (size.zr ? "Z" : "") + size.construction + (size.runFlat ? "F" : "");
}

/** "11R22.5", "7.50R16LT", "7.50-16" (bias), "ST4.80-12": widths in inches, two decimals unless whole. */
function formatInchSize(size: TireSize, rim: string): string {
  const widthIn = Math.round((size.sectionWidthMm / MM_PER_INCH) * 100) / 100;
  const width = Number.isInteger(widthIn) ? String(widthIn) : widthIn.toFixed(2);
  const mark = size.construction === "R" ? "R" : "-";
  return `${size.prefix === "ST" ? "ST" : ""}${width}${mark}${rim}${size.prefix === "LT" ? "LT" : ""}`;
}

/**
 * The normalized designation: "285/50R20", "LT265/75R16", "215/65R16C", "245/40ZR18",
 * "245/40RF18" (run-flat), "155R13", "33x12.50R15LT", "11R22.5", "7.50-16". LT flotation and inch
 * sizes carry LT at the end, as they are marked; metric LT sizes carry it in front.
 */
export function formatSize(size: TireSize): string {
  const rim = inches(size.rimDiameterIn);
  if (size.kind === "inch") return formatInchSize(size, rim);
  if (size.flotationDiameterIn !== null) {
    const width = (size.sectionWidthMm / MM_PER_INCH).toFixed(2);
    const suffix = size.prefix === "LT" ? "LT" : "";
    return `${inches(size.flotationDiameterIn)}x${width}${constructionCode(size)}${rim}${suffix}`;
  }
  const aspect = size.aspectRatio === null ? "" : `/${size.aspectRatio}`;
  const prefix = size.prefix ?? "";
  const commercial = size.commercial ? "C" : "";
  return `${prefix}${size.sectionWidthMm}${aspect}${constructionCode(size)}${rim}${commercial}`;
}

/** The designation as a URL path segment: the slash becomes a hyphen ("285-50R20"). */
export function sizeToSlug(size: TireSize): string {
  return formatSize(size).replace("/", "-");
}

/** A service description as printed: "119S", or with a dual index "123/120R". */
export function formatServiceDescription(service: { loadIndex: number; loadIndexDual: number | null; speedSymbol: string }): string {
  return `${service.loadIndex}${service.loadIndexDual === null ? "" : `/${service.loadIndexDual}`}${service.speedSymbol}`;
}
