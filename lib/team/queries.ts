import { asc, ilike, or, sql } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { user } from "@/db/schema";
import { containsPattern } from "@/lib/search/contains-pattern";
import { lineText } from "@/lib/validation/text";

export const TEAM_PAGE_SIZE = 100;

/** `/counter/team?q=…`: accounts whose name or e-mail contains the words. */
export const teamQuerySchema = z.object({ q: lineText().trim().max(100).optional().catch(undefined) });

/** Accounts for the Team page, staff and admins first; never a password or a session. */
export async function listTeam(db: Database, search: string | undefined) {
  const pattern = search ? containsPattern(search) : undefined;
  const where = pattern ? or(ilike(user.email, pattern), ilike(user.name, pattern)) : undefined;
  const roleOrder = sql`case ${user.role} when 'admin' then 0 when 'staff' then 1 else 2 end`;
  const [accounts, [counted]] = await Promise.all([
    db
      .select({ id: user.id, name: user.name, email: user.email, role: user.role, createdAt: user.createdAt })
      .from(user)
      .where(where)
      .orderBy(roleOrder, asc(user.email))
      .limit(TEAM_PAGE_SIZE),
    db.select({ total: sql<number>`count(*)::int` }).from(user).where(where),
  ]);
  return { accounts, total: counted?.total ?? 0 };
}

export type TeamMember = Awaited<ReturnType<typeof listTeam>>["accounts"][number];
