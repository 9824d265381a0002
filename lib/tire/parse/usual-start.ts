import { LOAD_INDEX_MAX } from "../load-index";
import { speedSymbolInfo } from "../speed-symbols";
import { CLOSE, codeAt, OPEN, SLASH, spacesEnd, upper, valueOf, Y } from "./chars";
import { dotKeywordAt, readDotChunk } from "./dot";
import type { Draft } from "./reader";
import { MAX_DUAL_GAP, serviceDescription } from "./service";
import { CONSTRUCTION_CODES } from "./size-parts";
import { digitsEnd, isDigit, isSpace } from "./tokens";
import { readFlotationSize, readMetricSize, startsShortOrLtWord } from "./usual-size";
import { TRACTION } from "./utqg";

/** The speed symbols written as one letter, by the letter's code; "(Y)" apart. */
const ONE_LETTER_SPEEDS = Array.from({ length: 91 }, (_, code) => speedSymbolInfo(String.fromCharCode(code)));
/** Speed letters that are also a UTQG traction grade, or a construction code, by the letter's code. */
const ALSO_GRADE = ONE_LETTER_SPEEDS.map((info) => info !== undefined && TRACTION.has(info.symbol));
const ALSO_CONSTRUCTION = ONE_LETTER_SPEEDS.map((info) => info !== undefined && CONSTRUCTION_CODES.has(info.symbol));
const ABOVE_300 = speedSymbolInfo("(Y)");

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

/**
 * Reads the start most markings share straight from the characters: a metric size ("285/50R20",
 * "LT265/70ZR17", or a forgiving "285 50 20") or a flotation size ("33x12.50R15LT"), perhaps followed
 * by a service description ("119S", "121/118S", "99(Y)"), and a DOT code there or at the start. It
 * records exactly what the token readers would and returns where the rest of the text starts, for
 * them; -1 (nothing recorded) when the text starts otherwise.
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
