import { asciiTable, isIn, spells, upper, valueOf } from "./chars";
import { addMiss, type Draft, type Reader } from "./reader";
import { isDigit, isLetter, isSpace } from "./tokens";

/** A TIN has at most 13 symbols (49 CFR 574.5, since the April 2015 rule). */
const TIN_MAX_SYMBOLS = 13;
/** 9 symbols before the date code make a 13-symbol TIN, which starts with a 3-symbol plant code. */
const SYMBOLS_BEFORE_DATE_WITH_3_SYMBOL_PLANT = 9;
/** TIN symbols never include G, I, O, Q, S or Z (49 CFR 574.5, from memory). */
const NOT_TIN_SYMBOLS = asciiTable("GIOQSZ");
/** Words that end a TIN when they follow it on the same line; only groups starting with a letter are looked up. */
const AFTER_TIN = ["MAX", "MAXIMUM", "LOAD", "XL", "SL", "TREADWEAR", "TRACTION", "TEMPERATURE", "TEMP", "UTQG", "DOT", "TIN"];
/** Marks that may close the last group of a TIN, besides whitespace and the end of the text. */
const CLOSING_MARKS = asciiTable(",;.)");
/** Marks that may stand between the keyword and the symbols ("DOT: …", "DOT# …", "TIN-…"). */
const KEYWORD_GAP_MARKS = asciiTable(":#-");

const [D, I, N, O, T] = [..."DINOT"].map((letter) => letter.charCodeAt(0));
/** Clearing bit 5 upper-cases an ASCII letter, and turns no other character into one. */
const upperAt = (input: string, at: number): number => (at < input.length ? input.charCodeAt(at) & ~32 : 0);
const isAlnum = (c: number): boolean => isDigit(c) || isLetter(c);

/**
 * Where the symbol groups of the TIN being read start and end, as pairs of character indices: a TIN
 * is read at a time and has at most 13 groups, so one buffer serves every reading.
 */
const groups = new Int32Array(2 * TIN_MAX_SYMBOLS);
const groupStart = (g: number): number => groups[2 * g] as number;
const groupEnd = (g: number): number => groups[2 * g + 1] as number;

function allDigits(input: string, from: number, to: number): boolean {
  for (let i = from; i < to; i++) if (!isDigit(input.charCodeAt(i))) return false;
  return to > from;
}

function isWordAfterTin(input: string, from: number, to: number): boolean {
  for (const word of AFTER_TIN) if (spells(input, from, to, word)) return true;
  return false;
}

/** Records the space-separated symbol groups from `from` on, as long as they can still belong to one TIN; their count. */
function readGroups(input: string, from: number): number {
  let count = 0;
  let pos = from;
  let symbols = 0;
  while (pos < input.length) {
    let end = pos;
    while (end < input.length && isAlnum(input.charCodeAt(end))) end++;
    if (end === pos) break;
    const after = end < input.length ? input.charCodeAt(end) : 0;
    const closes = end === input.length || isSpace(after) || isIn(CLOSING_MARKS, after);
    if (!closes || symbols + end - pos > TIN_MAX_SYMBOLS || (isLetter(input.charCodeAt(pos)) && isWordAfterTin(input, pos, end))) break;
    groups[2 * count] = pos;
    groups[2 * count + 1] = end;
    count++;
    symbols += end - pos;
    pos = end;
    while (pos < input.length && isSpace(input.charCodeAt(pos))) pos++;
  }
  return count;
}

/** The symbol groups after a "DOT" or "TIN" keyword starting at `keywordAt`; their count. */
function readGroupsAfterKeyword(input: string, keywordAt: number): number {
  let from = keywordAt + 3;
  while (from < input.length && (isSpace(input.charCodeAt(from)) || isIn(KEYWORD_GAP_MARKS, input.charCodeAt(from)))) from++;
  return readGroups(input, from);
}

/**
 * The group that ends with the date code: the last 4-digit group, else a final 3-digit group (before
 * 2000), else a final group ending in 4 digits after a letter (a TIN typed run together); -1 for none.
 */
function dateGroup(input: string, count: number): number {
  for (let g = count - 1; g >= 0; g--) if (groupEnd(g) - groupStart(g) === 4 && allDigits(input, groupStart(g), groupEnd(g))) return g;
  const last = count - 1;
  if (last < 0) return -1;
  const start = groupStart(last);
  const end = groupEnd(last);
  if (end - start === 3 && allDigits(input, start, end)) return last;
  return end - start > 4 && allDigits(input, end - 4, end) && !allDigits(input, start, end) ? last : -1;
}

/** Where the date code in group `g` starts: the whole group, or its last 4 digits when the TIN runs together. */
const dateStart = (g: number): number => (groupEnd(g) - groupStart(g) > 4 ? groupEnd(g) - 4 : groupStart(g));

/**
 * The first `count` symbols of the TIN, in capitals and without spaces. Read from the text rather than
 * from a TIN joined already: a joined string of 13 symbols is a rope, slow to read character by character.
 */
function tinSymbols(input: string, count: number): string {
  let symbols = "";
  let lower = false;
  for (let g = 0; count > 0; g++) {
    const start = groupStart(g);
    const end = Math.min(groupEnd(g), start + count);
    for (let i = start; i < end && !lower; i++) lower = input.charCodeAt(i) >= 97;
    symbols += input.slice(start, end);
    count -= end - start;
  }
  return lower ? symbols.toUpperCase() : symbols;
}

