/**
 * The marks that most often follow the usual start, read straight from the characters exactly as
 * their token readers read them: "XL", "SL", "RF", "M+S", "MS", "3PMSF", "LOAD RANGE E", a ply rating
 * ("10PR"), a DOT code and UTQG grades ("TREADWEAR 500", "TRACTION A", "TEMPERATURE B", "500 A A",
 * "500AA A", "UTQG 500 B C"). Each mark must stand between whitespace; at anything else the token
 * readers take over, so a shortcut never has to decide what its neighbours mean.
 */
import type { TemperatureGrade, TractionGrade } from "../types";
import { AMPERSAND, codeAt, F, L, letterRunEnd, M, PLUS, R, S, SLASH, spacesEnd, spells, THREE, upper, valueOf, X } from "./chars";
import { dotKeywordAt, readDotChunk } from "./dot";
import { recordLoadRange, recordLoadType, recordPlyRating, recordRf, recordWinter } from "./marks";
import type { Draft } from "./reader";
import { digitsEnd, isSpace, MULTIPLICATION_SIGN, shortWord } from "./tokens";
import { recordGrades, recordTemperature, recordTraction, recordTreadwear, TEMPERATURE, TRACTION } from "./utqg";

/** A mark ends at whitespace or at the end of the text, where its token reader's would end too. */
const endsMark = (input: string, at: number): boolean => at === input.length || isSpace(input.charCodeAt(at));

/** "XL", "SL", "RF" or "MS" in [at, end); the index after it, or 0. */
function readTwoLetterMark(input: string, d: Draft, at: number, end: number): number {
  const first = upper(input.charCodeAt(at));
  const second = upper(input.charCodeAt(at + 1));
  if (second === L && (first === X || first === S)) recordLoadType(d, first === X ? "XL" : "SL", at, end);
  else if (first === R && second === F) recordRf(d, at, end);
  else if (first === M && second === S) recordWinter(d, "mudAndSnow", at, end);
  else return 0;
  return end;
}

/** "M+S", "M/S" or "M&S" at `at`. */
function readMudAndSnowSign(input: string, d: Draft, at: number): number {
  const sign = codeAt(input, at + 1);
  const end = at + 3;
  if ((sign !== PLUS && sign !== SLASH && sign !== AMPERSAND) || upper(codeAt(input, at + 2)) !== S || !endsMark(input, end)) return 0;
  recordWinter(d, "mudAndSnow", at, end);
  return end;
}

/** "LOAD RANGE E", the word LOAD in [at, loadEnd). */
function readLoadRangeWords(input: string, d: Draft, at: number, loadEnd: number): number {
  const rangeAt = spacesEnd(input, loadEnd);
  const rangeEnd = letterRunEnd(input, rangeAt);
  const letterAt = spacesEnd(input, rangeEnd);
  const end = letterAt + 1;
  if (!spells(input, rangeAt, rangeEnd, "RANGE") || letterAt === rangeEnd || letterRunEnd(input, letterAt) !== end || !endsMark(input, end)) return 0;
  recordLoadRange(d, shortWord(input, letterAt, end), at, end);
  return end;
}

/** A grade after its word in [at, end): "TREADWEAR 500", "TRACTION AA", "TEMPERATURE A", "TEMP A". */
function readGradeWord(input: string, d: Draft, at: number, end: number): number {
  const valueAt = spacesEnd(input, end);
  if (spells(input, at, end, "TREADWEAR")) {
    const valueEnd = digitsEnd(input, valueAt);
    if (valueEnd === valueAt || !endsMark(input, valueEnd)) return 0;
    recordTreadwear(d, valueOf(input, valueAt, valueEnd), at, valueEnd);
    return valueEnd;
  }
  const gradeEnd = letterRunEnd(input, valueAt);
  if (gradeEnd === valueAt || gradeEnd - valueAt > 2 || !endsMark(input, gradeEnd)) return 0;
  const grade = shortWord(input, valueAt, gradeEnd);
  if (spells(input, at, end, "TRACTION") && TRACTION.has(grade)) recordTraction(d, grade as TractionGrade, at, gradeEnd);
  else if ((spells(input, at, end, "TEMPERATURE") || spells(input, at, end, "TEMP")) && TEMPERATURE.has(grade)) {
    recordTemperature(d, grade as TemperatureGrade, at, gradeEnd);
  } else return 0;
  return gradeEnd;
}

