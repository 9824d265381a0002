import { rmSync } from "node:fs";
import { sql } from "drizzle-orm";
import { migrate } from "drizzle-orm/pglite/migrator";
import type { PgliteDatabase } from "drizzle-orm/pglite";
import { afterAll, describe, expect, it } from "vitest";
import { migrateDatabase, openDatabase, type DatabaseHandle } from "@/db/client";
import { readFitCard } from "@/lib/fit-cards/read-card";
import { measurableSizeFromSlug, sizeGeometry, speedSymbolRank } from "@/lib/tire";
import { migrationsBefore } from "../helpers/migrations-before";

describe("a Fit card saved before cards kept the dual index, run-flat, Placard minimums and season", () => {
  let handle: DatabaseHandle | undefined;
  const folder = migrationsBefore("0009_fit_card_judge_facts");
  afterAll(async () => {
    await handle?.close();
    rmSync(folder, { recursive: true, force: true });
  });

  it("still opens after the migration, judged as before (PGlite)", async () => {
    handle = await openDatabase({ dataDir: "memory://" });
    await migrate(handle.db as unknown as PgliteDatabase, { migrationsFolder: folder });
    await handle.db.execute(sql`insert into brand (name) values ('Oldstock')`);
    await handle.db.execute(sql`insert into tire_line (brand_id, name, season, terrain) select id, 'Oldstock Tour', 'all-season', 'highway' from brand`);
    await handle.db.execute(sql`
      insert into stock_item (sku, line_id, designation, size_kind, section_width_mm, aspect_ratio, rim_diameter_in, construction, zr,
        commercial, run_flat, load_index, speed_symbol, speed_rank, extra_load, service_type, overall_diameter_mm, price_cents, quantity_on_hand)
      values ('OLD-1', (select id from tire_line), '205/55R16', 'metric', 205, 55, 16, 'R', false, false, false, 94, 'V', ${speedSymbolRank("V")}, true,
        'passenger', ${sizeGeometry(measurableSizeFromSlug("205/55R16")!).overallDiameterMm}, 12000, 4)`);
    await handle.db.execute(sql`
      insert into fit_card (slug, sizes, load_index, speed_symbol, tolerance_pct) values ('OldCardOldCardOldCard123', '["205/55R16"]', 91, 'H', 3)`);
    await handle.db.execute(sql`
      insert into fit_card_tire (card_id, position, stock_item_id, price_cents_at_save) select fit_card.id, 0, stock_item.id, 12500 from fit_card, stock_item`);

    await migrateDatabase(handle);

    const lookup = await readFitCard(handle.db, "OldCardOldCardOldCard123");
    if (lookup.status !== "found") throw new Error(lookup.status);
    expect(lookup.card.original).toMatchObject({ loadIndex: 91, loadIndexDual: null, runFlat: false, minLoadIndex: null, minLoadIndexDual: null, season: null });
    expect(lookup.card.tires[0]).toMatchObject({ sku: "OLD-1", equalOrBetter: true, notes: [] });
    expect(lookup.card.tires[0]?.reasons).toContain("load index 94 ≥ 91: +55 kg");
  });
});
