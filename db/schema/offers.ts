import { sql } from "drizzle-orm";
import { check, date, index, integer, jsonb, pgTable, primaryKey, serial, smallint, text, timestamp, uniqueIndex } from "drizzle-orm/pg-core";
import { OFFER_STATUSES, type StoredOfferStatus } from "../../lib/tire/vocabulary";
import { user } from "./auth";
import { oneOf, stockItem } from "./catalog";
import { quoteRequest } from "./quotes";

const STORED_OFFER_STATUSES = OFFER_STATUSES.filter((status) => status !== "expired");

/** An estimate as frozen when an offer is sent, every figure in cents (lib/money/estimate.ts). */
export type FrozenEstimate = { quantity: number; tiresCents: number; servicesCents: number; feesCents: number; taxCents: number; totalCents: number };

/**
 * A priced offer answering a request: one package of tires bought together, its estimate frozen
 * when sent, valid until the end of a local date. The driver opens it by its token (no account)
 * and may accept it with a fitting time, which books a bay and holds the tires until the end of the
 * fitting's day (or until staff release them). The fitting's columns are empty until then.
 */
export const offer = pgTable(
  "offer",
  {
    id: serial().primaryKey(),
    /** At least 128 random bits, base64url: the driver's only key to the offer. */
    token: text().notNull().unique(),
    requestId: integer()
      .notNull()
      .references(() => quoteRequest.id, { onDelete: "cascade" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    senderId: text().references(() => user.id, { onDelete: "set null" }),
    status: text().$type<StoredOfferStatus>().notNull().default("open"),
    /** The date staff chose, YYYY-MM-DD in the shop's zone, and the instant it ends there. */
    validUntilDate: date({ mode: "string" }).notNull(),
    validUntil: timestamp({ withTimezone: true }).notNull(),
    message: text().notNull().default(""),
    estimate: jsonb().$type<FrozenEstimate>().notNull(),
    fittingBay: smallint(),
    fittingStart: timestamp({ withTimezone: true }),
    fittingEnd: timestamp({ withTimezone: true }),
    /** The end of the fitting's local day: the tires stay held until then unless released sooner. */
    holdUntil: timestamp({ withTimezone: true }),
    holdReleasedAt: timestamp({ withTimezone: true }),
    /** The iCalendar SEQUENCE of the last calendar object sent for the fitting. */
    calendarSequence: integer().notNull().default(0),
    reminderSentAt: timestamp({ withTimezone: true }),
  },
  (table) => [
    index("offer_request").on(table.requestId),
    index("offer_fitting_start").on(table.fittingStart),
    // One set per bay at a time: a bay's start is taken while its fitting is booked or done.
    uniqueIndex("offer_fitting_bay_start")
      .on(table.fittingBay, table.fittingStart)
      .where(sql`${table.status} in ('accepted', 'fitted')`),
    check("offer_status", sql`${table.status} in ${oneOf(STORED_OFFER_STATUSES)}`),
    check(
      "offer_fitting_booked",
      sql`(${table.fittingStart} is null) = (${table.fittingBay} is null) and (${table.fittingStart} is null) = (${table.fittingEnd} is null) and (${table.fittingStart} is null) = (${table.holdUntil} is null) and (${table.status} in ('open', 'withdrawn') or ${table.fittingStart} is not null)`,
    ),
    check("offer_fitting_order", sql`${table.fittingEnd} > ${table.fittingStart} and ${table.fittingBay} >= 1`),
  ],
);

/** One tire of an offer: how many, the price each and the line's estimate as sent. */
export const offerLine = pgTable(
  "offer_line",
  {
    offerId: integer()
      .notNull()
      .references(() => offer.id, { onDelete: "cascade" }),
    position: smallint().notNull(),
    stockItemId: integer()
      .notNull()
      .references(() => stockItem.id, { onDelete: "restrict" }),
    quantity: smallint().notNull(),
    priceCents: integer().notNull(),
    estimate: jsonb().$type<FrozenEstimate>().notNull(),
  },
  (table) => [
    primaryKey({ columns: [table.offerId, table.position] }),
    index("offer_line_item").on(table.stockItemId),
    check("offer_line_quantity", sql`${table.quantity} between 1 and 8`),
    check("offer_line_price", sql`${table.priceCents} >= 0`),
  ],
);

export type Offer = typeof offer.$inferSelect;
export type OfferLine = typeof offerLine.$inferSelect;
