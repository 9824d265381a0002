import { z } from "zod";
import type { Database } from "@/db/client";
import type { FinderSort } from "@/lib/tire";
import { encodeAlternativesCursor, type AlternativesCursor } from "./cursor";
import { namedAnswer, type FinderAnswer, type FinderStatementAnswer } from "./answer-rows";
import { finderStatement, NEAR_MISS_LIMIT } from "./statement";
import { failedRuleWords, isNearMiss, judgeCandidate, noteWords, qualifyingReasonWords, type Verdict } from "@/lib/tire";
import { judgedCandidate } from "./judged-candidate";
import type { Original } from "./original";
import { finderShape, finderValues, ruleSql, type CatalogFilters } from "./rule-sql";
import { cachedStatement } from "./statement-cache";
import { tireSchema, toTire } from "@/lib/catalog/catalog-tire";
import { estimateSet, type ShopCharges } from "@/lib/money/estimate";
import { estimateSchema } from "@/lib/shop/charges";

export interface AlternativesOptions extends CatalogFilters {
  tolerancePct: number;
  /** How many tires are needed: the stock filter's set size and each result's estimate. */
  quantity: number;
  /** What the shop charges beyond the tires, for the estimates. */
  charges: ShopCharges;
  sort: FinderSort;
  limit: number;
  cursor: AlternativesCursor | null;
}

const diameterDiffPct = z.number().describe("(this − original) ÷ original × 100, signed and unrounded.");

export const alternativeSchema = tireSchema.extend({
  diameterDiffPct,
  reasons: z.array(z.string()).describe("Why each rule of equal-or-better holds, in plain words."),
  notes: z.array(z.string()).describe("What a driver should know beyond the rules (a change of season, a different inflation)."),
  estimate: estimateSchema.describe("What the search's quantity of this tire costs out the door, from the shop's charges: an estimate, which the shop confirms."),
});
export const nearMissSchema = tireSchema.extend({
  diameterDiffPct,
  failed: z.array(z.string()).describe("The one rule of 2–5 the tire fails, in plain words."),
});

/** The 200 body of GET /api/v1/alternatives. */
export const alternativesSchema = z.object({
  original: z.object({
    designation: z.string(),
    overallDiameterMm: z.number(),
    loadIndex: z.number().int(),
    speedSymbol: z.string().nullable().describe("Null for a ZR size given without a speed symbol (taken as above 240 km/h)."),
    loadRange: z.string().nullable(),
  }),
  tolerancePct: z.number(),
  quantity: z.number().int().describe("How many tires the search asked for: the stock filter's set size and the estimates' quantity."),
  total: z.number().int().describe("Every qualifying tire after the filters, on every page."),
  results: z.array(alternativeSchema),
  nextCursor: z.string().nullable(),
  nearMisses: z.array(nearMissSchema).describe("At most 20 tires that fail exactly one of rules 2–5."),
});

export type Alternative = z.infer<typeof alternativeSchema>;
export type NearMiss = z.infer<typeof nearMissSchema>;
export type Alternatives = z.infer<typeof alternativesSchema>;

function cursorValues(cursor: AlternativesCursor | null) {
  return { cursorKey: cursor?.key, cursorPriceCents: cursor?.priceCents, cursorSku: cursor?.sku };
}

type CandidateRow = Parameters<typeof judgedCandidate>[0] & Parameters<typeof toTire>[0] & { diffPct: number };

/**
 * The SQL picks the rows; the judge decides what is said of each. A row the judge does not confirm
 * is never shown (the property tests prove the two agree; this keeps a disagreement from reaching a driver).
 */
function confirmed<Row extends CandidateRow, Shown>(
  rows: Row[],
  verdictOf: (row: Row) => Verdict,
  holds: (verdict: Verdict) => boolean,
  show: (row: Row, verdict: Verdict) => Shown,
): Shown[] {
  const shown: Shown[] = [];
  for (const row of rows) {
    const verdict = verdictOf(row);
    if (holds(verdict)) shown.push(show(row, verdict));
    else console.error(`finder: the judge does not confirm ${row.sku} (rules ${verdict.failedRules.join(", ")})`);
  }
  return shown;
}

/**
 * The finder statement's answer for one search (a page plus one row, to tell whether more follow).
 * It is built by the statement's own json_build_array, so it is taken as it comes, its rows' values
 * named; the tests hold it to finderAnswerSchema, and the judge confirms every row before it is shown.
 */
export async function finderAnswer(db: Database, original: Original, options: AlternativesOptions): Promise<FinderAnswer> {
  const shape = finderShape(original, options, options.quantity);
  const values = finderValues(original, options.tolerancePct, options, options.quantity);
  const run = cachedStatement(db, `${options.sort} ${options.cursor ? "after" : "first"} ${JSON.stringify(shape)}`, () =>
    finderStatement(db, ruleSql(shape), options.sort, options.cursor !== null),
  );
  const answer = await run({ ...values, ...cursorValues(options.cursor), limit: options.limit + 1, nearMissLimit: NEAR_MISS_LIMIT });
  return namedAnswer(answer as FinderStatementAnswer);
}

/**
 * Equal-or-better tires from stock for one original (rules 1–7, applied in SQL and confirmed by the
 * judge): one keyset page of them, how many qualify in all, and the nearest tires that fail exactly
 * one of rules 2–5.
 */
export async function findAlternatives(db: Database, original: Original, options: AlternativesOptions): Promise<Alternatives> {
  const { results: rows, total, nearMisses } = await finderAnswer(db, original, options);

  const verdictOf = (row: CandidateRow) => judgeCandidate(original, judgedCandidate(row), { tolerancePct: options.tolerancePct });
  const page = rows.slice(0, options.limit);
  const last = page.at(-1);
  const hasMore = rows.length > options.limit && last !== undefined;
  return {
    original: {
      designation: original.designation,
      overallDiameterMm: original.overallDiameterMm,
      loadIndex: original.loadIndex,
      speedSymbol: original.speedSymbol === "ZR" ? null : original.speedSymbol,
      loadRange: original.loadRange,
    },
    tolerancePct: options.tolerancePct,
    quantity: options.quantity,
    total,
    // Object.assign rather than a spread into a new object, which made this the slowest step of a page (measured).
    results: confirmed(page, verdictOf, (verdict) => verdict.qualifies, (row, verdict) =>
      Object.assign(toTire(row), {
        diameterDiffPct: row.diffPct,
        reasons: qualifyingReasonWords(verdict),
        notes: noteWords(verdict.notes),
        estimate: estimateSet(row.priceCents, options.quantity, options.charges),
      }),
    ),
    nextCursor: hasMore ? encodeAlternativesCursor({ sort: options.sort, key: last.sortKey, priceCents: last.priceCents, sku: last.sku }) : null,
    nearMisses: confirmed(nearMisses, verdictOf, isNearMiss, (row, verdict) =>
      Object.assign(toTire(row), { diameterDiffPct: row.diffPct, failed: failedRuleWords(verdict) }),
    ),
  };
}
