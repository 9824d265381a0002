import { and, asc, desc, gt, gte, lt, lte, sql, type SQL } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockItem } from "@/db/schema";
import { nearestRows } from "./nearest-rows";
import { placeholder, skuPlainOrder, type RuleSql } from "./rule-sql";

export const NEAR_MISS_LIMIT = 20;

/**
 * Exactly one of the conditions fails: not all hold, and at most one fails. Counting keeps planning
 * cheap (spelling out each case makes the planner weigh an index path per case), and leading with
 * "not all hold" lets it expect enough rows to walk the finder index in order rather than sort.
 */
function exactlyOneFails(conditions: readonly SQL[]): SQL {
  const failures = sql.join(
    conditions.map((condition) => sql`(not (${condition}))::int`),
    sql` + `,
  );
  return sql`not (${and(...conditions)}) and ${failures} <= 1`;
}

/**
 * Tires that meet rules 1, 6 and 7 (and the filters) but fail exactly one of rules 2–5, nearest
 * diameter first, then price, then SKU. Within the tolerance they fail one of rules 3–5; beyond it
 * they meet all three. Each side of the original is walked outwards until enough are found.
 */
export function nearMissRows(db: Database, rules: RuleSql) {
  const od = stockItem.overallDiameterMm;
  const [reference, minMm, maxMm] = [placeholder("reference"), placeholder("minMm"), placeholder("maxMm")];
  const others = [rules.loadIndexHolds, rules.speedHolds, rules.loadRangeHolds];
  const oneOfOthersFails = exactlyOneFails(others);
  const upwards = [asc(od), asc(stockItem.priceCents), skuPlainOrder];
  const downwards = [desc(od), asc(stockItem.priceCents), skuPlainOrder];
  return nearestRows(
    db,
    [
      { where: and(rules.eligible, gte(od, reference), lte(od, maxMm), oneOfOthersFails), orderBy: upwards },
      { where: and(rules.eligible, lt(od, reference), gte(od, minMm), oneOfOthersFails), orderBy: downwards },
      { where: and(rules.eligible, gt(od, maxMm), ...others), orderBy: upwards },
      { where: and(rules.eligible, lt(od, minMm), ...others), orderBy: downwards },
    ],
    sql<number>`abs(${rules.diffPct})`,
    rules.diffPct,
    sql.placeholder("nearMissLimit"),
  );
}
