import { z } from "zod";
import { schemaOf } from "@/lib/api/schema-match";
import { CONSTRUCTIONS, type DecodeResponse } from "@/lib/tire";

/** GET /api/v1/decode?q=TEXT */
export const decodeQuerySchema = z.object({
  q: z.string().trim().min(1, "type something from a sidewall").describe("Anything typed from a sidewall, in any case and spacing."),
});

const nullable = <Shape extends z.ZodRawShape>(shape: Shape) => z.object(shape).nullable();

/** The 200 body, built by the tire core's toDecodeResponse. */
export const decodeAnswerSchema = schemaOf<DecodeResponse>()(
  z.object({
    input: z.string(),
    size: nullable({
      designation: z.string().describe('Normalized, e.g. "285/50R20", "LT265/75R16", "33x12.50R15LT".'),
      kind: z.enum(["metric", "flotation", "inch"]).describe("inch: truck and inch-width sizes (11R22.5, 7.50-16), which have no geometry."),
      prefix: z.enum(["P", "LT", "ST", "T"]).nullable(),
      commercial: z.boolean().describe('The ETRTO "C" after the rim, e.g. 215/65R16C.'),
      sectionWidthMm: z.number().describe("Flotation and inch sizes: inches × 25.4."),
      aspectRatio: z.number().nullable(),
      construction: z.enum(CONSTRUCTIONS),
      zr: z.boolean(),
      runFlat: z.boolean(),
      rimDiameterIn: z.number(),
    }),
    service: nullable({
      loadIndex: z.number().int(),
      loadIndexDual: z.number().int().nullable(),
      speedSymbol: z.string(),
      loadKg: z.number().describe("Of the single load index."),
      loadLb: z.number(),
      speedKmh: z.number(),
      speedMph: z.number(),
      speedAbove: z.boolean().describe("(Y): 300 km/h and above."),
    }),
    loadRange: z.string().nullable(),
    plyRating: z.number().nullable().describe("As marked, else implied by the load range (E → 10)."),
    extraLoad: z.boolean(),
    geometry: nullable({
      sidewallMm: z.number(),
      overallDiameterMm: z.number(),
      overallDiameterIn: z.number(),
      circumferenceMm: z.number(),
      revsPerMile: z.number(),
      revsPerKm: z.number(),
    }).describe("Nominal (new, unloaded); null without a size, or for an inch size."),
    dot: nullable({ plantCode: z.string(), week: z.number().int(), year: z.number().int(), yearAmbiguous: z.boolean() }),
    utqg: nullable({ treadwear: z.number().int(), traction: z.string(), temperature: z.string() }),
    winter: z.object({ mudAndSnow: z.boolean(), threePeak: z.boolean() }),
    warnings: z.array(z.string()),
  }),
);
