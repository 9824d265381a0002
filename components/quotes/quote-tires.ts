import { describeTire, type ServiceDescribed } from "@/lib/tire";

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
