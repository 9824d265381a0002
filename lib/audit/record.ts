import type { Database } from "@/db/client";
import { auditEvent, type AuditAction, type AuditChanges } from "@/db/schema";

/** The signed-in person a change is recorded against. */
export interface Actor {
  id: string;
  email: string;
}

export interface AuditEntry {
  action: AuditAction;
  subject: string;
  summary: string;
  changes?: AuditChanges;
}

/** Records changes in the caller's transaction, so that a change and its record land together or not at all. */
export async function recordAudit(db: Database, actor: Actor, entries: readonly AuditEntry[]): Promise<void> {
  if (entries.length === 0) return;
  await db.insert(auditEvent).values(
    entries.map((entry) => ({ actorId: actor.id, actorEmail: actor.email, changes: {}, ...entry })),
  );
}

/** The fields whose values differ between two versions of a record. */
export function changedFields<T extends object>(before: T, after: T, fields: readonly (keyof T & string)[]): AuditChanges {
  const changes: AuditChanges = {};
  for (const field of fields) {
    if (before[field] !== after[field]) changes[field] = { from: before[field], to: after[field] };
  }
  return changes;
}
