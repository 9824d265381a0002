import { formatSize } from "./format";
import { notASizeMessage } from "./messages";
import { hasNominalDiameter, NO_NOMINAL_DIAMETER, type MeasurableSize } from "./geometry";
import { parseMarking } from "./parse/parse-marking";
import type { TireSize } from "./types";

/**
 * Reads a size from a URL segment or query parameter ("285-50R20", "LT265-75R16", "33x12.50R15LT")
 * or any designation the parser understands; null unless the text is a size and nothing else.
 */
export function sizeFromSlug(slug: string): TireSize | null {
  const result = parseMarking(slug);
  if (!result.ok || !result.size) return null;
  return result.spans.every((s) => s.part === "size") ? result.size : null;
}

/** A size whose overall diameter its marking gives (not 11R22.5 or 7.50-16), or null. */
export function measurableSizeFromSlug(slug: string): MeasurableSize | null {
  const size = sizeFromSlug(slug);
  return size && hasNominalDiameter(size) ? size : null;
}

/** Why an inch-width size cannot be measured, drawn or compared, in one sentence. */
export const noDiameterMessage = (size: TireSize): string => `${formatSize(size)} cannot be measured: ${NO_NOMINAL_DIAMETER}.`;

/** A size that can be measured, or the one sentence saying why not: not a size, or a marking with no diameter. */
export function readMeasurableSize(text: string): { ok: true; size: MeasurableSize } | { ok: false; message: string } {
  const size = sizeFromSlug(text);
  if (!size) return { ok: false, message: notASizeMessage(text) };
  return hasNominalDiameter(size) ? { ok: true, size } : { ok: false, message: noDiameterMessage(size) };
}
