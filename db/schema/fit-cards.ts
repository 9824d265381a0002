import { sql } from "drizzle-orm";
import { check, doublePrecision, index, integer, jsonb, pgTable, primaryKey, serial, smallint, text, timestamp } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { stockItem } from "./catalog";

/**
 * A saved comparison with its own link (`/s/{slug}`): the sizes compared, the original's service
 * description, the tolerance and a note. The slug is random, never derived from the content.
 */
export const fitCard = pgTable(
  "fit_card",
  {
    id: serial().primaryKey(),
    slug: text().notNull().unique(),
    authorId: text().references(() => user.id, { onDelete: "set null" }),
    /** Normalized designations, the reference first. */
    sizes: jsonb().$type<string[]>().notNull(),
    loadIndex: smallint().notNull(),
    speedSymbol: text().notNull(),
    loadRange: text(),
    tolerancePct: doublePrecision().notNull(),
    note: text(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp({ withTimezone: true }),
    revokedAt: timestamp({ withTimezone: true }),
  },
  (table) => [
    index("fit_card_author").on(table.authorId),
    check("fit_card_tolerance", sql`${table.tolerancePct} between 1 and 5`),
    check("fit_card_load_index", sql`${table.loadIndex} between 0 and 279`),
    check("fit_card_note", sql`length(${table.note}) <= 1000`),
  ],
);

/** A catalog tire chosen for a card, with its price when the card was saved. */
export const fitCardTire = pgTable(
  "fit_card_tire",
  {
    cardId: integer()
      .notNull()
      .references(() => fitCard.id, { onDelete: "cascade" }),
    position: smallint().notNull(),
    stockItemId: integer()
      .notNull()
      .references(() => stockItem.id, { onDelete: "restrict" }),
    priceCentsAtSave: integer().notNull(),
  },
  (table) => [primaryKey({ columns: [table.cardId, table.position] }), check("fit_card_tire_price", sql`${table.priceCentsAtSave} >= 0`)],
);

export type FitCard = typeof fitCard.$inferSelect;
