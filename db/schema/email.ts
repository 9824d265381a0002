import { index, integer, pgTable, serial, text, timestamp } from "drizzle-orm/pg-core";
import { user } from "./auth";

export const EMAIL_KINDS = [
  "fit_card",
  "quote_to_shop",
  "quote_confirmation",
  "quote_reply",
  "offer",
  "fitting_booked",
  "fitting_booked_shop",
  "fitting_cancelled",
  "fitting_cancelled_shop",
  "fitting_reminder",
] as const;
export type EmailKind = (typeof EMAIL_KINDS)[number];

export const EMAIL_STATUSES = ["sending", "sent", "failed"] as const;
export type EmailStatus = (typeof EMAIL_STATUSES)[number];

/**
 * Every e-mail the product sends on someone's behalf: who, to whom, when, the provider's id and how
 * it went. The idempotency key travels with each attempt, so a retry after a failure or a timeout
 * never delivers the same message twice.
 */
export const emailSend = pgTable(
  "email_send",
  {
    id: serial().primaryKey(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    senderId: text().references(() => user.id, { onDelete: "set null" }),
    kind: text().$type<EmailKind>().notNull(),
    /** What the e-mail is about: a Fit card's slug, a quote request's id or an offer's id. */
    reference: text().notNull(),
    toAddress: text().notNull(),
    subject: text().notNull(),
    idempotencyKey: text().notNull().unique(),
    status: text().$type<EmailStatus>().notNull().default("sending"),
    providerId: text(),
    error: text(),
    attempts: integer().notNull().default(0),
  },
  (table) => [index("email_send_reference").on(table.kind, table.reference), index("email_send_sender_created").on(table.senderId, table.createdAt)],
);

export type EmailSend = typeof emailSend.$inferSelect;