/** Whether a symbol before the date code, which ends group `g`, is one a TIN never uses. */
function hasNotTinSymbol(input: string, g: number, dateAt: number): boolean {
  for (let k = 0; k <= g; k++) {
    const end = k === g ? dateAt : groupEnd(k);
    for (let i = groupStart(k); i < end; i++) if (isIn(NOT_TIN_SYMBOLS, upper(input.charCodeAt(i)))) return true;
  }
  return false;
}

/** Records the date code ending group `g` of the TIN after the keyword at `start`: the code, or why it is left out. */
function recordDot(d: Draft, input: string, start: number, g: number): void {
  const dateAt = dateStart(g);
  const end = groupEnd(g);
  const week = valueOf(input, dateAt, dateAt + 2);
  if (week < 1 || week > 53) {
    addMiss(
      d,
      `The date code ${input.slice(dateAt, end)} in "${input.slice(start, end)}" does not read as a week and year: weeks run from 01 to 53.`,
      "Type the last group of the DOT code as marked, e.g. DOT 3208 for week 32 of 2008.",
    );
    d.spans.push({ part: "unread", start, end });
    return;
  }
  if (d.dot) {
    d.warnings.push(`A second DOT code, "${input.slice(start, end)}", is left out: only the first is read.`);
    d.spans.push({ part: "unread", start, end });
    return;
  }
  const threeDigit = end - dateAt === 3;
  const year = threeDigit ? 1990 + valueOf(input, dateAt + 2, end) : 2000 + valueOf(input, dateAt + 2, end);
  let symbolsThroughDate = 0;
  for (let k = 0; k <= g; k++) symbolsThroughDate += groupEnd(k) - groupStart(k);
  const symbolsBefore = symbolsThroughDate - (end - dateAt);
  const plantSymbols = symbolsBefore === SYMBOLS_BEFORE_DATE_WITH_3_SYMBOL_PLANT ? 3 : 2;
  const plantCode = tinSymbols(input, Math.min(plantSymbols, symbolsBefore));
  d.dot = { plantCode, week, year, yearAmbiguous: threeDigit, tin: tinSymbols(input, symbolsThroughDate) };
  if (threeDigit) {
    const date = input.slice(dateAt, end);
    d.assumptions.push(`The three-digit date code ${date} is from before 2000 and gives only the last digit of the year: week ${week} of ${year} is assumed (it could be ${year - 10}).`);
  }
  if (hasNotTinSymbol(input, g, dateAt)) {
    d.warnings.push(`The DOT code "${input.slice(start, end)}" contains a letter that TINs never use (G, I, O, Q, S or Z); check for a misread, such as O for 0.`);
  }
  d.spans.push({ part: "dot", start, end });
}

function skipToToken(r: Reader, i: number, pos: number): number {
  let k = i + 1;
  while (k < r.tokens.length && (r.tokens[k]?.start ?? pos) < pos) k++;
  return k;
}

/** Whether the letters at `at` start a DOT code, as the word "DOT…" or "TIN" does for the token reader. */
export function dotKeywordAt(input: string, at: number): boolean {
  const first = upperAt(input, at);
  const second = upperAt(input, at + 1);
  const third = upperAt(input, at + 2);
  if (first === D) return second === O && third === T;
  return first === T && second === I && third === N && !(at + 3 < input.length && isLetter(input.charCodeAt(at + 3)));
}

/**
 * A DOT code whose keyword starts at `at` and whose date code ends before whitespace or the end of the
 * text, recorded as the token reader would; the index after it, or 0 (nothing recorded) otherwise.
 */
export function readDotChunk(input: string, d: Draft, at: number): number {
  const g = dateGroup(input, readGroupsAfterKeyword(input, at));
  const end = g < 0 ? 0 : groupEnd(g);
  if (g < 0 || (end < input.length && !isSpace(input.charCodeAt(end)))) return 0;
  recordDot(d, input, at, g);
  return end;
}

/**
 * "DOT U2LL LMLR 3208" (49 CFR 574.5): plant code, size and optional codes, then the week and year
 * of manufacture. "DOT" may touch the symbols ("DOTU2LL…"); "TIN" works like "DOT".
 */
export function readDot(r: Reader, i: number): number {
  const t = r.tokens[i];
  if (t?.kind !== "word" || !(t.text.startsWith("DOT") || t.text === "TIN")) return 0;
  const input = r.input;
  const count = readGroupsAfterKeyword(input, t.start);
  const g = dateGroup(input, count);
  if (g < 0) {
    if (t.text.length > 3) return 0;
    const end = count > 0 ? groupEnd(count - 1) : t.end;
    addMiss(
      r.draft,
      `"${input.slice(t.start, end)}" has no date code.`,
      "The date code is the last group of the DOT code: four digits, week then year (3208 = week 32 of 2008).",
    );
    r.draft.spans.push({ part: "unread", start: t.start, end });
    return skipToToken(r, i, end);
  }
  const end = groupEnd(g);
  recordDot(r.draft, input, t.start, g);
  return skipToToken(r, i, end);
}
