import { and, asc, count, desc, gte, lt, lte, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockItem } from "@/db/schema";
import { encodeAlternativesCursor, type AlternativesCursor, type AlternativesSort } from "./cursor";
import { finderAnswerSchema } from "./finder-answer";
import { NEAR_MISS_LIMIT, nearMissRows } from "./near-misses";
import { nearestRows, type Walk } from "./nearest-rows";
import type { Original } from "./original";
import { failedRules, qualifyingReasons } from "./reasons";
import { finderShape, finderValues, placeholder, ruleSql, skuPlainOrder, sortKeySql, type CatalogFilters, type RuleSql } from "./rule-sql";
import { cachedStatement } from "./statement-cache";
import { toTire, type Tire } from "./tire";

export interface AlternativesOptions extends CatalogFilters {
  tolerancePct: number;
  sort: AlternativesSort;
  limit: number;
  cursor: AlternativesCursor | null;
}

export type Alternative = Tire & { diameterDiffPct: number; reasons: string[] };
export type NearMiss = Tire & { diameterDiffPct: number; failed: string[] };

/** The 200 body of GET /api/v1/alternatives. */
export interface Alternatives {
  original: {
    designation: string;
    overallDiameterMm: number;
    loadIndex: number;
    speedSymbol: string | null;
    loadRange: string | null;
  };
  tolerancePct: number;
  total: number;
  results: Alternative[];
  nextCursor: string | null;
  nearMisses: NearMiss[];
}

// Float rounding in the percentage is far below a micrometre; the index bound only needs to be a little wider.
const BOUND_SLACK_MM = 1e-6;

const pagePlaceholder = (name: "limit" | "cursorKey" | "cursorPriceCents" | "cursorSku" | "upFromMm" | "downToMm") => sql.placeholder(name);

/**
 * One page in order. Sorted by diameter, each side of the original is walked outwards (nearest
 * first, then price, then SKU), starting past the cursor; other sorts read every qualifying tire
 * and keep the first.
 */
function pageQuery(db: Database, rules: RuleSql, sort: AlternativesSort, afterCursor: boolean) {
  const qualifying = and(rules.eligible, rules.diameterFits, rules.loadIndexHolds, rules.speedHolds, rules.loadRangeHolds);
  const sortKey = sortKeySql(sort, rules.diffPct);
  const tieOrder = [asc(stockItem.priceCents), skuPlainOrder];
  const after = afterCursor
    ? sql`(${sortKey}, ${stockItem.priceCents}, ${skuPlainOrder}) > (${pagePlaceholder("cursorKey")}::float8, ${pagePlaceholder("cursorPriceCents")}::integer, ${pagePlaceholder("cursorSku")}::text collate "C")`
    : undefined;
  const od = stockItem.overallDiameterMm;
  const walks: [Walk, ...Walk[]] =
    sort === "diameter"
      ? [
          { where: and(qualifying, after, gte(od, placeholder("reference")), gte(od, pagePlaceholder("upFromMm"))), orderBy: [asc(od), ...tieOrder] },
          { where: and(qualifying, after, lt(od, placeholder("reference")), lte(od, pagePlaceholder("downToMm"))), orderBy: [desc(od), ...tieOrder] },
        ]
      : [{ where: and(qualifying, after), orderBy: [sortKey, ...tieOrder] }];
  return nearestRows(db, walks, sortKey, rules.diffPct, pagePlaceholder("limit"));
}

/**
 * The finder's one statement for a shape of search: a page of results, how many qualify in all and
 * the near misses, as one JSON value (one round trip, rows read by JSON.parse rather than field by field).
 */
function finderStatement(db: Database, rules: RuleSql, sort: AlternativesSort, afterCursor: boolean) {
  const total = db
    .select({ total: count() })
    .from(stockItem)
    .where(and(rules.eligible, rules.diameterFits, rules.loadIndexHolds, rules.speedHolds, rules.loadRangeHolds));
  const answer = sql`json_build_object('results', (${pageQuery(db, rules, sort, afterCursor)}), 'total', (${total}), 'nearMisses', (${nearMissRows(db, rules)}))`;
  // A statement of one row: its whole answer is the single JSON value.
  return db.select({ answer }).from(sql`(values (1)) as "single_row"`);
}

/** Where each side's walk starts: past the cursor's distance from the original's diameter. */
function pageValues(options: AlternativesOptions, referenceMm: number) {
  const reachedMm = ((options.cursor?.key ?? 0) / 100) * referenceMm - BOUND_SLACK_MM;
  return {
    limit: options.limit + 1,
    cursorKey: options.cursor?.key,
    cursorPriceCents: options.cursor?.priceCents,
    cursorSku: options.cursor?.sku,
    upFromMm: referenceMm + reachedMm,
    downToMm: referenceMm - reachedMm,
  };
}

/**
 * Equal-or-better tires from stock for one original (rules 1–7, applied in SQL): one keyset page of
 * them, how many qualify in all, and the nearest tires that fail exactly one of rules 2–5.
 */
export async function findAlternatives(db: Database, original: Original, options: AlternativesOptions): Promise<Alternatives> {
  const shape = finderShape(original, options);
  const values = finderValues(original, options.tolerancePct, options);
  const run = cachedStatement(db, `${options.sort} ${options.cursor ? "after" : "first"} ${JSON.stringify(shape)}`, () =>
    finderStatement(db, ruleSql(shape), options.sort, options.cursor !== null),
  );
  const answer = await run({ ...values, ...pageValues(options, values.reference), nearMissLimit: NEAR_MISS_LIMIT });
  const { results: rows, total, nearMisses } = finderAnswerSchema.parse(answer);

  const page = rows.slice(0, options.limit);
  const last = page.at(-1);
  const hasMore = rows.length > options.limit && last !== undefined;
  return {
    original: {
      designation: original.designation,
      overallDiameterMm: original.overallDiameterMm,
      loadIndex: original.loadIndex,
      speedSymbol: original.speedSymbol,
      loadRange: original.loadRange,
    },
    tolerancePct: options.tolerancePct,
    total,
    results: page.map((row) => ({ ...toTire(row), diameterDiffPct: row.diffPct, reasons: qualifyingReasons(original, row, row.diffPct) })),
    nextCursor: hasMore ? encodeAlternativesCursor({ sort: options.sort, key: last.sortKey, priceCents: last.priceCents, sku: last.sku }) : null,
    nearMisses: nearMisses.map((row) => ({
      ...toTire(row),
      diameterDiffPct: row.diffPct,
      failed: failedRules(original, row, row.diffPct, options.tolerancePct),
    })),
  };
}
