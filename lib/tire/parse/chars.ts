/** Reading text character by character, for the shortcuts that read common markings without tokens. */
import { isSpace } from "./tokens";

/** Reading past the end of a string is slow: 0 there instead. */
export const codeAt = (input: string, at: number): number => (at < input.length ? input.charCodeAt(at) : 0);
export const upper = (c: number): number => (c >= 97 && c <= 122 ? c - 32 : c);
export const [L, P, R, S, T, X, Y, Z] = [..."LPRSTXYZ"].map((letter) => letter.charCodeAt(0));
export const [SLASH, POINT, DASH, OPEN, CLOSE] = [..."/.-()"].map((mark) => mark.charCodeAt(0));

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
