import { expect } from "vitest";
import { parseMarking, type Marking, type ParseOptions, type ParseResult } from "@/lib/tire";

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
