import { addMiss, type Draft, type Reader } from "./reader";
import { isDigit, isLetter, isSpace } from "./tokens";

/** A TIN has at most 13 symbols (49 CFR 574.5, since the April 2015 rule). */
const TIN_MAX_SYMBOLS = 13;
/** 9 symbols before the date code make a 13-symbol TIN, which starts with a 3-symbol plant code. */
const SYMBOLS_BEFORE_DATE_WITH_3_SYMBOL_PLANT = 9;
/** TIN symbols never include G, I, O, Q, S or Z (49 CFR 574.5, from memory). */
const NOT_TIN_SYMBOLS: ReadonlySet<number> = new Set([..."GIOQSZ"].map((letter) => letter.charCodeAt(0)));
/** Words that end a TIN when they follow it on the same line; only groups starting with a letter are looked up. */
const AFTER_TIN = new Set(["MAX", "MAXIMUM", "LOAD", "XL", "SL", "TREADWEAR", "TRACTION", "TEMPERATURE", "TEMP", "UTQG", "DOT", "TIN"]);

const [D, I, N, O, T] = [..."DINOT"].map((letter) => letter.charCodeAt(0));
/** Clearing bit 5 upper-cases an ASCII letter, and turns no other character into one. */
const upperAt = (input: string, at: number): number => (at < input.length ? input.charCodeAt(at) & ~32 : 0);
const isAlnum = (c: number): boolean => isDigit(c) || isLetter(c);

function hasNotTinSymbol(s: string): boolean {
  for (let i = 0; i < s.length; i++) if (NOT_TIN_SYMBOLS.has(s.charCodeAt(i))) return true;
  return false;
}

function allDigits(s: string): boolean {
  for (let i = 0; i < s.length; i++) if (!isDigit(s.charCodeAt(i))) return false;
  return s.length > 0;
}

/** The symbols in [from, end) in capitals; most codes are typed in capitals already. */
function symbolsAt(input: string, from: number, end: number): string {
  const text = input.slice(from, end);
  for (let i = from; i < end; i++) if (input.charCodeAt(i) >= 97) return text.toUpperCase();
  return text;
}

interface Group {
  text: string;
  end: number;
}

/** Space-separated symbol groups after the keyword, as long as they can still belong to one TIN. */
function tinGroups(input: string, from: number): Group[] {
  const groups: Group[] = [];
  let pos = from;
  let symbols = 0;
  while (pos < input.length) {
    let end = pos;
    while (end < input.length && isAlnum(input.charCodeAt(end))) end++;
    if (end === pos) break;
    const text = symbolsAt(input, pos, end);
    const after = input.charCodeAt(end);
    const closes = end === input.length || isSpace(after) || ",;.)".includes(input.charAt(end));
    if (!closes || symbols + text.length > TIN_MAX_SYMBOLS || (isLetter(input.charCodeAt(pos)) && AFTER_TIN.has(text))) break;
    groups.push({ text, end });
    symbols += text.length;
    pos = end;
    while (pos < input.length && isSpace(input.charCodeAt(pos))) pos++;
  }
  return groups;
}

function joined(groups: Group[], count: number): string {
  let text = "";
  for (let g = 0; g < count; g++) text += groups[g]?.text ?? "";
  return text;
}

/** Finds the date code: the last 4-digit group, else a final 3-digit group (before 2000), else 4 digits ending a run-together TIN. */
interface DateSplit {
  before: string;
  date: string;
  end: number;
}

function splitDate(groups: Group[]): DateSplit | null {
  for (let g = groups.length - 1; g >= 0; g--) {
    const group = groups[g] as Group;
    if (group.text.length === 4 && allDigits(group.text)) {
      return { before: joined(groups, g), date: group.text, end: group.end };
    }
  }
  const last = groups.at(-1);
  if (!last) return null;
  const before = joined(groups, groups.length - 1);
  if (last.text.length === 3 && allDigits(last.text)) return { before, date: last.text, end: last.end };
  const tail = last.text.slice(-4);
  if (last.text.length > 4 && allDigits(tail) && !allDigits(last.text)) {
    return { before: before + last.text.slice(0, -4), date: tail, end: last.end };
  }
  return null;
}

