import type { Database } from "@/db/client";
import { brand, tireLine, type Season, type Terrain } from "@/db/schema";
import { findAlternatives, type AlternativesOptions } from "@/lib/alternatives/find-alternatives";
import { readOriginal, type OriginalInput } from "@/lib/alternatives/original";
import { buildStockRow, type StockItemInput } from "@/lib/stock/build-stock-row";
import { insertStockRows } from "@/lib/stock/insert-stock-rows";
import { NO_CHARGES } from "@/lib/shop/charges";
import { DEFAULT_SET_SIZE } from "@/lib/tire";

export interface FixtureItem extends Partial<StockItemInput> {
  sku: string;
  designation: string;
  loadIndex: number;
  speedSymbol: string;
  line?: "touring" | "winter" | "trail" | "flat";
  retired?: boolean;
}

const LINES: Record<NonNullable<FixtureItem["line"]>, { season: Season; terrain: Terrain; threePeak: boolean; runFlat: boolean }> = {
  touring: { season: "all-season", terrain: "highway", threePeak: false, runFlat: false },
  winter: { season: "winter", terrain: "highway", threePeak: true, runFlat: false },
  trail: { season: "all-season", terrain: "all-terrain", threePeak: true, runFlat: false },
  flat: { season: "summer", terrain: "highway", threePeak: false, runFlat: true },
};

/** A small invented catalog: one brand ("Testwell"), one line of each kind, the given items. */
export async function seedFixture(db: Database, items: readonly FixtureItem[]): Promise<void> {
  const [made] = await db.insert(brand).values({ name: "Testwell" }).returning({ id: brand.id });
  const lineIds = new Map<string, { id: number; runFlat: boolean }>();
  for (const [name, traits] of Object.entries(LINES)) {
    const [line] = await db.insert(tireLine).values({ brandId: made!.id, name: `Fixture ${name}`, ...traits }).returning({ id: tireLine.id });
    lineIds.set(name, { id: line!.id, runFlat: traits.runFlat });
  }
  const rows = items.map((item) => {
    const built = buildStockRow({ priceCents: 10_000, quantity: 4, ...item }, lineIds.get(item.line ?? "touring")!);
    if (!built.ok) throw new Error(`${item.sku}: ${built.problem.field} ${built.problem.reason}`);
    return { ...built.row, retired: item.retired ?? false };
  });
  await insertStockRows(db, rows);
}

/** Runs the finder for an original typed as the API takes it. */
export async function search(db: Database, input: OriginalInput, options: Partial<AlternativesOptions> = {}) {
  const read = readOriginal(input);
  if (!read.ok) throw new Error(read.message);
  return findAlternatives(db, read.original, { tolerancePct: 3, quantity: DEFAULT_SET_SIZE, charges: NO_CHARGES, sort: "diameter", limit: 50, cursor: null, ...options });
}

export const skus = (tires: readonly { sku: string }[]) => tires.map((tire) => tire.sku);
