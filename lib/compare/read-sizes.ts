import type { MeasurableSize } from "@/lib/tire/geometry";
import { readMeasurableSize } from "@/lib/tire/slug";
import { MAX_COMPARED_SIZES } from "./compare-limits";

export type SizeListResult =
  | { ok: true; sizes: MeasurableSize[] }
  | { ok: false; code: "invalid_parameter" | "unreadable"; message: string };

/** Reads "285-50R20,275/55R20,…" (slugs or ordinary spellings), at least `min` and at most four sizes. */
export function readSizeList(text: string, min: number): SizeListResult {
  const parts = text
    .split(",")
    .map((part) => part.trim())
    .filter(Boolean);
  if (parts.length < min || parts.length > MAX_COMPARED_SIZES) {
    return { ok: false, code: "invalid_parameter", message: `Give ${min === 2 ? "two" : "one"} to four sizes separated by commas; got ${parts.length}.` };
  }
  const sizes: MeasurableSize[] = [];
  for (const part of parts) {
    const size = readMeasurableSize(part);
    if (!size.ok) return { ok: false, code: "unreadable", message: size.message };
    sizes.push(size.size);
  }
  return { ok: true, sizes };
}