function skipToToken(r: Reader, i: number, pos: number): number {
  let k = i + 1;
  while (k < r.tokens.length && (r.tokens[k]?.start ?? pos) < pos) k++;
  return k;
}

/** The symbol groups after a "DOT" or "TIN" keyword starting at `keywordAt`. */
function groupsAfterKeyword(input: string, keywordAt: number): Group[] {
  let from = keywordAt + 3;
  while (from < input.length && (isSpace(input.charCodeAt(from)) || ":#-".includes(input.charAt(from)))) from++;
  return tinGroups(input, from);
}

/** Whether the letters at `at` start a DOT code, as the word "DOT…" or "TIN" does for the token reader. */
export function dotKeywordAt(input: string, at: number): boolean {
  const first = upperAt(input, at);
  const second = upperAt(input, at + 1);
  const third = upperAt(input, at + 2);
  if (first === D) return second === O && third === T;
  return first === T && second === I && third === N && !(at + 3 < input.length && isLetter(input.charCodeAt(at + 3)));
}

/** Records the date code found after the keyword at `start`: the code, or why it is left out. */
function recordDot(d: Draft, input: string, start: number, found: DateSplit): void {
  const week = Number(found.date.slice(0, 2));
  if (week < 1 || week > 53) {
    addMiss(
      d,
      `The date code ${found.date} in "${input.slice(start, found.end)}" does not read as a week and year: weeks run from 01 to 53.`,
      "Type the last group of the DOT code as marked, e.g. DOT 3208 for week 32 of 2008.",
    );
    d.spans.push({ part: "unread", start, end: found.end });
    return;
  }
  if (d.dot) {
    d.warnings.push(`A second DOT code, "${input.slice(start, found.end)}", is left out: only the first is read.`);
    d.spans.push({ part: "unread", start, end: found.end });
    return;
  }
  const threeDigit = found.date.length === 3;
  const before = found.before;
  const year = threeDigit ? 1990 + Number(found.date[2]) : 2000 + Number(found.date.slice(2));
  d.dot = {
    plantCode: before.slice(0, before.length === SYMBOLS_BEFORE_DATE_WITH_3_SYMBOL_PLANT ? 3 : 2),
    week,
    year,
    yearAmbiguous: threeDigit,
    tin: before + found.date,
  };
  if (threeDigit) {
    d.assumptions.push(`The three-digit date code ${found.date} is from before 2000 and gives only the last digit of the year: week ${week} of ${year} is assumed (it could be ${year - 10}).`);
  }
  if (hasNotTinSymbol(before)) {
    d.warnings.push(`The DOT code "${input.slice(start, found.end)}" contains a letter that TINs never use (G, I, O, Q, S or Z); check for a misread, such as O for 0.`);
  }
  d.spans.push({ part: "dot", start, end: found.end });
}

/**
 * A DOT code whose keyword starts at `at` and whose date code ends before whitespace or the end of the
 * text, recorded as the token reader would; the index after it, or 0 (nothing recorded) otherwise.
 */
export function readDotChunk(input: string, d: Draft, at: number): number {
  const found = splitDate(groupsAfterKeyword(input, at));
  if (!found || (found.end < input.length && !isSpace(input.charCodeAt(found.end)))) return 0;
  recordDot(d, input, at, found);
  return found.end;
}

/**
 * "DOT U2LL LMLR 3208" (49 CFR 574.5): plant code, size and optional codes, then the week and year
 * of manufacture. "DOT" may touch the symbols ("DOTU2LL…"); "TIN" works like "DOT".
 */
export function readDot(r: Reader, i: number): number {
  const t = r.tokens[i];
  if (t?.kind !== "word" || !(t.text.startsWith("DOT") || t.text === "TIN")) return 0;
  const input = r.input;
  const groups = groupsAfterKeyword(input, t.start);
  const found = splitDate(groups);
  if (!found) {
    if (t.text.length > 3) return 0;
    const end = groups.at(-1)?.end ?? t.end;
    addMiss(
      r.draft,
      `"${input.slice(t.start, end)}" has no date code.`,
      "The date code is the last group of the DOT code: four digits, week then year (3208 = week 32 of 2008).",
    );
    r.draft.spans.push({ part: "unread", start: t.start, end });
    return skipToToken(r, i, end);
  }
  recordDot(r.draft, input, t.start, found);
  return skipToToken(r, i, found.end);
}
