interface ServiceDescribed {
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

/** What the finder sends: the tire on the car, then any tires picked from the results. */
export function finderQuoteTires(original: ServiceDescribed, picked: readonly (ServiceDescribed & { brand: string; line: string })[]): string {
  const lines = [`Replacing ${describeTire(original)}`, ...picked.map((tire) => `${tire.brand} ${tire.line} ${describeTire(tire)}`)];
  return lines.join("\n");
}

/** What a Fit card sends: its picked tires, or its sizes when none were picked. */
export function fitCardQuoteTires(card: { sizes: string[]; tires: readonly (ServiceDescribed & { brand: string; line: string })[] }): string {
  if (card.tires.length === 0) return card.sizes.join(", ");
  return card.tires.map((tire) => `${tire.brand} ${tire.line} ${describeTire(tire)}`).join("\n");
}

/** A catalog tire a request form names: sent by SKU, shown with how many are on hand against the quantity asked for. */
export interface QuoteCatalogTire {
  sku: string;
  label: string;
  /** How many can be sold now. */
  quantity: number;
}

/** The catalog tires of a page (the finder's picks, a Fit card's current tires) as the request form names them. */
export function quoteCatalogTires(tires: readonly (ServiceDescribed & { sku: string; brand: string; line: string; quantity: number })[]): QuoteCatalogTire[] {
  return tires.map((tire) => ({ sku: tire.sku, label: `${tire.brand} ${tire.line} ${describeTire(tire)}`, quantity: tire.quantity }));
}
