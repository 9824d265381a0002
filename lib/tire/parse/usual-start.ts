import { LOAD_INDEX_MAX } from "../load-index";
import { speedSymbolInfo } from "../speed-symbols";
import type { SizePrefix } from "../types";
import { MM_PER_INCH } from "../units";
import { dotKeywordAt, readDotChunk } from "./dot";
import type { Draft } from "./reader";
import { MAX_DUAL_GAP, serviceDescription } from "./service";
import { CONSTRUCTION_CODES, inRange, makeSize, RADIAL, SIZE_BOUNDS, type ConstructionCode } from "./size-parts";
import { TRACTION } from "./utqg";
import { digitsEnd, isDigit, isLetter, isSpace, MULTIPLICATION_SIGN } from "./tokens";

const [L, P, R, S, T, X, Y, Z] = [..."LPRSTXYZ"].map((letter) => letter.charCodeAt(0));
const SLASH = 47;
const POINT = 46;
const OPEN = 40;
const CLOSE = 41;
const ZERO = 48;
const ZR = CONSTRUCTION_CODES.get("ZR") as ConstructionCode;
/** The speed symbols written as one letter, by the letter's code; "(Y)" apart. */
const ONE_LETTER_SPEEDS = Array.from({ length: 91 }, (_, code) => speedSymbolInfo(String.fromCharCode(code)));
/** Speed letters that are also a UTQG traction grade, or a construction code, by the letter's code. */
const ALSO_GRADE = ONE_LETTER_SPEEDS.map((info) => info !== undefined && TRACTION.has(info.symbol));
const ALSO_CONSTRUCTION = ONE_LETTER_SPEEDS.map((info) => info !== undefined && CONSTRUCTION_CODES.has(info.symbol));
const ABOVE_300 = speedSymbolInfo("(Y)");

/** Reading past the end of a string is slow: 0 there instead. */
const codeAt = (input: string, at: number): number => (at < input.length ? input.charCodeAt(at) : 0);
const upper = (c: number): number => (c >= 97 && c <= 122 ? c - 32 : c);

function valueOf(input: string, from: number, to: number): number {
  let value = 0;
  for (let k = from; k < to; k++) value = value * 10 + input.charCodeAt(k) - ZERO;
  return value;
}

function spacesEnd(input: string, at: number): number {
  while (at < input.length && isSpace(input.charCodeAt(at))) at++;
  return at;
}

/**
 * A word that can change how what stands before it is read: one letter (a load range, a "C", a UTQG
 * grade, the "×" of a flotation size) or a trailing "LT".
 */
function startsShortOrLtWord(input: string, at: number): boolean {
  const c = codeAt(input, at);
  if (c === MULTIPLICATION_SIGN) return true;
  if (!isLetter(c)) return false;
  const next = codeAt(input, at + 1);
  return !isLetter(next) || (upper(c) === L && upper(next) === T);
}

/** A service description standing alone at `at`, as the service reader would record it; the index after it, or 0. */
function readService(input: string, d: Draft, at: number): number {
  const singleEnd = digitsEnd(input, at);
  if (singleEnd === at || singleEnd - at > 3) return 0;
  const single = valueOf(input, at, singleEnd);
  let dual: number | null = null;
  let speedAt = singleEnd;
  if (codeAt(input, singleEnd) === SLASH) {
    const dualEnd = digitsEnd(input, singleEnd + 1);
    if (dualEnd === singleEnd + 1 || dualEnd - singleEnd > 4) return 0;
    dual = valueOf(input, singleEnd + 1, dualEnd);
    // A dual index above the single one gets a warning: the token readers write it.
    if (dual > single || single - dual > MAX_DUAL_GAP) return 0;
    speedAt = dualEnd;
  }
  const bracketed = codeAt(input, speedAt) === OPEN;
  const letter = bracketed ? 0 : upper(codeAt(input, speedAt));
  const info = bracketed
    ? upper(codeAt(input, speedAt + 1)) === Y && codeAt(input, speedAt + 2) === CLOSE ? ABOVE_300 : undefined
    : ONE_LETTER_SPEEDS[letter];
  const end = bracketed ? speedAt + 3 : speedAt + 1;
  if (info === undefined || single > LOAD_INDEX_MAX || (end < input.length && !isSpace(input.charCodeAt(end)))) return 0;
  // "100B C" reads as UTQG grades, "116R 20" as a size: what follows decides, so the token readers read those.
  const restAt = spacesEnd(input, end);
  if ((ALSO_GRADE[letter] && startsShortOrLtWord(input, restAt)) || (ALSO_CONSTRUCTION[letter] && isDigit(codeAt(input, restAt)))) return 0;
  d.service = serviceDescription(single, dual, info);
  d.spans.push({ part: "service", start: at, end });
  d.details.push({ detail: "loadIndex", start: at, end: singleEnd });
  if (dual !== null) d.details.push({ detail: "loadIndexDual", start: singleEnd + 1, end: speedAt });
  d.details.push({ detail: "speedSymbol", start: speedAt, end });
  return end;
}

