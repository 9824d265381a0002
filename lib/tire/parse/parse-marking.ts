import type { ParseOptions, ParseResult } from "../types";
import { readDot } from "./dot";
import { finish } from "./finish";
import { readLoadRange, readLoadType, readLoneLoadRange, readMudAndSnow, readPlyRating, readRunFlat, readThreePeak } from "./marks";
import { readMaxRating, readPressureThenLabel } from "./max-ratings";
import { addSpan, newDraft, textOf, type Draft, type PartReader, type Reader } from "./reader";
import { readService } from "./service";
import { diagnoseBareRim, diagnoseSize, readSize } from "./size";
import { tokenize, type Token } from "./tokens";
import { readUsualMarks } from "./usual-marks";
import { readUsualStart } from "./usual-start";
import { readUtqgGrades, readUtqgWords } from "./utqg";

const BY_FIRST_WORD = new Map<string, PartReader>([
  ...["XL", "REINFORCED", "REINF", "EXTRA", "SL", "STANDARD", "RF"].map((w) => [w, readLoadType] as const),
  ...["RFT", "RUNFLAT", "RUN"].map((w) => [w, readRunFlat] as const),
  ...["M", "MS", "MUD"].map((w) => [w, readMudAndSnow] as const),
  ...["TREADWEAR", "TRACTION", "TEMPERATURE", "TEMP", "UTQG"].map((w) => [w, readUtqgWords] as const),
  ...["MAX", "MAXIMUM"].map((w) => [w, readMaxRating] as const),
  ...["LOAD", "LR"].map((w) => [w, readLoadRange] as const),
  ["THREE", readThreePeak],
]);

function readAt(r: Reader, i: number): number {
  const t = r.tokens[i];
  switch (t?.kind) {
    case "num":
      return readSize(r, i) || readUtqgGrades(r, i) || readService(r, i) || readPlyRating(r, i) || readThreePeak(r, i) || readPressureThenLabel(r, i) || diagnoseSize(r, i);
    case "word":
      // "LRE" is read like "LR E".
      return BY_FIRST_WORD.get(t.text.length === 3 && t.text.startsWith("LR") ? "LR" : t.text)?.(r, i) || readSize(r, i) || readDot(r, i) || readLoneLoadRange(r, i) || diagnoseSize(r, i) || diagnoseBareRim(r, i);
    case "punct":
      return t.text === "(" ? readService(r, i) : 0;
    default:
      return 0;
  }
}

function reportUnread(r: Reader, from: number, to: number): void {
  addSpan(r, "unread", from, to);
  r.draft.warnings.push(`Not read: "${textOf(r, from, to)}".`);
}

const NO_TOKENS: readonly Token[] = [];
const NO_OPTIONS: ParseOptions = {};

/** Reads the text from character `from` on, token by token, into what `draft` holds already. */
function readTokens(input: string, draft: Draft, from: number, options: ParseOptions): ParseResult {
  const r: Reader = { input, tokens: from < input.length ? tokenize(input, from) : NO_TOKENS, draft };
  const n = r.tokens.length;
  // Tokens no reader took, gathered into runs so that a warning names "ACME Trailmaster" once.
  let unreadFrom = -1;
  let unreadTo = -1;
  for (let i = 0; i < n; ) {
    const next = readAt(r, i);
    if (next > i) {
      if (unreadFrom >= 0) reportUnread(r, unreadFrom, unreadTo);
      unreadFrom = -1;
      i = next;
      continue;
    }
    // Stray punctuation between parts is not worth a warning; words and numbers are.
    if (r.tokens[i]?.kind !== "punct") {
      if (unreadFrom < 0) unreadFrom = i;
      unreadTo = i + 1;
    }
    i++;
  }
  if (unreadFrom >= 0) reportUnread(r, unreadFrom, unreadTo);
  return finish(r, options);
}

/**
 * Reads whatever a person may type from a sidewall: size, service description, load range, ply
 * rating, XL / run-flat marks, DOT code, UTQG grades, winter marks, maximum load and pressure.
 * Never throws. Pass `today` to have the DOT code's age worked out.
 */
export function parseMarking(text: string, options: ParseOptions = NO_OPTIONS): ParseResult {
  const input = typeof text === "string" ? text : "";
  const draft = newDraft();
  const restFrom = readUsualMarks(input, draft, Math.max(readUsualStart(input, draft), 0));
  return readTokens(input, draft, restFrom, options);
}

/** The same reading token by token, without the shortcuts for the usual start and marks: tests hold the two equal. */
export function parseMarkingByTokens(text: string, options: ParseOptions = NO_OPTIONS): ParseResult {
  return readTokens(typeof text === "string" ? text : "", newDraft(), 0, options);
}
