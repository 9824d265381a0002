import { z } from "zod";
import type { Database } from "@/db/client";
import { readJudgedOriginal } from "@/lib/alternatives/original";
import type { ApiErrorCode } from "@/lib/api/errors";
import { originalQueryFields } from "@/lib/api/query-fields";
import { readShopTolerance } from "@/lib/shop/tolerance";
import { type PlusCandidate, plusCandidates, sizeGeometry } from "@/lib/tire";
import { countCatalogMatches } from "./catalog-matches";

export const plusQuerySchema = z.object(originalQueryFields);

export type PlusQuery = z.infer<typeof plusQuerySchema>;

export interface PlusPlan {
  original: { designation: string; overallDiameterMm: number; sidewallMm: number };
  tolerancePct: number;
  candidates: (PlusCandidate & { minLoadIndex: number | null; catalogMatches: number })[];
}

export type PlusAnswer = { ok: true; plan: PlusPlan } | { ok: false; code: ApiErrorCode; message: string };

/** The published body of GET /api/v1/plus: the plan without the fields only the page uses. */
export function toPlusBody(plan: PlusPlan) {
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

/** Answers GET /api/v1/plus: every grid size within tolerance and how many catalog tires of each would serve. */
export async function answerPlus(db: Database, query: PlusQuery): Promise<PlusAnswer> {
  const read = readJudgedOriginal(query);
  if (!read.ok) return read;
  const { original, size } = read;
  const tolerancePct = query.tolerancePct ?? (await readShopTolerance(db));
  const candidates = plusCandidates(size, tolerancePct);
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
