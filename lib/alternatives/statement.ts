import { and, sql, type SQL } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockFitment, stockItem } from "@/db/schema";
import type { FinderSort } from "@/lib/tire";
import { pickItems } from "./fitment-picks";
import { sortKeySql, type RuleSql } from "./rule-sql";

export const NEAR_MISS_LIMIT = 20;

const RULES = ["diameter_fits", "load_index_holds", "speed_holds", "load_range_holds"] as const;
const allHold = sql.raw(RULES.map((rule) => `"${rule}"`).join(" and "));
// Counting failures keeps the condition one expression, however many rules there are.
const oneFails = sql.raw(`not (${RULES.map((rule) => `"${rule}"`).join(" and ")}) and ${RULES.map((rule) => `(not "${rule}")::int`).join(" + ")} <= 1`);

/**
 * How many current items of a judged fitment pass the filters: its own counts tell when the filters
 * are about stock alone; the line, brand and price filters need its items counted.
 */
function matchingItems(rules: RuleSql): SQL {
  if (rules.countedItems) return sql`"counted"`;
  const ofJudged = and(sql`${stockItem.fitmentId} = "judged"."id"`, sql`not ${stockItem.retired}`, rules.itemFilter);
  return sql`(select count(*)::int from ${stockItem} where ${ofJudged})`;
}

/**
 * The finder's one statement for a shape of search, answering as one JSON value (one round trip,
 * rows read by JSON.parse rather than field by field): a page of results, how many qualify in all,
 * and the near misses.
 *
 * Rules 1–7 are judged once per fitment of the original's rim, construction and service type; a
 * few hundred fitments at most, whatever the size of the catalog. Qualifying fitments give the
 * results and the total (the sum of their counts); fitments that fail exactly one of rules 2–5
 * give the near misses, nearest diameter first. Of the items, only those a page shows are read
 * (and, for the line, brand and price filters, the items of the fitments that pass).
 */
export function finderStatement(db: Database, rules: RuleSql, sort: FinderSort, afterCursor: boolean) {
  const judged = sql`
    select ${stockFitment.id} as "id", ${rules.diffPct} as "diff", ${sortKeySql(sort, rules.diffPct)} as "sort_key",
      ${stockFitment.overallDiameterMm} as "od", sum(${stockFitment.itemCount}) over (partition by ${stockFitment.overallDiameterMm}) as "od_items",
      ${rules.diameterFits} as "diameter_fits", ${rules.loadIndexHolds} as "load_index_holds",
      ${rules.speedHolds} as "speed_holds", ${rules.loadRangeHolds} as "load_range_holds",
      ${rules.countedItems ?? sql`null::int`} as "counted"
    from ${stockFitment}
    where ${rules.eligible}`;
  const qualifying = sql`select "id", "diff", "sort_key", "od", "od_items", ${matchingItems(rules)} as "matching" from "judged" where ${allHold}`;
  const near = sql`select "id", "diff", abs("diff") as "sort_key", "od", "od_items", ${matchingItems(rules)} as "matching" from "judged" where ${oneFails}`;
  const results = pickItems({
    name: sql`"qualifying"`,
    limit: sql.placeholder("limit"),
    itemOfSize: rules.itemOfSize,
    itemFilter: rules.itemFilter,
    after: afterCursor
      ? { key: sql.placeholder("cursorKey"), priceCents: sql.placeholder("cursorPriceCents"), sku: sql.placeholder("cursorSku") }
      : undefined,
  });
  const nearMisses = pickItems({ name: sql`"near"`, limit: sql.placeholder("nearMissLimit"), itemOfSize: rules.itemOfSize, itemFilter: rules.itemFilter });
  const answer = sql`
    with "judged" as (${judged}), "qualifying" as (${qualifying}), "near" as (${near})
    select json_build_object('results', ${results}, 'total', (select coalesce(sum("matching"), 0) from "qualifying"), 'nearMisses', ${nearMisses}) as "answer"`;
  return db.select({ answer: sql`"answer"` }).from(sql`(${answer}) as "finder"`);
}
