import type { Database } from "@/db/client";
import type { ApiErrorCode } from "@/lib/api/errors";
import { findAlternatives, type Alternatives } from "./find-alternatives";
import { DEFAULT_PAGE_SIZE } from "@/lib/catalog/query-schema";
import type { AlternativesQuery } from "./query-schema";
import { decodeAlternativesCursor } from "./cursor";
import { readOriginal } from "./original";
import { readCachedFinderShopSettings } from "@/lib/shop/shop-cache";
import { DEFAULT_SET_SIZE } from "@/lib/tire";

export type AlternativesAnswer = { ok: true; body: Alternatives } | { ok: false; code: ApiErrorCode; message: string };

/**
 * Answers a validated GET /api/v1/alternatives query: the original read, the shop's tolerance unless
 * one is given, its charges for the estimates (both from the cache: a search queries only the stock).
 */
export async function answerAlternatives(db: Database, query: AlternativesQuery): Promise<AlternativesAnswer> {
  const read = readOriginal({ ...query, season: query.originalSeason });
  if (!read.ok) return { ok: false, code: read.code, message: read.message };
  const sort = query.sort ?? "diameter";
  const cursor = query.cursor === undefined ? null : decodeAlternativesCursor(query.cursor);
  if (query.cursor !== undefined && cursor?.sort !== sort) {
    return { ok: false, code: "invalid_parameter", message: 'The parameter "cursor" is invalid: use the nextCursor of the same search.' };
  }
  const shop = await readCachedFinderShopSettings();
  const body = await findAlternatives(db, read.original, {
    tolerancePct: query.tolerancePct ?? shop.tolerancePct,
    sort,
    quantity: query.quantity ?? DEFAULT_SET_SIZE,
    charges: shop.charges,
    limit: query.limit ?? DEFAULT_PAGE_SIZE,
    cursor,
    season: query.season,
    terrain: query.terrain,
    threePeak: query.threePeak,
    brand: query.brand,
    minPriceCents: query.minPriceCents,
    maxPriceCents: query.maxPriceCents,
    inStock: query.inStock,
  });
  return { ok: true, body };
}
