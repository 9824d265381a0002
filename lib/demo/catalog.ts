import { sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, fitCard, quoteRequest, stockFitment, stockItem, tireLine, type NewTireLine } from "@/db/schema";
import { buildStockRow } from "@/lib/stock/build-stock-row";
import { insertStockRows } from "@/lib/stock/insert-stock-rows";
import { CATEGORY_TRAITS, DEMO_BRANDS, type LineCategory } from "./catalog-lines";
import { generateStock, type CatalogPlan } from "./catalog-stock";

/** Empties the catalog, children first: requests (with their offers) and Fit cards name its items. */
export async function clearCatalog(db: Database): Promise<void> {
  await db.delete(quoteRequest);
  await db.delete(fitCard);
  await db.delete(stockItem);
  await db.delete(stockFitment);
  await db.delete(tireLine);
  await db.delete(brand);
}

/** Lines of one category differ a little from brand to brand: treadwear, warranty, the snowflake on A/T tires. */
function lineValues(brandId: number, name: string, category: LineCategory, variant: number): NewTireLine {
  const traits = CATEGORY_TRAITS[category];
  const [treadwear, traction, temperature] = traits.utqg ?? [null, null, null];
  return {
    brandId,
    name,
    season: traits.season,
    terrain: traits.terrain,
    mudAndSnow: traits.mudAndSnow,
    threePeak: traits.threePeak && (category !== "all-terrain" || variant % 2 === 0),
    runFlat: traits.runFlat,
    utqgTreadwear: treadwear === null ? null : treadwear + (variant % 3) * 40,
    utqgTraction: traction,
    utqgTemperature: temperature,
    mileageWarrantyMiles: traits.mileageWarrantyMiles === null ? null : traits.mileageWarrantyMiles + (variant % 3) * 5_000,
    treadDepth32: traits.treadDepth32 + (variant % 2),
  };
}

/**
 * Writes the invented brands, their lines and `plan.itemCount` stock items into an empty catalog.
 * Every item goes through the same write path as staff edits and the CSV import.
 */
export async function seedCatalog(db: Database, plan: CatalogPlan): Promise<void> {
  const brands = await db
    .insert(brand)
    .values(DEMO_BRANDS.map((b) => ({ name: b.name })))
    .returning({ id: brand.id, name: brand.name });
  const brandIds = new Map(brands.map((b) => [b.name, b.id]));
  const lineRows = DEMO_BRANDS.flatMap((b, brandIndex) =>
    b.lines.map(([name, category], i) => lineValues(brandIds.get(b.name) ?? 0, name, category, brandIndex + i)),
  );
  const lines = await db
    .insert(tireLine)
    .values(lineRows)
    .returning({ id: tireLine.id, brandId: tireLine.brandId, name: tireLine.name, runFlat: tireLine.runFlat });
  const lineByKey = new Map(lines.map((line) => [`${line.brandId}/${line.name}`, line]));

  const rows = generateStock(plan).map((item) => {
    const line = lineByKey.get(`${brandIds.get(item.brandName)}/${item.lineName}`);
    if (!line) throw new Error(`demo line ${item.brandName} ${item.lineName} is missing`);
    const built = buildStockRow(item.input, line);
    if (!built.ok) throw new Error(`demo item ${item.input.sku} refused: ${built.problem.field} ${built.problem.reason}`);
    return { ...built.row, retired: item.retired };
  });
  await insertStockRows(db, rows);
  // Fresh statistics after a bulk load, so that the planner knows the catalog it searches.
  await db.execute(sql`analyze ${brand}, ${tireLine}, ${stockItem}`);
}
