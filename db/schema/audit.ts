import { index, jsonb, pgTable, serial, text, timestamp } from "drizzle-orm/pg-core";
import { AUDIT_ACTIONS, type AuditAction } from "../../lib/tire/vocabulary";
import { user } from "./auth";

/** What an audited change was. */
export { AUDIT_ACTIONS, type AuditAction };

/** A field's value before and after a change, e.g. { priceCents: { from: 15900, to: 14900 } }. */
export type AuditChanges = Record<string, { from: unknown; to: unknown }>;

/**
 * Who changed what and when: price and quantity changes, items added or retired, catalog imports
 * and role changes. The actor's e-mail is copied so that the history outlives a deleted account.
 */
export const auditEvent = pgTable(
  "audit_event",
  {
    id: serial().primaryKey(),
    at: timestamp({ withTimezone: true }).notNull().defaultNow(),
    actorId: text().references(() => user.id, { onDelete: "set null" }),
    actorEmail: text().notNull(),
    action: text().$type<AuditAction>().notNull(),
    /** The SKU, the imported file's name or the e-mail of the account concerned. */
    subject: text().notNull(),
    changes: jsonb().$type<AuditChanges>().notNull().default({}),
    summary: text().notNull(),
  },
  (table) => [index("audit_event_at").on(table.at.desc())],
);

export type AuditEvent = typeof auditEvent.$inferSelect;
export type NewAuditEvent = typeof auditEvent.$inferInsert;
