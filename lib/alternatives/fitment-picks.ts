import { sql, type Placeholder, type SQL } from "drizzle-orm";
import { brand, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine, ruleFactColumns } from "@/lib/catalog/columns";
import { skuPlainOrder } from "@/lib/catalog/columns";
import { tireLineColumns, tireStockColumns } from "@/lib/catalog/catalog-tire";

/** Where the previous page ended: its last row's sort key, price and SKU. */
export interface PickCursor {
  key: Placeholder;
  priceCents: Placeholder;
  sku: Placeholder;
}

export interface PickSource {
  /**
   * A relation of fitments with columns id, diff, sort_key, od (overall diameter), od_items (current
   * items of the original's size group at that diameter) and matching (its items that pass the filters).
   */
  name: SQL;
  limit: Placeholder;
  /** Items of the original's rim, service type and construction (rules 1 and 6). */
  itemOfSize: SQL;
  /** The filters on items; undefined for none. */
  itemFilter: SQL | undefined;
  after?: PickCursor;
}

// Measured on PGlite: an item a walk skips inside the index costs about a tenth of one it hands on.
const SKIPPED_ITEM_COST = 0.1;

const rowFields = { ...tireStockColumns, ...ruleFactColumns, ...tireLineColumns };

/** The names of a candidate row's values, in the order pickItems writes them. */
export const CANDIDATE_ROW_FIELDS = [...Object.keys(rowFields), "diffPct", "sortKey"] as const;
const itemColumns = sql`${stockItem.id}, ${stockItem.priceCents}, ${stockItem.sku}`;
const cheapestFirst = sql`order by ${stockItem.priceCents}, ${skuPlainOrder}`;

/**
 * The first `limit` items of some fitments by (sort key, price, SKU in plain character order), as
 * one JSON array of candidate rows, each an array of its values in the order of CANDIDATE_ROW_FIELDS
 * (see answer-rows): PostgreSQL writes an array of values in about a third of the time it takes to
 * write the same row as an object, key by key.
 *
 * A fitment's items all share its sort key, so only fitments with fewer than `limit` items at a
 * smaller key ("before") can hold a shown item, and at most `limit − before` of them. Fitments of
 * one diameter form a batch: its items are read cheapest first either fitment by fitment, or in one
 * walk along the diameter that skips other fitments' items, whichever reads fewer. Fitments at the
 * cursor's own key count none of their items before others, since some lie before the cursor.
 * The work follows the number of fitments and the page size, not the size of the catalog.
 */
export function pickItems({ name, limit, itemOfSize, itemFilter, after }: PickSource): SQL {
  const cursorKey = after ? sql`${after.key}::float8` : undefined;
  const counted = cursorKey ? sql`case when "sort_key" = ${cursorKey} then 0 else "matching" end` : sql`"matching"`;
  const ranked = sql`
    select "id", "diff", "sort_key", "od", "od_items", "matching",
      sum(${counted}) over (order by "sort_key") - sum(${counted}) over (partition by "sort_key") as "before"
    from ${name}
    where "matching" > 0 ${cursorKey ? sql`and "sort_key" >= ${cursorKey}` : sql``}`;
  const batches = sql`
    select "sort_key", "od", min("diff") as "diff", ${limit} - "before" as "wanted", array_agg("id") as "fitment_ids",
      ${sql.raw(String(SKIPPED_ITEM_COST))} * least(max("od_items"), ceil((${limit} - "before") * max("od_items")::float8 / sum("matching"))) + (${limit} - "before")
        < sum(least("matching", ${limit} - "before")) as "walk_diameter"
    from (${ranked}) as "ranked"
    where "before" < ${limit}
    group by "sort_key", "od", "before"`;
  const wanted = sql`not ${stockItem.retired} ${itemFilter ? sql`and ${itemFilter}` : sql``} ${
    after ? sql`and ("batch"."sort_key" > ${cursorKey} or (${stockItem.priceCents}, ${skuPlainOrder}) > (${after.priceCents}::integer, ${after.sku}::text collate "C"))` : sql``
  }`;
  const picked = sql`
    with "batches" as (${batches})
    select "sort_key", "diff", "id", "price_cents", "sku" from (
      select "batch"."sort_key", "batch"."diff", "item".* from "batches" as "batch"
      cross join lateral (
        select ${itemColumns} from ${stockItem}
        where ${itemOfSize} and ${stockItem.overallDiameterMm} = "batch"."od" and ${stockItem.fitmentId} = any ("batch"."fitment_ids") and ${wanted}
        ${cheapestFirst} limit "batch"."wanted"
      ) as "item"
      where "batch"."walk_diameter"
      union all
      select "batch"."sort_key", "batch"."diff", "item".* from "batches" as "batch"
      cross join unnest("batch"."fitment_ids") as "fitment" ("id")
      cross join lateral (
        select ${itemColumns} from ${stockItem}
        where ${stockItem.fitmentId} = "fitment"."id" and ${wanted}
        ${cheapestFirst} limit "batch"."wanted"
      ) as "item"
      where not "batch"."walk_diameter"
    ) as "items"
    order by "sort_key", "price_cents", "sku" collate "C"
    limit ${limit}`;
  const row = sql`json_build_array(${sql.join(Object.values(rowFields), sql`, `)}, "picked"."diff", "picked"."sort_key")`;
  return sql`(
    select coalesce(json_agg(${row} order by "picked"."sort_key", "picked"."price_cents", "picked"."sku" collate "C"), '[]'::json)
    from (${picked}) as "picked"
    inner join ${stockItem} on ${stockItem.id} = "picked"."id"
    inner join ${tireLine} on ${ofLine}
    inner join ${brand} on ${ofBrand})`;
}
