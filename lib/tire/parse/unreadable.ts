import { speedSymbolInfo } from "../speed-symbols";
import type { DecodeError } from "../types";
import type { Reader } from "./reader";

const EXAMPLE = "Type what the sidewall shows, e.g. 205/55R16 91V; a DOT code, UTQG grades or M+S may follow.";

function quoted(text: string): string {
  const t = text.trim();
  return `"${t.length > 40 ? `${t.slice(0, 39)}…` : t}"`;
}

/** The error for text in which nothing could be read, saying what came closest. */
export function unreadableError(r: Reader): DecodeError {
  const text = r.input.trim();
  if (text === "") return { code: "unreadable", message: "There is nothing to read: the text is empty.", suggestion: EXAMPLE };
  const miss = r.draft.misses[0];
  if (miss) return { code: "unreadable", message: miss.message, suggestion: miss.suggestion };
  const upper = text.toUpperCase();
  const speed = speedSymbolInfo(upper);
  if (speed) {
    return {
      code: "unreadable",
      message: `"${text}" alone is not a full marking.`,
      suggestion: `${upper} is a speed symbol (${speed.kmh} km/h, ${speed.mph} mph); type it after the load index, e.g. 91${upper}.`,
    };
  }
  if (/^\d{3,4}$/.test(text)) {
    return {
      code: "unreadable",
      message: `"${text}" alone is not a full marking.`,
      suggestion: `If ${text} is the date from a DOT code, type it after DOT: DOT ${text}.`,
    };
  }
  return { code: "unreadable", message: `Nothing in ${quoted(text)} reads as a tire marking.`, suggestion: EXAMPLE };
}
