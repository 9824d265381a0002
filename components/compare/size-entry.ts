import { hasNominalDiameter, type MeasurableSize } from "@/lib/tire/geometry";
import { noDiameterMessage, sizeFromSlug } from "@/lib/tire/slug";

export interface SizeEntry {
  id: number;
  text: string;
  /** What is wrong with the text as a size to compare, or null when it compares. */
  problem: string | null;
  /** The size to draw and compare, or null when the text is not one. */
  size: MeasurableSize | null;
}

/**
 * One typed size, read: on the server for the sizes in the address, and in the browser (fetched at
 * the first edit, as it carries the marking reader) for what is typed.
 */
export function readSizeEntry(text: string, id: number): SizeEntry {
  const size = sizeFromSlug(text);
  if (!size) return { id, text, problem: "Not a size yet: type it like 275/55R20.", size: null };
  return hasNominalDiameter(size) ? { id, text, problem: null, size } : { id, text, problem: noDiameterMessage(size), size: null };
}
