import { and, asc, count, desc, gte, lt, lte, sql, type SQL } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockItem } from "@/db/schema";
import { encodeAlternativesCursor, type AlternativesCursor, type AlternativesSort } from "./cursor";
import { findNearMisses } from "./near-misses";
import { nearestRows, type Walk } from "./nearest-rows";
import type { Original } from "./original";
import { failedRules, qualifyingReasons } from "./reasons";
import { ruleSql, skuPlainOrder, sortKeySql, type CatalogFilters, type RuleSql } from "./rule-sql";
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

/**
 * The walks that give one page in order. Sorted by diameter, each side of the original is walked
 * outwards (nearest first, then price, then SKU), starting past the cursor; other sorts read every
 * qualifying tire and keep the first.
 */
function pageWalks(rules: RuleSql, qualifying: SQL | undefined, sort: AlternativesSort, sortKey: SQL<number>, cursor: AlternativesCursor | null): [Walk, ...Walk[]] {
  const tieOrder = [asc(stockItem.priceCents), skuPlainOrder];
  const after = cursor
    ? sql`(${sortKey}, ${stockItem.priceCents}, ${skuPlainOrder}) > (${cursor.key}::float8, ${cursor.priceCents}::integer, ${cursor.sku}::text collate "C")`
    : undefined;
  if (sort !== "diameter") return [{ where: and(qualifying, after), orderBy: [sortKey, ...tieOrder] }];
  const od = stockItem.overallDiameterMm;
  const reference = rules.reference;
  const reached = ((cursor?.key ?? 0) / 100) * reference - BOUND_SLACK_MM;
  return [
    { where: and(qualifying, after, gte(od, Math.max(reference, reference + reached))), orderBy: [asc(od), ...tieOrder] },
    { where: and(qualifying, after, lt(od, reference), lte(od, reference - reached)), orderBy: [desc(od), ...tieOrder] },
  ];
}

/**
 * Equal-or-better tires from stock for one original (rules 1–7, applied in SQL): one keyset page of
 * them, how many qualify in all, and the nearest tires that fail exactly one of rules 2–5.
 */
export async function findAlternatives(db: Database, original: Original, options: AlternativesOptions): Promise<Alternatives> {
  const rules = ruleSql(original, options.tolerancePct, options);
  const qualifying = and(rules.eligible, rules.diameterFits, rules.loadIndexHolds, rules.speedHolds, rules.loadRangeHolds);
  const sortKey = sortKeySql(options.sort, rules.diffPct);

  const walks = pageWalks(rules, qualifying, options.sort, sortKey, options.cursor);
  const rows = await nearestRows(db, walks, sortKey, rules.diffPct, options.limit + 1);
  const [counted] = await db.select({ total: count() }).from(stockItem).where(qualifying);
  const nearMisses = await findNearMisses(db, rules);

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
    total: counted?.total ?? 0,
    results: page.map((row) => ({ ...toTire(row), diameterDiffPct: row.diffPct, reasons: qualifyingReasons(original, row, row.diffPct) })),
    nextCursor: hasMore ? encodeAlternativesCursor({ sort: options.sort, key: last.sortKey, priceCents: last.priceCents, sku: last.sku }) : null,
    nearMisses: nearMisses.map((row) => ({
      ...toTire(row),
      diameterDiffPct: row.diffPct,
      failed: failedRules(original, row, row.diffPct, options.tolerancePct),
    })),
  };
}
