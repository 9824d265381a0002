import { LOAD_INDEX_MAX } from "../load-index";
import { speedSymbolInfo } from "../speed-symbols";
import type { SizePrefix } from "../types";
import { dotKeywordAt, readDotChunk } from "./dot";
import type { Draft } from "./reader";
import { MAX_DUAL_GAP, serviceDescription } from "./service";
import { CONSTRUCTION_CODES, inRange, makeSize, RADIAL, SIZE_BOUNDS, type ConstructionCode } from "./size-parts";
import { TRACTION } from "./utqg";
import { digitsEnd, isDigit, isLetter, isSpace, MULTIPLICATION_SIGN } from "./tokens";

const [L, P, R, S, T, Y, Z] = [..."LPRSTYZ"].map((letter) => letter.charCodeAt(0));
const SLASH = 47;
const OPEN = 40;
const CLOSE = 41;
const ZERO = 48;
const ZR = CONSTRUCTION_CODES.get("ZR") as ConstructionCode;
/** The speed symbols written as one letter, by the letter's code; "(Y)" apart. */
const ONE_LETTER_SPEEDS = Array.from({ length: 91 }, (_, code) => speedSymbolInfo(String.fromCharCode(code)));
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
  const info = bracketed
    ? upper(codeAt(input, speedAt + 1)) === Y && codeAt(input, speedAt + 2) === CLOSE ? ABOVE_300 : undefined
    : ONE_LETTER_SPEEDS[upper(codeAt(input, speedAt))];
  const end = bracketed ? speedAt + 3 : speedAt + 1;
  if (info === undefined || single > LOAD_INDEX_MAX || (end < input.length && !isSpace(input.charCodeAt(end)))) return 0;
  // "100B C" reads as UTQG grades, "116R 20" as a size: what follows decides, so the token readers read those.
  const restAt = spacesEnd(input, end);
  if (TRACTION.has(info.symbol) && startsShortOrLtWord(input, restAt)) return 0;
  if (CONSTRUCTION_CODES.has(info.symbol) && isDigit(codeAt(input, restAt))) return 0;
  d.service = serviceDescription(single, dual, info);
  d.spans.push({ part: "service", start: at, end });
  d.details.push({ detail: "loadIndex", start: at, end: singleEnd });
  if (dual !== null) d.details.push({ detail: "loadIndexDual", start: singleEnd + 1, end: speedAt });
  d.details.push({ detail: "speedSymbol", start: speedAt, end });
  return end;
}

/** A standard metric size at `start`, recorded as the size reader would; the index after it, or -1. */
function readSize(input: string, d: Draft, start: number): number {
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

/**
 * Reads the start most markings share straight from the characters: a metric size in the standard
 * form ("285/50R20", "LT265/70ZR17"), perhaps followed by a service description ("119S", "121/118S",
 * "99(Y)"), and a DOT code there or at the start. It records exactly what the token readers would and
 * returns where the rest of the text starts, for them; -1 (nothing recorded) when the text starts otherwise.
 */
export function readUsualStart(input: string, d: Draft): number {
  const start = spacesEnd(input, 0);
  const sizeEnd = readSize(input, d, start);
  const serviceAt = sizeEnd < 0 ? sizeEnd : spacesEnd(input, sizeEnd);
  const end = (serviceAt > sizeEnd && readService(input, d, serviceAt)) || sizeEnd;
  const next = end < 0 ? start : spacesEnd(input, end);
  if (next === end || !dotKeywordAt(input, next)) return end;
  return readDotChunk(input, d, next) || end;
}
