import { rmSync } from "node:fs";
import { sql } from "drizzle-orm";
import { migrate as migrateNodePg } from "drizzle-orm/node-postgres/migrator";
import { migrate as migratePglite } from "drizzle-orm/pglite/migrator";
import { afterAll, describe, expect, it } from "vitest";
import { migrateDatabase, openDatabase, type DatabaseHandle } from "@/db/client";
import { isSku } from "@/lib/tire";
import { measurableSizeFromSlug, sizeGeometry, speedSymbolRank } from "@/lib/tire";
import { migrationsBefore } from "../helpers/migrations-before";
import { createServerDatabase } from "../helpers/server-database";
import { testDatabaseKinds } from "../helpers/test-database";

const LONG = "L".repeat(63);
// SKUs the earlier rule (printable ASCII without spaces) allowed.
const OLD_SKUS = ["KEEP-1", "A-B", "A/B", "new", "NEW", ".", "..", "x:1?", `${LONG}-`, `${LONG}/`];

describe.each(testDatabaseKinds)("a catalog with SKUs from before the URL-safe rule, on %s", (kind) => {
  let handle: DatabaseHandle | undefined;
  let drop: (() => Promise<void>) | undefined;
  const folder = migrationsBefore("0010_sku_url_safe");
  afterAll(async () => {
    await handle?.close();
    await drop?.();
    rmSync(folder, { recursive: true, force: true });
  });

  it("gets every SKU renamed into the rule, collisions suffixed, each rename in the audit log", async () => {
    if (kind === "postgres") {
      const created = await createServerDatabase(process.env.TEST_DATABASE_URL!);
      drop = created.drop;
      handle = await openDatabase({ url: created.url });
      await migrateNodePg(handle.db as Parameters<typeof migrateNodePg>[0], { migrationsFolder: folder });
    } else {
      handle = await openDatabase({ dataDir: "memory://" });
      await migratePglite(handle.db as Parameters<typeof migratePglite>[0], { migrationsFolder: folder });
    }
    const db = handle.db;
    await db.execute(sql`insert into brand (name) values ('Oldstock')`);
    await db.execute(sql`insert into tire_line (brand_id, name, season, terrain) select id, 'Oldstock Tour', 'all-season', 'highway' from brand`);
    const diameter = sizeGeometry(measurableSizeFromSlug("205/55R16")!).overallDiameterMm;
    for (const sku of OLD_SKUS) {
      await db.execute(sql`
        insert into stock_item (sku, line_id, designation, size_kind, section_width_mm, aspect_ratio, rim_diameter_in, construction, zr,
          commercial, run_flat, load_index, speed_symbol, speed_rank, extra_load, service_type, overall_diameter_mm, price_cents, quantity_on_hand)
        values (${sku}, (select id from tire_line), '205/55R16', 'metric', 205, 55, 16, 'R', false, false, false, 91, 'H', ${speedSymbolRank("H")},
          false, 'passenger', ${diameter}, 10000, 4)`);
    }

    await migrateDatabase(handle);

    const { rows: items } = (await db.execute(sql`select sku from stock_item order by id`)) as unknown as { rows: { sku: string }[] };
    expect(items.map((item) => item.sku)).toEqual(["KEEP-1", "A-B", "A-B-2", "new-2", "NEW-2", ".-2", "..-2", "x-1-", `${LONG}-`, `${LONG.slice(0, 62)}-2`]);
    expect(items.every((item) => isSku(item.sku))).toBe(true);

    const { rows: audit } = (await db.execute(sql`select actor_email, action, subject, changes from audit_event order by id`)) as unknown as {
      rows: { actor_email: string; action: string; subject: string; changes: { sku: { from: string; to: string } } }[];
    };
    expect(audit.map((row) => [row.changes.sku.from, row.changes.sku.to])).toEqual([
      [".", ".-2"],
      ["..", "..-2"],
      ["A/B", "A-B-2"],
      [`${LONG}/`, `${LONG.slice(0, 62)}-2`],
      ["NEW", "NEW-2"],
      ["new", "new-2"],
      ["x:1?", "x-1-"],
    ]);
    expect(audit.every((row) => row.action === "item_changed" && row.subject === row.changes.sku.to && row.actor_email === "Sidewise (database migration)")).toBe(true);

    await expect(db.execute(sql`update stock_item set sku = 'a/b' where sku = 'KEEP-1'`)).rejects.toThrow();
    await expect(db.execute(sql`update stock_item set sku = 'New' where sku = 'KEEP-1'`)).rejects.toThrow();
  });
});
