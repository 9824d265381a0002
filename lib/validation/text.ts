import { z } from "zod";
import { CONTROL_CHARACTER_MESSAGE, hasControlCharacters } from "./text-rules";

/**
 * A one-line text field (names, searches, filters): refuses every control character. `typeError`
 * is the message for a value that is not text at all.
 */
export function lineText(typeError?: string) {
  return z.string(typeError ? { error: typeError } : undefined).refine((text) => !hasControlCharacters(text), { message: CONTROL_CHARACTER_MESSAGE });
}

/** A multi-line text field (notes, messages, the tires asked about): tabs and line breaks are fine. */
export function multiLineText(typeError?: string) {
  return z
    .string(typeError ? { error: typeError } : undefined)
    .refine((text) => !hasControlCharacters(text, { multiLine: true }), { message: CONTROL_CHARACTER_MESSAGE });
}
