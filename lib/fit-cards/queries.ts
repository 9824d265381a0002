import { desc, eq, ilike, or, sql } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { fitCard, fitCardTire, user } from "@/db/schema";
import { containsPattern } from "@/lib/search/contains-pattern";
import { lineText } from "@/lib/validation/text";

export const CARD_LIST_PAGE_SIZE = 50;

export type CardState = "active" | "withdrawn" | "expired";

/** `/counter/cards?q=…&page=…`: a value that makes no sense falls back to the first page of every card. */
export const cardListQuerySchema = z.object({
  q: lineText().trim().max(100).optional().catch(undefined),
  page: z.coerce.number().int().min(1).max(100_000).catch(1).default(1),
});

const summaryColumns = {
  slug: fitCard.slug,
  sizes: fitCard.sizes,
  note: fitCard.note,
  createdAt: fitCard.createdAt,
  expiresAt: fitCard.expiresAt,
  revokedAt: fitCard.revokedAt,
  tireCount: sql<number>`(select count(*)::int from ${fitCardTire} where ${fitCardTire.cardId} = ${fitCard.id})`,
};

function withState<T extends { revokedAt: Date | null; expiresAt: Date | null }>(row: T, now: Date) {
  const { revokedAt, ...rest } = row;
  const state: CardState = revokedAt ? "withdrawn" : row.expiresAt && row.expiresAt <= now ? "expired" : "active";
  return { ...rest, state };
}

/** The cards a person saved, newest first (for their account page). */
export async function listOwnCards(db: Database, authorId: string, now = new Date()) {
  const rows = await db.select(summaryColumns).from(fitCard).where(eq(fitCard.authorId, authorId)).orderBy(desc(fitCard.createdAt), desc(fitCard.id)).limit(200);
  return rows.map((row) => withState(row, now));
}

/** Every card for the Counter, searchable by size, note or author, with who made it. */
export async function listAllCards(db: Database, query: z.infer<typeof cardListQuerySchema>, now = new Date()) {
  const pattern = query.q ? containsPattern(query.q) : undefined;
  const where = pattern ? or(sql`${fitCard.sizes}::text ilike ${pattern}`, ilike(fitCard.note, pattern), ilike(user.email, pattern), ilike(fitCard.slug, pattern)) : undefined;
  const [rows, [counted]] = await Promise.all([
    db
      .select({ ...summaryColumns, authorEmail: user.email })
      .from(fitCard)
      .leftJoin(user, eq(fitCard.authorId, user.id))
      .where(where)
      .orderBy(desc(fitCard.createdAt), desc(fitCard.id))
      .limit(CARD_LIST_PAGE_SIZE)
      .offset((query.page - 1) * CARD_LIST_PAGE_SIZE),
    db.select({ total: sql<number>`count(*)::int` }).from(fitCard).leftJoin(user, eq(fitCard.authorId, user.id)).where(where),
  ]);
  return { cards: rows.map((row) => withState(row, now)), total: counted?.total ?? 0 };
}

export type CardSummary = Awaited<ReturnType<typeof listOwnCards>>[number];
export type CounterCardSummary = Awaited<ReturnType<typeof listAllCards>>["cards"][number];
