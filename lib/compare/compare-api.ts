import { z } from "zod";
import { schemaOf } from "@/lib/api/schema-match";
import type { ComparedSize } from "@/lib/tire";

/** GET /api/v1/compare?sizes=A,B[,C,D] */
export const compareQuerySchema = z.object({
  sizes: z
    .string()
    .trim()
    .min(1, "list two to four sizes")
    .describe('Two to four sizes separated by commas, slugs ("285-50R20") or ordinary spellings; the first is the reference.'),
});

const speedometerRowSchema = z.object({ shownKmh: z.number(), trueKmh: z.number(), shownMph: z.number(), trueMph: z.number() });

/** The 200 body: each size measured against the first, built by the tire core's compareSizes. */
export const compareAnswerSchema = schemaOf<{ sizes: ComparedSize[] }>()(
  z.object({
    sizes: z.array(
      z.object({
        designation: z.string(),
        overallDiameterMm: z.number(),
        overallDiameterIn: z.number(),
        sectionWidthMm: z.number(),
        sidewallMm: z.number(),
        circumferenceMm: z.number(),
        revsPerMile: z.number(),
        diameterDiffPct: z.number().describe("(this − reference) ÷ reference × 100, signed and unrounded; 0 for the reference."),
        clearanceChangeMm: z.number().describe("Half the change of overall diameter: how much higher (or lower) the axle rides."),
        speedometer: z
          .array(speedometerRowSchema)
          .describe("Rows for shown 50, 80, 100, 120 km/h, then 30, 50, 60, 70 mph, each in both units; true = shown × this diameter ÷ reference diameter."),
        readsBelowTrue: z.boolean().describe("The speedometer would show less than the true speed (UN Regulation No. 39 §5.3 forbids that)."),
      }),
    ),
  }),
);
