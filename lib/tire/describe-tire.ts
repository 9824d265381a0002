/** A tire's size and service description, as a catalog item or a marking holds them. */
export interface ServiceDescribed {
  designation: string;
  loadIndex: number | null;
  loadIndexDual?: number | null;
  speedSymbol: string | null;
  loadRange?: string | null;
}

/** A size with its service description as the sidewall shows it, e.g. "LT265/75R16 123/120S, load range E". */
export function describeTire({ designation, loadIndex, loadIndexDual, speedSymbol, loadRange }: ServiceDescribed): string {
  const index = loadIndex === null ? "" : loadIndexDual ? `${loadIndex}/${loadIndexDual}` : String(loadIndex);
  const service = `${index}${speedSymbol ?? ""}`;
  return [designation, service].filter(Boolean).join(" ") + (loadRange ? `, load range ${loadRange}` : "");
}
