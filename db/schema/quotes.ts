import { date, index, integer, pgTable, primaryKey, serial, smallint, text, timestamp } from "drizzle-orm/pg-core";
import { stockItem } from "./catalog";
import { QUOTE_SOURCES, QUOTE_STATUSES, type QuoteSource, type QuoteStatus } from "../../lib/tire/vocabulary";
import { user } from "./auth";
import { emailSend } from "./email";

export { QUOTE_SOURCES, QUOTE_STATUSES, type QuoteSource, type QuoteStatus };

/** "Ask the shop": a driver's request for a price, kept with its status and the shop's replies. */
export const quoteRequest = pgTable(
  "quote_request",
  {
    id: serial().primaryKey(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    name: text().notNull(),
    email: text().notNull(),
    phone: text(),
    vehicle: text().notNull(),
    /** The tires or size the driver asks about, in their words or as the page filled it in. */
    tires: text().notNull(),
    quantity: smallint().notNull(),
    preferredDay: date({ mode: "string" }),
    source: text().$type<QuoteSource>().notNull(),
    /** The Fit card or size sheet the request came from, when there was one. */
    reference: text(),
    status: text().$type<QuoteStatus>().notNull().default("new"),
  },
  (table) => [index("quote_request_status_created").on(table.status, table.createdAt)],
);

/**
 * A catalog tire a request names (the tires picked in the finder, a Fit card's tires), so that the
 * Counter can show how many are on hand and what the request's quantity costs at today's price.
 */
export const quoteRequestTire = pgTable(
  "quote_request_tire",
  {
    requestId: integer()
      .notNull()
      .references(() => quoteRequest.id, { onDelete: "cascade" }),
    position: smallint().notNull(),
    stockItemId: integer()
      .notNull()
      .references(() => stockItem.id, { onDelete: "restrict" }),
  },
  (table) => [primaryKey({ columns: [table.requestId, table.position] })],
);

/** A staff reply to a request, sent by e-mail and kept with it. */
export const quoteReply = pgTable("quote_reply", {
  id: serial().primaryKey(),
  requestId: integer()
    .notNull()
    .references(() => quoteRequest.id, { onDelete: "cascade" }),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  authorId: text().references(() => user.id, { onDelete: "set null" }),
  authorName: text().notNull(),
  body: text().notNull(),
  emailSendId: integer().references(() => emailSend.id, { onDelete: "set null" }),
});

export type QuoteRequest = typeof quoteRequest.$inferSelect;
