import type { Database } from "@/db/client";
import { encodeAlternativesCursor, type AlternativesCursor, type AlternativesSort } from "./cursor";
import { finderAnswerSchema } from "./finder-answer";
import { finderStatement, NEAR_MISS_LIMIT } from "./finder-statement";
import type { Original } from "./original";
import { failedRules, qualifyingReasons } from "./reasons";
import { finderShape, finderValues, ruleSql, type CatalogFilters } from "./rule-sql";
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

function cursorValues(cursor: AlternativesCursor | null) {
  return { cursorKey: cursor?.key, cursorPriceCents: cursor?.priceCents, cursorSku: cursor?.sku };
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
  const answer = await run({ ...values, ...cursorValues(options.cursor), limit: options.limit + 1, nearMissLimit: NEAR_MISS_LIMIT });
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
