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
const MULTIPLICATION_SIGN = 0xd7;
const isDash = (c: number): boolean => (c >= 0x2010 && c <= 0x2015) || c === 0x2212;

function digitsEnd(input: string, i: number): number {
  while (i < input.length && isDigit(input.charCodeAt(i))) i++;
  return i;
}

/** Splits text into numbers, ASCII letter runs, single punctuation marks and runs of anything else. */
export function tokenize(input: string): Token[] {
  const tokens: Token[] = [];
  const n = input.length;
  let gap = false;
  let i = 0;
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
      text = input.slice(start, i);
      if (input.charCodeAt(i) === 46 && isDigit(input.charCodeAt(i + 1))) {
        i = digitsEnd(input, i + 1);
        text = input.slice(start, i);
        plain = false;
        value = Number(text);
      } else if (input.charCodeAt(i) === 44) {
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
      text = lower ? input.slice(start, i).toUpperCase() : input.slice(start, i);
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
