/** The sizes most markings start with, read from the characters exactly as the size reader reads them. */
import type { SizePrefix } from "../types";
import { MM_PER_INCH } from "../units";
import { codeAt, DASH, L, P, POINT, R, S, SLASH, spacesEnd, T, upper, valueOf, X, Z } from "./chars";
import type { Draft } from "./reader";
import { readAsNote } from "./size";
import { CONSTRUCTION_CODES, inRange, makeSize, RADIAL, RADIAL_ASSUMED, SIZE_BOUNDS, type ConstructionCode } from "./size-parts";
import { digitsEnd, isDigit, isLetter, isSpace, MULTIPLICATION_SIGN } from "./tokens";

const ZR = CONSTRUCTION_CODES.get("ZR") as ConstructionCode;

/**
 * A word that can change how what stands before it is read: one letter (a load range, a "C", a UTQG
 * grade, the "×" of a flotation size) or a trailing "LT".
 */
export function startsShortOrLtWord(input: string, at: number): boolean {
  const c = codeAt(input, at);
  if (c === MULTIPLICATION_SIGN) return true;
  if (!isLetter(c)) return false;
  const next = codeAt(input, at + 1);
  return !isLetter(next) || (upper(c) === L && upper(next) === T);
}

function prefixAt(input: string, start: number): SizePrefix | null {
  const first = upper(codeAt(input, start));
  if (first === P || first === T) return first === P ? "P" : "T";
  if ((first === L || first === S) && upper(codeAt(input, start + 1)) === T) return first === L ? "LT" : "ST";
  return null;
}

/**
 * A metric size at `start` in the standard form ("285/50R20", "LT265/70ZR17") or a forgiving one the
 * size reader takes with a note ("285-50R20", "28550R20", "285/50/20", "285 50 20"), recorded as that
 * reader would; the index after it, or -1.
 */
export function readMetricSize(input: string, d: Draft, start: number): number {
  const prefix = prefixAt(input, start);
  const widthAt = start + (prefix?.length ?? 0);
  const digits = digitsEnd(input, widthAt) - widthAt;
  const separator = codeAt(input, widthAt + 3);
  const spaced = digits === 3 && isSpace(separator);
  if (digits === 3 ? !spaced && separator !== SLASH && separator !== DASH : digits !== 5) return -1;
  const aspectAt = digits === 5 ? widthAt + 3 : spaced ? spacesEnd(input, widthAt + 3) : widthAt + 4;
  const aspectEnd = aspectAt + 2;
  if (digitsEnd(input, aspectAt) !== aspectEnd) return -1;
  // R or ZR as marked; radial is assumed for a second slash or a space before the rim.
  const mark = upper(codeAt(input, aspectEnd));
  const zr = mark === Z && upper(codeAt(input, aspectEnd + 1)) === R;
  const marked = !spaced && (zr || mark === R);
  const assumed = spaced ? isSpace(mark) : digits === 3 && separator === SLASH && mark === SLASH;
  if (!marked && !assumed) return -1;
  const rimAt = spaced ? spacesEnd(input, aspectEnd) : aspectEnd + (zr ? 2 : 1);
  const sizeEnd = rimAt + 2;
  if (digitsEnd(input, rimAt) !== sizeEnd || (sizeEnd < input.length && !isSpace(input.charCodeAt(sizeEnd)))) return -1;
  const width = valueOf(input, widthAt, widthAt + 3);
  const aspect = valueOf(input, aspectAt, aspectEnd);
  const rim = valueOf(input, rimAt, sizeEnd);
  if (!inRange(width, SIZE_BOUNDS.sectionWidthMm) || !inRange(aspect, SIZE_BOUNDS.aspectRatio) || !inRange(rim, SIZE_BOUNDS.rimDiameterIn)) return -1;
  // A trailing "LT", "C" or load range letter belongs to the size.
  if (startsShortOrLtWord(input, spacesEnd(input, sizeEnd))) return -1;
  const size = makeSize("metric", prefix, width, aspect, zr ? ZR : RADIAL, rim, null);
  d.size = size;
  if (assumed || digits === 5 || separator === DASH) d.assumptions.push(readAsNote(input.slice(start, sizeEnd), size, assumed ? RADIAL_ASSUMED : ""));
  d.spans.push({ part: "size", start, end: sizeEnd });
  if (prefix !== null) d.details.push({ detail: "prefix", start, end: widthAt });
  // One push each: a push of several items at once takes a slow path in V8.
  d.details.push({ detail: "sectionWidth", start: widthAt, end: widthAt + 3 });
  d.details.push({ detail: "aspectRatio", start: aspectAt, end: aspectEnd });
  if (marked) d.details.push({ detail: "construction", start: aspectEnd, end: rimAt });
  d.details.push({ detail: "rimDiameter", start: rimAt, end: sizeEnd });
  return sizeEnd;
}
/** A flotation size such as "33x12.50R15LT" at `start`, recorded as the size reader would; the index after it, or -1. */
export function readFlotationSize(input: string, d: Draft, start: number): number {
  const widthAt = start + 3;
  const times = codeAt(input, start + 2);
  if (digitsEnd(input, start) !== start + 2 || (upper(times) !== X && times !== MULTIPLICATION_SIGN)) return -1;
  let widthEnd = digitsEnd(input, widthAt);
  const point = widthEnd;
  if (codeAt(input, point) === POINT && isDigit(codeAt(input, point + 1))) widthEnd = digitsEnd(input, point + 1);
  const rimAt = widthEnd + 1;
  const rimEnd = rimAt + 2;
  const lt = upper(codeAt(input, rimEnd)) === L && upper(codeAt(input, rimEnd + 1)) === T;
  const sizeEnd = lt ? rimEnd + 2 : rimEnd;
  const shape = widthEnd > widthAt && upper(codeAt(input, widthEnd)) === R && digitsEnd(input, rimAt) === rimEnd && (sizeEnd === input.length || isSpace(input.charCodeAt(sizeEnd)));
  if (!shape || widthEnd - point > 3) return -1;
  const diameter = valueOf(input, start, start + 2);
  // Hundredths over 100 is the double nearest the decimal, as Number("12.50") is, without parsing a slice.
  const decimals = Math.max(widthEnd - point - 1, 0);
  const width = (valueOf(input, widthAt, point) * 10 ** decimals + valueOf(input, point + 1, widthEnd)) / 10 ** decimals;
  const rim = valueOf(input, rimAt, rimEnd);
  const bounds = SIZE_BOUNDS;
  if (!inRange(diameter, bounds.flotationDiameterIn) || !inRange(width, bounds.flotationWidthIn) || !inRange(rim, bounds.rimDiameterIn) || diameter - rim < 2) return -1;
  if (!lt && startsShortOrLtWord(input, spacesEnd(input, sizeEnd))) return -1;
  d.size = makeSize("flotation", lt ? "LT" : null, width * MM_PER_INCH, null, RADIAL, rim, diameter);
  d.spans.push({ part: "size", start, end: sizeEnd });
  d.details.push({ detail: "overallDiameter", start, end: start + 2 });
  d.details.push({ detail: "sectionWidth", start: widthAt, end: widthEnd });
  d.details.push({ detail: "construction", start: widthEnd, end: rimAt });
  d.details.push({ detail: "rimDiameter", start: rimAt, end: rimEnd });
  if (lt) d.details.push({ detail: "prefix", start: rimEnd, end: sizeEnd });
  return sizeEnd;
}
