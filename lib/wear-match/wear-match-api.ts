import { z } from "zod";
import { schemaOf } from "@/lib/api/schema-match";
import { optional } from "@/lib/api/query-fields";
import {
  DEFAULT_WEAR_LIMIT_32,
  SIZE_REQUIRED,
  readMeasurableSize,
  sizeGeometry,
  sizeToSlug,
  wearMatch,
  type MeasurableSize,
  type TireOnVehicle,
  type WearLimit,
  type WearMatch,
} from "@/lib/tire";
import { HALF_32NDS_PATTERN, MAX_TREAD_DEPTH_32, STAYING_TIRES_MAX, STAYING_TIRES_MIN, WEAR_LIMIT_32_MAX, WEAR_LIMIT_MM_MAX } from "./wear-match-rules";

const DEPTH_RULE = `a depth in 32nds of an inch from 0 to ${MAX_TREAD_DEPTH_32}, whole or a half (10 or 10.5)`;
const halves = (min: number, max: number, rule: string) =>
  z
    .string()
    .trim()
    .regex(HALF_32NDS_PATTERN, rule)
    .transform(Number)
    .pipe(z.number().min(min, rule).max(max, rule));

const STAYING_RULE = `the depths left on the ${STAYING_TIRES_MIN} or ${STAYING_TIRES_MAX} tires that stay, separated by commas, each ${DEPTH_RULE}`;

/** GET /api/v1/wear-match: a size, the new tire's depth, the depths that stay, and at most one limit. */
export const wearMatchQuerySchema = z
  .object({
    size: z.string().trim().min(1, SIZE_REQUIRED).describe('The size on the vehicle, a slug ("225-65R17") or an ordinary spelling.'),
    newTreadDepth32: halves(1, MAX_TREAD_DEPTH_32, DEPTH_RULE).describe("The new tire's tread depth in 32nds of an inch."),
    remaining32: z
      .string()
      .trim()
      .min(1, STAYING_RULE)
      .transform((text) => text.split(",").map((part) => part.trim()))
      .pipe(z.array(halves(0, MAX_TREAD_DEPTH_32, STAYING_RULE)).min(STAYING_TIRES_MIN, STAYING_RULE).max(STAYING_TIRES_MAX, STAYING_RULE))
      .describe("The depths left on the tires that stay (two or three), in 32nds, separated by commas: 6,6.5,7."),
    limit32: optional(halves(0.5, WEAR_LIMIT_32_MAX, `a tread-depth difference in 32nds from 0.5 to ${WEAR_LIMIT_32_MAX}, whole or a half`)).describe(
      "The vehicle maker's limit as a tread-depth difference in 32nds. Give this or limitCircumferenceMm, not both; neither takes the shop's default.",
    ),
    limitCircumferenceMm: optional(
      z
        .string()
        .trim()
        .regex(/^\d+(\.\d+)?$/, "expected a number of millimetres")
        .transform(Number)
        .pipe(z.number().gt(0, "must be more than 0 mm").max(WEAR_LIMIT_MM_MAX, `must be at most ${WEAR_LIMIT_MM_MAX} mm`)),
    ).describe("The vehicle maker's limit as a rolling-circumference difference in millimetres."),
  })
  .refine((query) => query.limit32 === undefined || query.limitCircumferenceMm === undefined, {
    path: ["limitCircumferenceMm"],
    message: "give a tread-depth limit or a circumference limit, not both: the vehicle maker states one of them",
  });

export type WearMatchQuery = z.infer<typeof wearMatchQuerySchema>;

const tireSchema = z.object({ overallDiameterMm: z.number(), circumferenceMm: z.number() });

export interface WearMatchBody {
  size: string;
  newTreadDepth32: number;
  new: { overallDiameterMm: number; circumferenceMm: number };
  remaining: { depth32: number; overallDiameterMm: number; circumferenceMm: number }[];
  spread32: number;
  limit: { kind: WearLimit["kind"]; value: number; limit32: number; fromShop: boolean };
  replaceSet: boolean;
  replaceReason: WearMatch["replaceReason"];
  fitsAsIs: boolean;
  shaveTo32: number | null;
}

export const wearMatchAnswerSchema = schemaOf<WearMatchBody>()(
  z.object({
    size: z.string().describe("The size's slug."),
    newTreadDepth32: z.number(),
    new: tireSchema.describe("The new tire: the size's nominal overall diameter (common practice) and π × diameter."),
    remaining: z.array(tireSchema.extend({ depth32: z.number() })).describe("Each staying tire, taken to have started at the new tire's depth."),
    spread32: z.number().describe("The deepest staying tire less the shallowest, in 32nds."),
    limit: z.object({
      kind: z.enum(["depth32", "circumferenceMm"]),
      value: z.number(),
      limit32: z.number().describe("The limit as a tread-depth difference in 32nds, unrounded."),
      fromShop: z.boolean().describe("True when the request gave no limit and the shop's default applies."),
    }),
    replaceSet: z.boolean().describe("One or two new tires cannot bring every tire within the limit of every other."),
    replaceReason: z.enum(["spread", "newTooShallow"]).nullable(),
    fitsAsIs: z.boolean(),
    shaveTo32: z.number().nullable().describe("The depth to shave the new tire to, unrounded; only when shaving is the answer."),
  }),
);

export type WearMatchEvaluation =
  | { ok: true; size: MeasurableSize; limit: WearLimit; limitFromShop: boolean; match: WearMatch }
  | { ok: false; code: "unreadable"; message: string; field: "size" };

/** Judges a valid query with the tire core; `shopLimit32` is the shop's default limit, used when the query names none. */
export function evaluateWearMatch(query: WearMatchQuery, shopLimit32: number = DEFAULT_WEAR_LIMIT_32): WearMatchEvaluation {
  const size = readMeasurableSize(query.size);
  if (!size.ok) return { ok: false, code: "unreadable", message: size.message, field: "size" };
  const limitFromShop = query.limit32 === undefined && query.limitCircumferenceMm === undefined;
  const limit: WearLimit =
    query.limitCircumferenceMm !== undefined
      ? { kind: "circumferenceMm", value: query.limitCircumferenceMm }
      : { kind: "depth32", value: query.limit32 ?? shopLimit32 };
  const match = wearMatch({ newDiameterMm: sizeGeometry(size.size).overallDiameterMm, newDepth32: query.newTreadDepth32, remaining32: query.remaining32, limit });
  return { ok: true, size: size.size, limit, limitFromShop, match };
}

const tireFigures = ({ overallDiameterMm, circumferenceMm }: TireOnVehicle) => ({ overallDiameterMm, circumferenceMm });

/** The API's 200 body for an evaluation. */
export function wearMatchBody({ size, limit, limitFromShop, match }: Extract<WearMatchEvaluation, { ok: true }>): WearMatchBody {
  return {
    size: sizeToSlug(size),
    newTreadDepth32: match.newTire.depth32,
    new: tireFigures(match.newTire),
    remaining: match.remaining.map((staying) => ({ depth32: staying.depth32, ...tireFigures(staying) })),
    spread32: match.spread32,
    limit: { ...limit, limit32: match.limit32, fromShop: limitFromShop },
    replaceSet: match.verdict === "replaceSet",
    replaceReason: match.replaceReason,
    fitsAsIs: match.verdict === "fitsAsIs",
    shaveTo32: match.shaveTo32,
  };
}
