import { expect } from "vitest";
import { parseMarking, type Marking, type ParseOptions, type ParseResult } from "@/lib/tire";
import { parseMarkingByTokens } from "@/lib/tire/parse/parse-marking";

/** Parses text that must read; fails the test with the error otherwise. */
export function read(text: string, options?: ParseOptions): Marking {
  const r: ParseResult = parseMarking(text, options);
  if (!r.ok) expect.fail(`"${text}" did not read: ${r.error.message}`);
  return r;
}

/** The input text of each recognised part, in order. */
export function parts(m: Marking): string[] {
  return m.spans.map((s) => `${s.part}:${m.input.slice(s.start, s.end)}`);
}

const SHORTCUT_CHECK_DAY = new Date("2026-06-01T00:00:00Z");

/** The decoder's shortcuts read `text` exactly as the token readers alone do, with and without a day for the DOT age. */
export function readsAlike(text: string): void {
  expect(JSON.stringify(parseMarking(text))).toBe(JSON.stringify(parseMarkingByTokens(text)));
  const options = { today: SHORTCUT_CHECK_DAY };
  expect(JSON.stringify(parseMarking(text, options))).toBe(JSON.stringify(parseMarkingByTokens(text, options)));
}