/** A standard metric size at `start`, recorded as the size reader would; the index after it, or -1. */
function readMetricSize(input: string, d: Draft, start: number): number {
  const first = upper(codeAt(input, start));
  const twoLetters = upper(codeAt(input, start + 1)) === T && (first === L || first === S);
  const prefix: SizePrefix | null = first === P ? "P" : first === T ? "T" : twoLetters ? (first === L ? "LT" : "ST") : null;
  const widthAt = start + (prefix?.length ?? 0);
  const aspectAt = widthAt + 4;
  const zr = upper(codeAt(input, aspectAt + 2)) === Z;
  const rimAt = aspectAt + (zr ? 4 : 3);
  const sizeEnd = rimAt + 2;
  const shape =
    codeAt(input, widthAt + 3) === SLASH && digitsEnd(input, widthAt) === widthAt + 3 && digitsEnd(input, aspectAt) === aspectAt + 2 &&
    upper(codeAt(input, rimAt - 1)) === R && digitsEnd(input, rimAt) === sizeEnd && (sizeEnd === input.length || isSpace(input.charCodeAt(sizeEnd)));
  if (!shape) return -1;
  const width = valueOf(input, widthAt, widthAt + 3);
  const aspect = valueOf(input, aspectAt, aspectAt + 2);
  const rim = valueOf(input, rimAt, sizeEnd);
  const restAt = spacesEnd(input, sizeEnd);
  if (!inRange(width, SIZE_BOUNDS.sectionWidthMm) || !inRange(aspect, SIZE_BOUNDS.aspectRatio) || !inRange(rim, SIZE_BOUNDS.rimDiameterIn)) return -1;
  // A trailing "LT", "C" or load range letter belongs to the size.
  if (startsShortOrLtWord(input, restAt)) return -1;
  d.size = makeSize("metric", prefix, width, aspect, zr ? ZR : RADIAL, rim, null);
  d.spans.push({ part: "size", start, end: sizeEnd });
  if (prefix !== null) d.details.push({ detail: "prefix", start, end: widthAt });
  // One push each: a push of several items at once takes a slow path in V8.
  d.details.push({ detail: "sectionWidth", start: widthAt, end: widthAt + 3 });
  d.details.push({ detail: "aspectRatio", start: aspectAt, end: aspectAt + 2 });
  d.details.push({ detail: "construction", start: aspectAt + 2, end: rimAt });
  d.details.push({ detail: "rimDiameter", start: rimAt, end: sizeEnd });
  return sizeEnd;
}

/** A flotation size such as "33x12.50R15LT" at `start`, recorded as the size reader would; the index after it, or -1. */
function readFlotationSize(input: string, d: Draft, start: number): number {
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

/**
 * Reads the start most markings share straight from the characters: a metric size in the standard
 * form ("285/50R20", "LT265/70ZR17") or a flotation size ("33x12.50R15LT"), perhaps followed by a
 * service description ("119S", "121/118S", "99(Y)"), and a DOT code there or at the start. It records
 * exactly what the token readers would and returns where the rest of the text starts, for them; -1
 * (nothing recorded) when the text starts otherwise.
 */
export function readUsualStart(input: string, d: Draft): number {
  const start = spacesEnd(input, 0);
  const metricEnd = readMetricSize(input, d, start);
  const sizeEnd = metricEnd < 0 ? readFlotationSize(input, d, start) : metricEnd;
  const serviceAt = sizeEnd < 0 ? sizeEnd : spacesEnd(input, sizeEnd);
  const end = (serviceAt > sizeEnd && readService(input, d, serviceAt)) || sizeEnd;
  const next = end < 0 ? start : spacesEnd(input, end);
  if (next === end || !dotKeywordAt(input, next)) return end;
  return readDotChunk(input, d, next) || end;
}
