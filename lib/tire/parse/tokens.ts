export type TokenKind = "num" | "word" | "punct" | "other";

export interface Token {
  kind: TokenKind;
  /** Words upper-cased; numbers without thousands separators. */
  text: string;
  start: number;
  end: number;
  /** Whitespace comes before this token. */
  gap: boolean;
  /** Numbers only; NaN for other tokens. */
  value: number;
  /** Numbers written with digits only (no decimal point, no thousands separator). */
  plain: boolean;
}

export const isDigit = (c: number): boolean => c >= 48 && c <= 57;
export const isLetter = (c: number): boolean => (c >= 65 && c <= 90) || (c >= 97 && c <= 122);
export const isSpace = (c: number): boolean => c <= 32 || c === 0xa0 || c === 0x3000 || (c >= 0x2000 && c <= 0x200b);
export const MULTIPLICATION_SIGN = 0xd7;
const isDash = (c: number): boolean => (c >= 0x2010 && c <= 0x2015) || c === 0x2212;

/**
 * Texts of short words and numbers, made once: most tokens are one of these, and a shared string is
 * not allocated again and keeps its hash for the look-ups that follow.
 */
const LETTERS = 26;
/** The same texts as property names return them, which the engine keeps once each and compares by reference. */
function internalized(texts: readonly string[]): string[] {
  return Object.keys(Object.fromEntries(texts.map((text) => [text, true])));
}
const SHORT_WORDS: readonly string[] = internalized(
  Array.from({ length: LETTERS + LETTERS * LETTERS }, (_, k) =>
    k < LETTERS ? String.fromCharCode(65 + k) : String.fromCharCode(65 + Math.floor((k - LETTERS) / LETTERS), 65 + ((k - LETTERS) % LETTERS)),
  ),
);
const NUMBER_TEXT_LIMIT = 10_000;
const NUMBER_TEXTS: (string | undefined)[] = new Array<string | undefined>(NUMBER_TEXT_LIMIT).fill(undefined);

const upperLetterIndex = (c: number): number => (c >= 97 ? c - 97 : c - 65);

/** Upper-cased text of the letter run [start, end). */
function wordText(input: string, start: number, end: number, lower: boolean): string {
  const length = end - start;
  if (length === 1) return SHORT_WORDS[upperLetterIndex(input.charCodeAt(start))] as string;
  if (length === 2) return SHORT_WORDS[LETTERS + upperLetterIndex(input.charCodeAt(start)) * LETTERS + upperLetterIndex(input.charCodeAt(start + 1))] as string;
  return lower ? input.slice(start, end).toUpperCase() : input.slice(start, end);
}

/** Upper-cased text of a run of one or two ASCII letters [start, end), shared. */
export const shortWord = (input: string, start: number, end: number): string => wordText(input, start, end, true);

/** Text of the digits [start, end) with value `value`; shared when it has no leading zero. */
function digitsText(input: string, start: number, end: number, value: number): string {
  if (value >= NUMBER_TEXT_LIMIT || (end - start > 1 && input.charCodeAt(start) === 48)) return input.slice(start, end);
  let text = NUMBER_TEXTS[value];
  if (text === undefined) NUMBER_TEXTS[value] = text = input.slice(start, end);
  return text;
}

export function digitsEnd(input: string, i: number): number {
  while (i < input.length && isDigit(input.charCodeAt(i))) i++;
  return i;
}

/** Splits text from `from` on into numbers, ASCII letter runs, single punctuation marks and runs of anything else. */
export function tokenize(input: string, from = 0): Token[] {
  const tokens: Token[] = [];
  const n = input.length;
  let gap = false;
  let i = from;
  while (i < n) {
    const c = input.charCodeAt(i);
    if (isSpace(c)) {
      gap = true;
      i++;
      continue;
    }
    const start = i;
    let kind: TokenKind;
    let text: string;
    let value = Number.NaN;
    let plain = false;
    if (isDigit(c)) {
      kind = "num";
      value = 0;
      for (; i < n && isDigit(input.charCodeAt(i)); i++) value = value * 10 + input.charCodeAt(i) - 48;
      plain = true;
      text = digitsText(input, start, i, value);
      // Reading past the end is slow: the character after a number is looked at only inside the text.
      const after = i < n ? input.charCodeAt(i) : 0;
      if (after === 46 && isDigit(input.charCodeAt(i + 1))) {
        i = digitsEnd(input, i + 1);
        text = input.slice(start, i);
        plain = false;
        value = Number(text);
      } else if (after === 44) {
        // Thousands separators: "2,998" but not "205,55".
        while (input.charCodeAt(i) === 44 && digitsEnd(input, i + 1) === i + 4) {
          text += input.slice(i + 1, i + 4);
          i += 4;
          plain = false;
        }
        value = Number(text);
      }
    } else if (isLetter(c)) {
      kind = "word";
      let lower = false;
      for (; i < n; i++) {
        const d = input.charCodeAt(i);
        if (!isLetter(d)) break;
        lower ||= d >= 97;
      }
      text = wordText(input, start, i, lower);
    } else if (c === MULTIPLICATION_SIGN) {
      kind = "word";
      text = "X";
      i++;
    } else if (c < 128 || isDash(c)) {
      kind = "punct";
      text = c < 128 ? input[i] ?? "" : "-";
      i++;
    } else {
      kind = "other";
      while (i < n) {
        const d = input.charCodeAt(i);
        if (d < 128 || isSpace(d) || isDash(d) || d === MULTIPLICATION_SIGN) break;
        i++;
      }
      text = input.slice(start, i);
    }
    tokens.push({ kind, text, start, end: i, gap, value, plain });
    gap = false;
  }
  return tokens;
}
