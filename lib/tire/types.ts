import type { Geometry } from "./geometry";
import type { LoadRange } from "./load-range";
import type { SpeedSymbol } from "./speed-symbols";
import type { CONSTRUCTIONS } from "./vocabulary";

/** "inch": a width in inches and no aspect ratio (11R22.5, 7.50R16LT, 7.50-16), whose overall diameter the marking does not give. */
export type SizeKind = "metric" | "flotation" | "inch";
export type SizePrefix = "P" | "LT" | "ST" | "T";
export type Construction = (typeof CONSTRUCTIONS)[number];

export interface TireSize {
  kind: SizeKind;
  prefix: SizePrefix | null;
  /** The ETRTO "C" after the rim (215/65R16C). */
  commercial: boolean;
  /** Flotation and inch sizes: the marked inches × 25.4. */
  sectionWidthMm: number;
  /** Null for flotation and inch sizes and for sizes marked without one (155R13). */
  aspectRatio: number | null;
  construction: Construction;
  zr: boolean;
  runFlat: boolean;
  rimDiameterIn: number;
  /** Flotation sizes: the marked overall diameter in inches (the 33 of 33x12.50R15); null otherwise. */
  flotationDiameterIn: number | null;
}

export interface ServiceDescription {
  loadIndex: number;
  loadIndexDual: number | null;
  speedSymbol: SpeedSymbol;
  /** Capacity of the single load index. */
  loadKg: number;
  loadLb: number;
  speedKmh: number;
  speedMph: number;
  speedAbove: boolean;
}

export interface DotCode {
  plantCode: string;
  week: number;
  year: number;
  /** Three-digit pre-2000 date codes give only the last digit of the year; 199x is assumed. */
  yearAmbiguous: boolean;
  /** The TIN symbols read after "DOT", without spaces. */
  tin: string;
  /** Years since the start of the week of manufacture; null when no "today" was given. */
  ageYears: number | null;
}

export type TractionGrade = "AA" | "A" | "B" | "C";
export type TemperatureGrade = "A" | "B" | "C";

export interface Utqg {
  treadwear: number;
  traction: TractionGrade;
  temperature: TemperatureGrade;
}

export interface WinterMarks {
  mudAndSnow: boolean;
  threePeak: boolean;
}

/** A load printed on the sidewall; either unit may be missing. */
export interface LoadMark {
  kg: number | null;
  lb: number | null;
}

export interface MaxLoad {
  single: LoadMark | null;
  dual: LoadMark | null;
}

export interface PressureMark {
  kPa: number | null;
  psi: number | null;
}

export type PartKind =
  | "size"
  | "service"
  | "loadRange"
  | "plyRating"
  | "loadType"
  | "runFlat"
  | "dot"
  | "utqg"
  | "winter"
  | "maxLoad"
  | "maxPressure"
  | "unread";

/** Where a recognised part sits in the input: `input.slice(start, end)`. */
export interface Span {
  part: PartKind;
  start: number;
  end: number;
}

/** The pieces of a size and of a service description, for pointing at "285" while explaining the width. */
export type DetailKind =
  | "prefix"
  | "overallDiameter"
  | "sectionWidth"
  | "aspectRatio"
  | "construction"
  | "rimDiameter"
  | "commercial"
  | "loadIndex"
  | "loadIndexDual"
  | "speedSymbol";

export interface DetailSpan {
  detail: DetailKind;
  start: number;
  end: number;
}

export interface Marking {
  input: string;
  size: TireSize | null;
  service: ServiceDescription | null;
  loadRange: LoadRange | null;
  /** As marked, else implied by the load range. */
  plyRating: number | null;
  extraLoad: boolean;
  /** "SL" or "XL" when the sidewall says so; null when neither is marked. */
  loadType: "SL" | "XL" | null;
  /** Run-flat marked in the size or anywhere else in the text. */
  runFlat: boolean;
  geometry: Geometry | null;
  dot: DotCode | null;
  utqg: Utqg | null;
  winter: WinterMarks;
  maxLoad: MaxLoad | null;
  maxPressure: PressureMark | null;
  /** How forgiving readings were understood ("285 50 20" read as 285/50R20). */
  assumptions: string[];
  /** Cautions and inconsistencies, in plain words. */
  warnings: string[];
  spans: Span[];
  /** Pieces within the size and service spans, in input order. */
  details: DetailSpan[];
}

export type DecodeErrorCode = "unreadable" | "unknown_load_index" | "unknown_speed_symbol";

export interface DecodeError {
  code: DecodeErrorCode;
  message: string;
  suggestion?: string;
}

export type ParseResult = ({ ok: true } & Marking) | { ok: false; input: string; error: DecodeError };

export interface ParseOptions {
  /** The date DOT ages are measured to; without it no age is computed. */
  today?: Date;
}
