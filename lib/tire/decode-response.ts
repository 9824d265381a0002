import { formatSize } from "./format";
import type { DecodeError, Marking, SizeKind, SizePrefix, Construction } from "./types";

/** The 200 body of GET /api/v1/decode, exactly. */
export interface DecodeResponse {
  input: string;
  size: null | {
    designation: string;
    kind: SizeKind;
    prefix: SizePrefix | null;
    commercial: boolean;
    sectionWidthMm: number;
    aspectRatio: number | null;
    construction: Construction;
    zr: boolean;
    runFlat: boolean;
    rimDiameterIn: number;
  };
  service: null | {
    loadIndex: number;
    loadIndexDual: number | null;
    speedSymbol: string;
    loadKg: number;
    loadLb: number;
    speedKmh: number;
    speedMph: number;
    speedAbove: boolean;
  };
  loadRange: string | null;
  plyRating: number | null;
  extraLoad: boolean;
  geometry: null | {
    sidewallMm: number;
    overallDiameterMm: number;
    overallDiameterIn: number;
    circumferenceMm: number;
    revsPerMile: number;
    revsPerKm: number;
  };
  dot: null | { plantCode: string; week: number; year: number; yearAmbiguous: boolean };
  utqg: null | { treadwear: number; traction: string; temperature: string };
  winter: { mudAndSnow: boolean; threePeak: boolean };
  warnings: string[];
}

/** The error body of the API: `{"error": {"code", "message"}}`, with any suggestion folded into the message. */
export interface DecodeErrorBody {
  error: { code: string; message: string };
}

export function toDecodeResponse(m: Marking): DecodeResponse {
  const { size, service, geometry: g, dot, utqg } = m;
  return {
    input: m.input,
    size: size && {
      designation: formatSize(size),
      kind: size.kind,
      prefix: size.prefix,
      commercial: size.commercial,
      sectionWidthMm: size.sectionWidthMm,
      aspectRatio: size.aspectRatio,
      construction: size.construction,
      zr: size.zr,
      runFlat: size.runFlat,
      rimDiameterIn: size.rimDiameterIn,
    },
    service: service && {
      loadIndex: service.loadIndex,
      loadIndexDual: service.loadIndexDual,
      speedSymbol: service.speedSymbol,
      loadKg: service.loadKg,
      loadLb: service.loadLb,
      speedKmh: service.speedKmh,
      speedMph: service.speedMph,
      speedAbove: service.speedAbove,
    },
    loadRange: m.loadRange,
    plyRating: m.plyRating,
    extraLoad: m.extraLoad,
    geometry: g && {
      sidewallMm: g.sidewallMm,
      overallDiameterMm: g.overallDiameterMm,
      overallDiameterIn: g.overallDiameterIn,
      circumferenceMm: g.circumferenceMm,
      revsPerMile: g.revsPerMile,
      revsPerKm: g.revsPerKm,
    },
    dot: dot && { plantCode: dot.plantCode, week: dot.week, year: dot.year, yearAmbiguous: dot.yearAmbiguous },
    utqg: utqg && { treadwear: utqg.treadwear, traction: utqg.traction, temperature: utqg.temperature },
    winter: { mudAndSnow: m.winter.mudAndSnow, threePeak: m.winter.threePeak },
    warnings: [...m.assumptions, ...m.warnings],
  };
}

export function toErrorBody(error: DecodeError): DecodeErrorBody {
  const message = error.suggestion ? `${error.message} ${error.suggestion}` : error.message;
  return { error: { code: error.code, message } };
}
