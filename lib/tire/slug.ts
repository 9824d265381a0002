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
