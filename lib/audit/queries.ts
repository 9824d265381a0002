import { desc, eq, sql } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { AUDIT_ACTIONS, auditEvent } from "@/db/schema";

export const AUDIT_PAGE_SIZE = 50;

/** `/counter/audit?action=…&page=…`; a value that makes no sense falls back to the whole log. */
export const auditQuerySchema = z.object({
  action: z.enum(AUDIT_ACTIONS).optional().catch(undefined),
  page: z.coerce.number().int().min(1).max(100_000).catch(1).default(1),
});

export type AuditQuery = z.infer<typeof auditQuerySchema>;

/** One page of the audit log, newest first, with the number of entries that match. */
export async function listAuditEvents(db: Database, query: AuditQuery) {
  const where = query.action ? eq(auditEvent.action, query.action) : undefined;
  const [events, [counted]] = await Promise.all([
    db
      .select({
        id: auditEvent.id,
        at: auditEvent.at,
        actorEmail: auditEvent.actorEmail,
        action: auditEvent.action,
        subject: auditEvent.subject,
        summary: auditEvent.summary,
      })
      .from(auditEvent)
      .where(where)
      .orderBy(desc(auditEvent.at), desc(auditEvent.id))
      .limit(AUDIT_PAGE_SIZE)
      .offset((query.page - 1) * AUDIT_PAGE_SIZE),
    db.select({ total: sql<number>`count(*)::int` }).from(auditEvent).where(where),
  ]);
  return { events, total: counted?.total ?? 0 };
}

export type AuditListing = Awaited<ReturnType<typeof listAuditEvents>>;
