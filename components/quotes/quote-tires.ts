import { describeTire, type ServiceDescribed } from "@/lib/tire/describe-tire";

type PickedTire = ServiceDescribed & { brand: string; line: string };

/**
 * The tires that stay on an all-wheel-drive vehicle in words (stayingTiresWords), and each picked
 * tire's verdict beside them: worded by the caller, so pages that never judge wear carry no wear code.
 */
export interface QuoteWear<T> {
  staying: string;
  verdictOf: (tire: T) => string;
}

/** What the finder sends: the tire on the car, the tires that stay (if any are judged), then any tires picked from the results. */
export function finderQuoteTires<T extends PickedTire>(original: ServiceDescribed, picked: readonly T[], wear?: QuoteWear<T> | null): string {
  const lines = [`Replacing ${describeTire(original)}`, ...(wear ? [wear.staying] : [])];
  for (const tire of picked) lines.push(`${tire.brand} ${tire.line} ${describeTire(tire)}${wear ? ` (${wear.verdictOf(tire)})` : ""}`);
  return lines.join("\n");
}

/** What a Fit card sends: its picked tires (with their verdicts beside the tires that stay, if any), or its sizes when none were picked. */
export function fitCardQuoteTires(card: { sizes: string[]; tires: readonly (PickedTire & { wear: { words: string } | null })[] }, stayingWords: string | null): string {
  if (card.tires.length === 0) return card.sizes.join(", ");
  const tires = card.tires.map((tire) => `${tire.brand} ${tire.line} ${describeTire(tire)}${tire.wear ? ` (${tire.wear.words})` : ""}`);
  return [...(stayingWords ? [stayingWords] : []), ...tires].join("\n");
}

/**
 * What the Plus planner sends: the tire on the car, then the sizes picked for new wheels with the
 * load index and speed symbol they must still meet.
 */
export function plusQuoteTires(original: { designation: string; loadIndex?: number; speedSymbol?: string }, picks: readonly string[]): string {
  const service = original.loadIndex !== undefined && original.speedSymbol ? ` ${original.loadIndex}${original.speedSymbol}` : "";
  const minimum = service
    ? `load index ${original.loadIndex} or more, speed symbol ${original.speedSymbol} or better`
    : "load index and speed symbol at least the vehicle's placard";
  const sizes = picks.length > 0 ? picks.join(", ") : "a size you suggest";
  return `On the car now: ${original.designation}${service}\nOn new wheels (${minimum}): ${sizes}`;
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