/**
 * A treadwear number of 2 to 4 digits then the traction and temperature grades ("500 A A", "500 AA A",
 * "500AA A", "500 AB"), split as the UTQG reader splits its words; the index after them, or 0.
 */
function readGrades(input: string, d: Draft, at: number): number {
  const numberEnd = digitsEnd(input, at);
  const firstAt = spacesEnd(input, numberEnd);
  const firstEnd = letterRunEnd(input, firstAt);
  const secondAt = spacesEnd(input, firstEnd);
  const secondEnd = letterRunEnd(input, secondAt);
  const digits = numberEnd - at;
  const first = firstEnd - firstAt;
  // "×" is a word of its own to the token reader, which would take it for a grade.
  if (digits < 2 || digits > 4 || first === 0 || first > 3 || codeAt(input, secondAt) === MULTIPLICATION_SIGN) return 0;
  const apart = first <= 2 && secondAt > firstEnd && secondEnd - secondAt === 1;
  if (!apart && first === 1) return 0;
  const temperatureAt = apart ? secondAt : firstEnd - 1;
  const end = apart ? secondEnd : firstEnd;
  if (!endsMark(input, end)) return 0;
  const traction = shortWord(input, firstAt, apart ? firstEnd : firstEnd - 1);
  const temperature = shortWord(input, temperatureAt, temperatureAt + 1);
  if (!TRACTION.has(traction) || !TEMPERATURE.has(temperature)) return 0;
  recordGrades(d, valueOf(input, at, numberEnd), traction as TractionGrade, temperature as TemperatureGrade, at, end);
  return end;
}

/** "UTQG 500 A A", the word UTQG in [at, end). The grades' part comes first, as the token reader records it. */
function readUtqgThenGrades(input: string, d: Draft, at: number, end: number): number {
  const next = readGrades(input, d, spacesEnd(input, end));
  if (next > 0) d.spans.push({ part: "utqg", start: at, end });
  return next;
}

/** A ply rating "10PR" of one or two digits; left to the token reader when "RATING" follows or the number is unusual. */
function readPlyRatingAt(input: string, d: Draft, at: number): number {
  const numberEnd = digitsEnd(input, at);
  const end = letterRunEnd(input, numberEnd);
  const value = valueOf(input, at, numberEnd);
  const ratingAt = spacesEnd(input, end);
  if (numberEnd - at > 2 || !spells(input, numberEnd, end, "PR") || !endsMark(input, end) || value < 2 || value > 40) return 0;
  if (spells(input, ratingAt, letterRunEnd(input, ratingAt), "RATING")) return 0;
  recordPlyRating(d, input, value, at, end);
  return end;
}

/** "3PMSF". */
function readThreePeakSign(input: string, d: Draft, at: number): number {
  const end = letterRunEnd(input, at + 1);
  if (input.charCodeAt(at) !== THREE || !spells(input, at + 1, end, "PMSF") || !endsMark(input, end)) return 0;
  recordWinter(d, "threePeak", at, end);
  return end;
}

/** One mark at `at`, recorded as its token reader would; the index after it, or 0 to leave the rest to the token readers. */
function readMark(input: string, d: Draft, at: number): number {
  if (dotKeywordAt(input, at)) return readDotChunk(input, d, at);
  const end = letterRunEnd(input, at);
  if (end === at) return readThreePeakSign(input, d, at) || readPlyRatingAt(input, d, at) || readGrades(input, d, at);
  if (end - at === 1) return upper(input.charCodeAt(at)) === M ? readMudAndSnowSign(input, d, at) : 0;
  if (!endsMark(input, end)) return 0;
  if (end - at === 2) return readTwoLetterMark(input, d, at, end);
  if (spells(input, at, end, "LOAD")) return readLoadRangeWords(input, d, at, end);
  if (spells(input, at, end, "UTQG")) return readUtqgThenGrades(input, d, at, end);
  return readGradeWord(input, d, at, end);
}

/**
 * Reads the usual marks one after another from `from` (where the usual start ended, or the start of
 * the text) and returns where the first text that is not one of them starts, for the token readers.
 */
export function readUsualMarks(input: string, d: Draft, from: number): number {
  let end = from;
  for (;;) {
    const at = spacesEnd(input, end);
    if (at === input.length || (at === end && end > 0)) return end;
    const next = readMark(input, d, at);
    if (next === 0) return end;
    end = next;
  }
}
