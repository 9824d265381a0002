import { z } from "zod";
import type { Database } from "@/db/client";
import type { ApiErrorCode } from "@/lib/api/errors";
import { readShopTolerance } from "@/lib/catalog/shop-tolerance";
import {
  formatSize, hasNominalDiameter, LOAD_RANGES, loadIndexKg, noDiameterMessage, type PlusCandidate, plusCandidates, sizeFacts, sizeFromSlug, sizeGeometry, speedSymbolInfo,
} from "@/lib/tire";
import { countCatalogMatches } from "./catalog-matches";

const wholeNumber = z.string().trim().regex(/^\d+$/, "expected a whole number").transform(Number);
const optional = <Schema extends z.ZodType>(schema: Schema) => z.preprocess((value) => (value === "" ? undefined : value), schema.optional());

export const plusQuerySchema = z.object({
  size: z.string().trim().min(1, "give the size on the tire, e.g. 285-50R20"),
  loadIndex: optional(wholeNumber),
  loadIndexDual: optional(wholeNumber),
  speedSymbol: optional(z.string().trim().toUpperCase()),
  loadRange: optional(z.string().trim().toUpperCase().pipe(z.enum(LOAD_RANGES))),
  runFlat: optional(z.enum(["true", "false"]).transform((value) => value === "true")),
  tolerancePct: optional(
    z.string().trim().regex(/^\d+(\.\d+)?$/, "expected a number").transform(Number).pipe(z.number().min(1).max(5)),
  ),
});

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
  const size = sizeFromSlug(query.size);
  if (!size) return { ok: false, code: "unreadable", message: `"${query.size.slice(0, 40)}" is not a tire size (try 285/50R20 or 285-50R20).` };
  if (!hasNominalDiameter(size)) return { ok: false, code: "unreadable", message: noDiameterMessage(size) };
  for (const index of [query.loadIndex, query.loadIndexDual]) {
    if (index !== undefined && loadIndexKg(index) === undefined) {
      return { ok: false, code: "unknown_load_index", message: `Load index ${index} is not in the load index table (0–279).` };
    }
  }
  const speed = query.speedSymbol === undefined ? undefined : speedSymbolInfo(query.speedSymbol);
  if (query.speedSymbol !== undefined && !speed) {
    return { ok: false, code: "unknown_speed_symbol", message: `"${query.speedSymbol}" is not a speed symbol.` };
  }
  const tolerancePct = query.tolerancePct ?? (await readShopTolerance(db));
  const candidates = plusCandidates(size, tolerancePct);
  const minLoadIndex = query.loadIndex ?? null;
  const original = {
    ...sizeFacts(size),
    runFlat: size.runFlat || query.runFlat === true,
    loadIndex: minLoadIndex,
    loadIndexDual: query.loadIndexDual ?? null,
    minLoadIndex: null,
    minLoadIndexDual: null,
    // As in the finder: a ZR size named without a speed symbol is rated above 240 km/h.
    speedSymbol: speed?.symbol ?? (size.zr ? ("ZR" as const) : null),
    loadRange: query.loadRange ?? null,
    season: null,
  };
  const designations = candidates.map((candidate) => candidate.designation);
  const matches = await countCatalogMatches(db, original, designations, tolerancePct);
  const geometry = sizeGeometry(size);
  return {
    ok: true,
    plan: {
      original: { designation: formatSize(size), overallDiameterMm: geometry.overallDiameterMm, sidewallMm: geometry.sidewallMm },
      tolerancePct,
      candidates: candidates.map((candidate) => ({ ...candidate, minLoadIndex, catalogMatches: matches.get(candidate.designation) ?? 0 })),
    },
  };
}
