import { and, eq, isNull } from "drizzle-orm";
import type { Database } from "@/db/client";
import { fitCard } from "@/db/schema";
import { hasRole } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session";

export type RevokeResult = "revoked" | "not_found" | "forbidden";

/** The author or any staff member withdraws a card; its link then says so. Revoking twice is harmless. */
export async function revokeFitCard(db: Database, user: SessionUser, slug: string): Promise<RevokeResult> {
  const [card] = await db.select({ id: fitCard.id, authorId: fitCard.authorId }).from(fitCard).where(eq(fitCard.slug, slug));
  if (!card) return "not_found";
  if (card.authorId !== user.id && !hasRole(user.role, "staff")) return "forbidden";
  await db.update(fitCard).set({ revokedAt: new Date() }).where(and(eq(fitCard.id, card.id), isNull(fitCard.revokedAt)));
  return "revoked";
}
