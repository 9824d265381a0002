import type { Construction, JudgedCandidate, Season, ServiceType } from "@/lib/tire";

/** The columns of a stock item the judge reads. */
export interface CandidateFacts {
  designation: string;
  rimDiameterIn: number;
  construction: Construction;
  serviceType: ServiceType;
  extraLoad: boolean;
  runFlat: boolean;
  overallDiameterMm: number;
  loadIndex: number;
  loadIndexDual: number | null;
  speedSymbol: string;
  loadRange: string | null;
  season: Season;
}

/** A stock item as the judge reads it. Designations are stored normalized, so only a P-metric one starts with "P". */
export function judgedCandidate(item: CandidateFacts): JudgedCandidate {
  return {
    rimDiameterIn: item.rimDiameterIn,
    construction: item.construction,
    serviceType: item.serviceType,
    pMetric: item.designation.startsWith("P"),
    extraLoad: item.extraLoad,
    runFlat: item.runFlat,
    overallDiameterMm: item.overallDiameterMm,
    loadIndex: item.loadIndex,
    loadIndexDual: item.loadIndexDual,
    speedSymbol: item.speedSymbol,
    loadRange: item.loadRange,
    season: item.season,
  };
}
