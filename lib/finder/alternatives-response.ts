import type { Tire } from "@/lib/catalog/tire";

export type Candidate = Tire & { diameterDiffPct: number; reasons: string[] };
export type NearMiss = Tire & { diameterDiffPct: number; failed: string[] };

/** The body of GET /api/v1/alternatives. */
export interface AlternativesResponse {
  original: { designation: string; overallDiameterMm: number; loadIndex: number; speedSymbol: string | null; loadRange: string | null };
  tolerancePct: number;
  total: number;
  results: Candidate[];
  nextCursor: string | null;
  nearMisses: NearMiss[];
}

export interface ApiErrorBody {
  error: { code: string; message: string };
}
