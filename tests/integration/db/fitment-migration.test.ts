import { rmSync } from "node:fs";
import { sql } from "drizzle-orm";
import { migrate } from "drizzle-orm/pglite/migrator";
import type { PgliteDatabase } from "drizzle-orm/pglite";
import { afterAll, describe, expect, it } from "vitest";
import { migrateDatabase, openDatabase, type DatabaseHandle } from "@/db/client";
import { findAlternatives } from "@/lib/alternatives/find-alternatives";
import { readOriginal } from "@/lib/alternatives/original";
import { measurableSizeFromSlug, sizeGeometry, speedSymbolRank } from "@/lib/tire";
import { migrationsBefore } from "../helpers/migrations-before";
import { NO_CHARGES } from "@/lib/shop/charges";

describe("a database that had stock before fitments", () => {
  let handle: DatabaseHandle | undefined;
  const folder = migrationsBefore("0006_stock_fitment");
  afterAll(async () => {
    await handle?.close();
    rmSync(folder, { recursive: true, force: true });
  });

  it("gives its items their fitments and counts when migrated, and the finder finds them (PGlite)", async () => {
    handle = await openDatabase({ dataDir: "memory://" });
    await migrate(handle.db as unknown as PgliteDatabase, { migrationsFolder: folder });
    // The rows as the catalog held them before: every column but the fitment.
    await handle.db.execute(sql`insert into brand (name) values ('Oldstock')`);
    await handle.db.execute(sql`insert into tire_line (brand_id, name, season, terrain) select id, 'Oldstock Tour', 'all-season', 'highway' from brand`);
    await handle.db.execute(sql`
      insert into stock_item (sku, line_id, designation, size_kind, section_width_mm, aspect_ratio, rim_diameter_in, construction, zr,
        commercial, run_flat, load_index, speed_symbol, speed_rank, extra_load, service_type, overall_diameter_mm, price_cents, quantity_on_hand, retired)
      select sku, (select id from tire_line), '205/55R16', 'metric', 205, 55, 16, 'R', false, false, false, 91, 'H', ${speedSymbolRank("H")}, false,
        'passenger', ${sizeGeometry(measurableSizeFromSlug("205/55R16")!).overallDiameterMm}, price, quantity, retired
      from (values ('OLD-1', 12000, 4, false), ('OLD-2', 11000, 0, false), ('OLD-3', 10000, 2, true)) as old (sku, price, quantity, retired)`);

    await migrateDatabase(handle);

    const { rows } = (await handle.db.execute(sql`select item_count, in_stock_count from stock_fitment`)) as unknown as {
      rows: { item_count: number; in_stock_count: number }[];
    };
    expect(rows).toEqual([{ item_count: 2, in_stock_count: 1 }]);
    const read = readOriginal({ size: "205/55R16", loadIndex: 91, speedSymbol: "H" });
    if (!read.ok) throw new Error(read.message);
    const found = await findAlternatives(handle.db, read.original, { tolerancePct: 3, quantity: 4, charges: NO_CHARGES, sort: "diameter", limit: 50, cursor: null });
    expect(found.results.map((tire) => tire.sku)).toEqual(["OLD-2", "OLD-1"]);
    expect(found.total).toBe(2);
  });
});
