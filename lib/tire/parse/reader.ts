import type { LoadRange } from "../load-range";
import type {
  DecodeError,
  DetailKind,
  DetailSpan,
  LoadMark,
  PartKind,
  PressureMark,
  ServiceDescription,
  Span,
  TemperatureGrade,
  TireSize,
  TractionGrade,
} from "../types";
import type { Token } from "./tokens";

/** A recognised date code before its age is known. */
export interface DotReading {
  plantCode: string;
  week: number;
  year: number;
  yearAmbiguous: boolean;
  tin: string;
}

/** Everything read so far; the part readers fill it in as they go. */
export interface Draft {
  size: TireSize | null;
  service: ServiceDescription | null;
  loadRange: LoadRange | null;
  plyRating: number | null;
  loadType: "SL" | "XL" | null;
  runFlat: boolean;
  dot: DotReading | null;
  treadwear: number | null;
  traction: TractionGrade | null;
  temperature: TemperatureGrade | null;
  mudAndSnow: boolean;
  threePeak: boolean;
  maxLoadSingle: LoadMark | null;
  maxLoadDual: LoadMark | null;
  maxPressure: PressureMark | null;
  spans: Span[];
  details: DetailSpan[];
  assumptions: string[];
  warnings: string[];
  /** Text that looked like a part but could not be read, with what was wrong: the first one explains an unreadable input. */
  misses: { message: string; suggestion: string }[];
  fatal: DecodeError | null;
}

export interface Reader {
  readonly input: string;
  readonly tokens: readonly Token[];
  readonly draft: Draft;
}

/** A part reader returns the index of the first token after what it read, or 0 when it read nothing. */
export type PartReader = (r: Reader, i: number) => number;

export function newDraft(): Draft {
  return {
    size: null,
    service: null,
    loadRange: null,
    plyRating: null,
    loadType: null,
    runFlat: false,
    dot: null,
    treadwear: null,
    traction: null,
    temperature: null,
    mudAndSnow: false,
    threePeak: false,
    maxLoadSingle: null,
    maxLoadDual: null,
    maxPressure: null,
    spans: [],
    details: [],
    assumptions: [],
    warnings: [],
    misses: [],
    fatal: null,
  };
}

export function wordAt(r: Reader, i: number): string | undefined {
  const t = r.tokens[i];
  return t?.kind === "word" ? t.text : undefined;
}

export function numAt(r: Reader, i: number): Token | undefined {
  const t = r.tokens[i];
  return t?.kind === "num" ? t : undefined;
}

export function punctAt(r: Reader, i: number): string | undefined {
  const t = r.tokens[i];
  return t?.kind === "punct" ? t.text : undefined;
}

/** Token `i` touches the token before it (no whitespace between). */
export function glued(r: Reader, i: number): boolean {
  return r.tokens[i]?.gap === false;
}

/** Nothing letter- or digit-like runs on after token `i - 1`: the input ends, or whitespace or punctuation follows. */
export function endsChunk(r: Reader, i: number): boolean {
  const t = r.tokens[i];
  return t === undefined || t.gap || t.kind === "punct" || t.kind === "other";
}

/** Skips one optional punctuation mark among `marks` (e.g. the colon of "LOAD RANGE: E"). */
export function skipPunct(r: Reader, i: number, marks: string): number {
  const p = punctAt(r, i);
  return p !== undefined && marks.includes(p) ? i + 1 : i;
}

export function textOf(r: Reader, from: number, to: number): string {
  const a = r.tokens[from];
  const b = r.tokens[to - 1];
  return a && b ? r.input.slice(a.start, b.end) : "";
}

/** Records text that looked like a part but was not one: a warning, and the error should nothing else be read. */
export function addMiss(d: Draft, message: string, suggestion: string): void {
  d.misses.push({ message, suggestion });
  d.warnings.push(`${message} ${suggestion}`);
}

/** Records that tokens [from, to) form one piece of a size or service description. */
export function addDetail(r: Reader, detail: DetailKind, from: number, to: number): void {
  const a = r.tokens[from];
  const b = r.tokens[to - 1];
  if (a && b) r.draft.details.push({ detail, start: a.start, end: b.end });
}

/** Where token `from` starts and token `to - 1` ends: the characters tokens [from, to) cover. */
export const startOf = (r: Reader, from: number): number => (r.tokens[from] as Token).start;
export const endOf = (r: Reader, to: number): number => (r.tokens[to - 1] as Token).end;

/** Records that tokens [from, to) form a part. */
export function addSpan(r: Reader, part: PartKind, from: number, to: number): void {
  const a = r.tokens[from];
  const b = r.tokens[to - 1];
  if (a && b) r.draft.spans.push({ part, start: a.start, end: b.end });
}
