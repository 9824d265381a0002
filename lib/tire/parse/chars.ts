/** Reading text character by character, for the shortcuts that read common markings without tokens. */
import { isLetter, isSpace } from "./tokens";

/** Reading past the end of a string is slow: 0 there instead. */
export const codeAt = (input: string, at: number): number => (at < input.length ? input.charCodeAt(at) : 0);
export const upper = (c: number): number => (c >= 97 && c <= 122 ? c - 32 : c);
export const [F, L, M, P, R, S, T, X, Y, Z] = [..."FLMPRSTXYZ"].map((letter) => letter.charCodeAt(0));
export const [SLASH, POINT, DASH, OPEN, CLOSE, PLUS, AMPERSAND, THREE] = [..."/.-()+&3"].map((mark) => mark.charCodeAt(0));

/** The number the digits in [from, to) write. */
export function valueOf(input: string, from: number, to: number): number {
  let value = 0;
  for (let k = from; k < to; k++) value = value * 10 + input.charCodeAt(k) - 48;
  return value;
}

export function spacesEnd(input: string, at: number): number {
  while (at < input.length && isSpace(input.charCodeAt(at))) at++;
  return at;
}

export function letterRunEnd(input: string, at: number): number {
  while (at < input.length && isLetter(input.charCodeAt(at))) at++;
  return at;
}

/** The letters in [from, to) spell `word` (in capitals) in any case. */
export function spells(input: string, from: number, to: number, word: string): boolean {
  if (to - from !== word.length) return false;
  for (let i = from; i < to; i++) if (upper(input.charCodeAt(i)) !== word.charCodeAt(i - from)) return false;
  return true;
}

/** Whether each ASCII character is one of `chars`, by its code: a look-up cheaper than a Set's in a loop over characters. */
export function asciiTable(chars: string): Uint8Array {
  const table = new Uint8Array(128);
  for (let i = 0; i < chars.length; i++) table[chars.charCodeAt(i)] = 1;
  return table;
}

export const isIn = (table: Uint8Array, c: number): boolean => c < 128 && table[c] === 1;
