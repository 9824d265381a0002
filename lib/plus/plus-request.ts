import { z } from "zod";
import type { Database } from "@/db/client";
import { readJudgedOriginal } from "@/lib/alternatives/original";
import type { ApiErrorCode } from "@/lib/api/errors";
import { optional, originalQueryFields, yesNo } from "@/lib/api/query-fields";
import { readShopTolerance } from "@/lib/shop/tolerance";
import { type PlusCandidate, plusCandidates, sizeGeometry } from "@/lib/tire";
import { countCatalogMatches } from "./catalog-matches";

export const plusQuerySchema = z.object({
  ...originalQueryFields,
  all: optional(yesNo).describe(
    "true: every theoretical grid size within tolerance; by default only the section widths such a wheel takes in practice " +
      "(10 mm narrower, 20 mm on a smaller wheel, to 20 mm wider plus 10 mm per inch added; common practice).",
  ),
});

export type PlusQuery = z.infer<typeof plusQuerySchema>;

export interface PlusPlan {
  original: { designation: string; overallDiameterMm: number; sidewallMm: number };
  tolerancePct: number;
  candidates: (PlusCandidate & { minLoadIndex: number | null; catalogMatches: number })[];
}

export type PlusAnswer = { ok: true; plan: PlusPlan } | { ok: false; code: ApiErrorCode; message: string };

/** The 200 body of GET /api/v1/plus. */
export const plusBodySchema = z.object({
  original: z.object({ designation: z.string(), overallDiameterMm: z.number() }),
  tolerancePct: z.number(),
  candidates: z
    .array(
      z.object({
        designation: z.string(),
        plus: z.number().int().describe("Rim diameter change in inches, −1 to +3."),
        rimDiameterIn: z.number(),
        sectionWidthMm: z.number(),
        aspectRatio: z.number().nullable(),
        overallDiameterMm: z.number(),
        diameterDiffPct: z.number().describe("(this − original) ÷ original × 100, signed and unrounded."),
        theoreticalRimWidthIn: z.number(),
        minLoadIndex: z.number().int().nullable().describe("The given loadIndex; null when none was given."),
        catalogMatches: z.number().int().describe("Current catalog tires of exactly this designation that meet rules 2–7 against the original, each on its own rim."),
      }),
    )
    .describe("Ordered by plus, then |diameterDiffPct|, then section width; the original is listed with plus 0."),
});

export type PlusBody = z.infer<typeof plusBodySchema>;

/** The published body of GET /api/v1/plus: the plan without the fields only the page uses. */
export function toPlusBody(plan: PlusPlan): PlusBody {
  return {
    original: { designation: plan.original.designation, overallDiameterMm: plan.original.overallDiameterMm },
    tolerancePct: plan.tolerancePct,
    candidates: plan.candidates.map((candidate) => ({
      designation: candidate.designation,
      plus: candidate.plus,
      rimDiameterIn: candidate.rimDiameterIn,
      sectionWidthMm: candidate.sectionWidthMm,
      aspectRatio: candidate.aspectRatio,
      overallDiameterMm: candidate.overallDiameterMm,
      diameterDiffPct: candidate.diameterDiffPct,
      theoreticalRimWidthIn: candidate.theoreticalRimWidthIn,
      minLoadIndex: candidate.minLoadIndex,
      catalogMatches: candidate.catalogMatches,
    })),
  };
}

/** Answers GET /api/v1/plus: the grid sizes within tolerance (those a wheel takes in practice, or all) and how many catalog tires of each would serve. */
export async function answerPlus(db: Database, query: PlusQuery): Promise<PlusAnswer> {
  const read = readJudgedOriginal(query);
  if (!read.ok) return read;
  const { original, size } = read;
  const tolerancePct = query.tolerancePct ?? (await readShopTolerance(db));
  const candidates = plusCandidates(size, tolerancePct, { every: query.all === true });
  const matches = await countCatalogMatches(db, original, candidates.map((candidate) => candidate.designation), tolerancePct);
  const geometry = sizeGeometry(size);
  return {
    ok: true,
    plan: {
      original: { designation: original.designation, overallDiameterMm: geometry.overallDiameterMm, sidewallMm: geometry.sidewallMm },
      tolerancePct,
      candidates: candidates.map((candidate) => ({ ...candidate, minLoadIndex: original.loadIndex, catalogMatches: matches.get(candidate.designation) ?? 0 })),
    },
  };
}
